// Every kind of user mistake yields config::Error with the position, the key path and what was
// expected. One input file per case under tests/config/bad/; --set cases inline.
#include <gtest/gtest.h>

#include <unistd.h>

#include <filesystem>
#include <fstream>

#include "io/config/load.hpp"
#include "tests/config/test_schema.hpp"

namespace brume::config {
namespace {

const std::filesystem::path bad_folder =
    std::filesystem::path(BRUME_SOURCE_DIR) / "tests/config/bad";
const std::filesystem::path valid_file =
    std::filesystem::path(BRUME_SOURCE_DIR) / "tests/config/valid_minimal.yaml";

struct BadCase {
  std::string name;              // file under bad/, or the test name for a --set case
  std::vector<std::string> set;  // --set arguments (loaded over valid_minimal.yaml)
  std::string position;          // ":LINE:COL" after the file, "" when the file alone
  std::string key_path;          // expected Error::key_path(), "" for none
  std::string expected;          // words the message must contain
};

std::string where(const BadCase& c) {
  return c.set.empty() ? (bad_folder / c.name).string() : "--set " + c.set.back();
}

void PrintTo(const BadCase& c, std::ostream* out) {
  *out << c.name;
}

class BadInput : public ::testing::TestWithParam<BadCase> {};

TEST_P(BadInput, IsReportedWithPositionKeyAndExpectation) {
  const BadCase& c = GetParam();
  const std::filesystem::path file = c.set.empty() ? bad_folder / c.name : valid_file;
  try {
    (void)load(testing::test_schema(), file, c.set);
    FAIL() << c.name << ": no error";
  } catch (const Error& e) {
    const std::string message = e.what();
    std::string prefix = where(c) + c.position + ": ";
    if (!c.key_path.empty()) prefix += c.key_path + ": ";
    EXPECT_EQ(message.substr(0, prefix.size()), prefix) << message;
    EXPECT_EQ(e.key_path(), c.key_path) << message;
    EXPECT_NE(message.find(c.expected), std::string::npos) << message;
    EXPECT_EQ(message.find('\n'), std::string::npos) << "one line: " << message;
  }
}

const BadCase file_cases[] = {
    {"does_not_exist.yaml", {}, "", "", "no such file"},
    {"a_folder.yaml", {}, "", "", "is a folder, expected a YAML configuration file"},
    {"empty.yaml", {}, "", "", "empty or holds only comments"},
    {"only_comments.yaml", {}, "", "", "empty or holds only comments"},
    {"malformed_yaml.yaml", {}, ":7:4", "", "malformed YAML: "},
    {"top_level_list.yaml", {}, ":1:1", "", "the top level is a list, expected a mapping"},
    {"section_is_scalar.yaml", {}, ":5:6", "box", "found the value '64', expected a mapping"},
    {"section_is_list.yaml", {}, ":6:3", "box", "found a list, expected a mapping of keys"},
    {"unknown_section.yaml", {}, ":5:1", "boxx", "unknown section 'boxx' (did you mean 'box'?)"},
    {"unknown_key.yaml", {}, ":6:3", "box.cels", "(did you mean 'cells'?)"},
    {"key_of_other_section.yaml", {}, ":6:3", "box.courant", "(did you mean 'scheme.courant'?)"},
    {"key_at_top_level.yaml", {}, ":3:1", "stop_time", "(did you mean 'clock.stop_time'?)"},
    {"unknown_subsection.yaml", {}, ":6:3", "box.boundary", "(did you mean 'boundaries'?)"},
    {"duplicate_key.yaml", {}, ":8:3", "box.cells", "given twice (first at line 6)"},
    {"duplicate_section.yaml", {}, ":7:1", "gas", "given twice (first at line 5)"},
    {"text_for_integer.yaml", {}, ":5:14", "clock.max_steps", "found 'many', expected an integer"},
    {"real_for_integer.yaml", {}, ":5:14", "clock.max_steps", "found 2.5, expected an integer"},
    {"list_for_scalar.yaml",
     {},
     ":6:12",
     "scheme.courant",
     "found a list of 2 values, expected a single value: a number"},
    {"list_of_two.yaml",
     {},
     ":6:10",
     "box.cells",
     "found a list of 2 values, expected 3 values [x, y, z] or one value for all three"},
    {"mapping_for_value.yaml", {}, ":6:3", "box.cells", "found a mapping, expected 3 values"},
    {"yes_for_boolean.yaml",
     {},
     ":6:28",
     "scheme.characteristic_limiting",
     "found 'yes', expected true or false"},
    {"wrong_dimension.yaml",
     {},
     ":6:9",
     "box.size",
     "found a velocity (km/s), expected a length such as pc"},
    {"unknown_unit.yaml", {}, ":6:9", "box.size", "'pcc'"},
    {"unit_on_dimensionless.yaml",
     {},
     ":6:20",
     "gas.adiabatic_index",
     "expected a plain number: adiabatic_index is dimensionless"},
    {"out_of_range.yaml",
     {},
     ":6:12",
     "scheme.courant",
     "found 1.5, expected a value within (0, 1)"},
    {"out_of_range_element.yaml",
     {},
     ":6:16",
     "box.size[1]",
     "found 0 pc, expected a value > 0 pc"},
    {"integer_element_out_of_range.yaml",
     {},
     ":6:15",
     "box.cells[1]",
     "found 0, expected a value within [1, 1048576]"},
    {"negative_time.yaml",
     {},
     ":4:14",
     "clock.stop_time",
     "found -1 Myr, expected a value > 0 Myr"},
    {"bad_choice.yaml",
     {},
     ":6:19",
     "scheme.reconstruction",
     "found 'ppn', expected one of donor, plm, ppm (did you mean 'ppm'?)"},
    {"missing_required_key.yaml",
     {},
     ":3:1",
     "clock.stop_time",
     "required key is missing, expected a time such as Myr (> 0 Myr); add 'stop_time: ...' under "
     "'clock:'"},
    {"missing_required_section.yaml",
     {},
     "",
     "clock.stop_time",
     "add section 'clock' with 'stop_time: ...'"},
    {"missing_problem_parameter.yaml",
     {},
     ":3:3",
     "problem.blast_wave.energy",
     "required key is missing, expected an energy such as erg"},
    {"missing_problem_section.yaml",
     {},
     ":1:1",
     "problem.blast_wave.energy",
     "add section 'problem.blast_wave' with 'energy: ...'"},
    {"nan_value.yaml", {}, ":6:12", "scheme.courant", "found '.nan', expected a finite number"},
    {"infinite_quantity.yaml", {}, ":6:9", "box.size", "found '.inf', expected a finite number"},
    {"empty_value.yaml",
     {},
     ":6:3",
     "scheme.courant",
     "found nothing (an empty value), expected a number"},
    {"periodic_without_partner.yaml",
     {},
     ":8:5",
     "box.boundaries.x_upper",
     "x_lower is periodic but x_upper is outflow"},
};

const BadCase set_cases[] = {
    {"set_without_equals", {"box.cells"}, "", "", "expected section.key=value"},
    {"set_empty_key", {"=32"}, ":1", "", "the key before '=' is empty"},
    {"set_unknown_key", {"box.cels=[32,32,32]"}, ":1", "box.cels", "(did you mean 'box.cells'?)"},
    {"set_key_without_section", {"cells=8"}, ":1", "cells", "(did you mean 'box.cells'?)"},
    {"set_section_not_key", {"scheme=1"}, ":1", "scheme", "is a section"},
    {"set_malformed_value", {"box.cells=[32,32"}, ":11", "box.cells", "malformed value"},
    {"set_list_of_two", {"box.cells=[32,32]"}, ":11", "box.cells", "found a list of 2 values"},
    {"set_wrong_dimension",
     {"box.size=20 km/s"},
     ":10",
     "box.size",
     "found a velocity (km/s), expected a length such as pc"},
    {"set_bad_element", {"box.cells=[32,0,32]"}, ":15", "box.cells[1]", "found 0"},
    {"set_nan", {"scheme.courant=nan"}, ":16", "scheme.courant", "expected a finite number"},
    {"set_breaks_a_rule",
     {"box.boundaries.x_lower=outflow"},
     ":1",
     "box.boundaries.x_lower",
     "x_upper is periodic but x_lower is outflow"},
};

std::string case_name(const ::testing::TestParamInfo<BadCase>& info) {
  std::string name = info.param.name.substr(0, info.param.name.find('.'));
  return name;
}

INSTANTIATE_TEST_SUITE_P(Files, BadInput, ::testing::ValuesIn(file_cases), case_name);
INSTANTIATE_TEST_SUITE_P(SetArguments, BadInput, ::testing::ValuesIn(set_cases), case_name);

TEST(BadInputFiles, EveryFileInTheFolderHasACase) {
  std::size_t files = 0;
  for (const auto& item : std::filesystem::directory_iterator(bad_folder)) {
    const std::string name = item.path().filename().string();
    const bool covered = std::any_of(std::begin(file_cases), std::end(file_cases),
                                     [&](const BadCase& c) { return c.name == name; });
    EXPECT_TRUE(covered) << name << " has no case";
    ++files;
  }
  EXPECT_GE(files, 24U);
}

TEST(BadInputFiles, UnreadableFile) {
  if (geteuid() == 0) GTEST_SKIP() << "root reads files without read permission";
  const auto file = std::filesystem::temp_directory_path() / "brume_config_unreadable.yaml";
  std::ofstream(file) << "box:\n";
  std::filesystem::permissions(file, std::filesystem::perms::none);
  try {
    (void)load(testing::test_schema(), file, {});
    ADD_FAILURE() << "no error";
  } catch (const Error& e) {
    EXPECT_NE(std::string(e.what()).find(file.string() + ": cannot be read"), std::string::npos)
        << e.what();
  }
  std::filesystem::permissions(file, std::filesystem::perms::owner_all);
  std::filesystem::remove(file);
}

}  // namespace
}  // namespace brume::config
