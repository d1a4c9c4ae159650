// Bad input of every kind, through the brume binary: exit code 2 and one message on standard
// error that names the place (file:line:column or the --set argument), the key and what was
// expected. Nothing is written when the input is bad.
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <vector>

#include "tests/cli/run_brume.hpp"

namespace fs = std::filesystem;
using brume::testing::fresh_folder;
using brume::testing::run_brume;

namespace {

// The smallest valid input; every case changes one thing.
const std::string valid = "clock:\n  stop_time: 1 Myr\nproblem:\n  name: decaying_turbulence\n";

struct BadCase {
  std::string name;
  std::string yaml;                   // contents of NAME.yaml
  std::string arguments;              // after "check NAME.yaml"
  std::vector<std::string> expected;  // each must appear in the message; "@" stands for the file
};

void PrintTo(const BadCase& c, std::ostream* out) {
  *out << c.name;
}

class BadInput : public ::testing::TestWithParam<BadCase> {};

TEST_P(BadInput, ExitsTwoWithOneMessageNamingPlaceAndExpectation) {
  const BadCase& c = GetParam();
  const fs::path folder = fresh_folder("brume-bad");
  const fs::path file = folder / (c.name + ".yaml");
  std::ofstream(file) << c.yaml;
  const auto r = run_brume("check '" + file.string() + "' " + c.arguments);
  EXPECT_EQ(r.exit_code, 2) << r.err;
  EXPECT_EQ(r.out, "");
  const std::string prefix = "brume: error: ";
  EXPECT_EQ(r.err.substr(0, prefix.size()), prefix) << r.err;
  EXPECT_EQ(r.err.find('\n'), r.err.size() - 1) << "one line: " << r.err;
  for (std::string word : c.expected) {
    if (const auto at = word.find('@'); at != std::string::npos) {
      word.replace(at, 1, file.string());
    }
    EXPECT_NE(r.err.find(word), std::string::npos) << "'" << word << "' in: " << r.err;
  }
  fs::remove_all(folder);
}

const BadCase cases[] = {
    {"unknown_key",
     valid + "box:\n  cels: [8, 8, 8]\n",
     "",
     {"@:6:3: box.cels", "did you mean 'cells'"}},
    {"unknown_section", valid + "bx:\n  cells: 8\n", "", {"@:5:1: bx", "did you mean 'box'"}},
    {"text_for_integer",
     valid + "box:\n  cells: eight\n",
     "",
     {"@:6:10: box.cells", "found 'eight'", "expected an integer"}},
    {"real_for_integer", valid + "box:\n  cells: 8.5\n", "", {"@:6:10: box.cells", "integer"}},
    {"wrong_dimension",
     valid + "box:\n  size: 20 km/s\n",
     "",
     {"@:6:9: box.size", "velocity", "expected a length"}},
    {"unknown_unit", valid + "box:\n  size: 20 pcs\n", "", {"@:6:9: box.size", "'pcs'"}},
    {"out_of_range",
     valid + "scheme:\n  courant: 1.5\n",
     "",
     {"@:6:12: scheme.courant", "found 1.5", "(0, 1)"}},
    {"bad_choice",
     valid + "scheme:\n  riemann_solver: hlldd\n",
     "",
     {"@:6:19: scheme.riemann_solver", "did you mean 'hlld'"}},
    {"missing_stop_time",
     "problem:\n  name: decaying_turbulence\n",
     "",
     {"@", "clock.stop_time", "required"}},
    {"missing_problem", "clock:\n  stop_time: 1 Myr\n", "", {"@", "problem.name", "required"}},
    {"malformed_yaml", valid + "box: [1, 2\n", "", {"@:", "YAML"}},
    {"empty_file", "", "", {"@", "empty"}},
    {"only_comments", "# nothing here\n", "", {"@", "empty"}},
    {"duplicate_key",
     valid + "box:\n  cells: 8\n  cells: 16\n",
     "",
     {"@:7:3: box.cells", "line 6"}},
    {"list_of_two", valid + "box:\n  cells: [8, 8]\n", "", {"@:6:10: box.cells", "3"}},
    {"yes_for_boolean",
     valid + "scheme:\n  characteristic_limiting: yes\n",
     "",
     {"@:6:28: scheme.characteristic_limiting", "true or false"}},
    {"unit_on_dimensionless",
     valid + "scheme:\n  courant: 0.3 km/s\n",
     "",
     {"@:6:12: scheme.courant", "km/s"}},
    {"negative_time",
     "clock:\n  stop_time: -1 Myr\nproblem:\n  name: decaying_turbulence\n",
     "",
     {"@:2:14: clock.stop_time", "> 0"}},
    {"section_is_scalar", valid + "box: 64\n", "", {"@:5:6: box", "mapping"}},
    {"periodic_without_partner",
     valid + "box:\n  boundaries:\n    x_lower: outflow\n",
     "",
     {"@:7:5: box.boundaries.x_lower", "x_upper is periodic"}},
    {"solver_for_other_gas",
     valid + "scheme:\n  riemann_solver: hllc\n",
     "",
     {"@:6:3: scheme.riemann_solver", "hydrodynamics", "gas.magnetized"}},
    {"problem_parameter_out_of_range",
     valid + "  decaying_turbulence:\n    highest_mode: 100\n",
     "",
     {"@:6:19: problem.decaying_turbulence.highest_mode", "found 100"}},
    {"not_a_number", valid + "scheme:\n  courant: .nan\n", "", {"@:6:12: scheme.courant"}},
    {"set_unknown_key",
     valid,
     "--set box.cell=8",
     {"--set box.cell=8", "box.cell", "did you mean 'box.cells'"}},
    {"set_without_value", valid, "--set box.cells", {"--set box.cells", "="}},
    {"set_bad_element", valid, "--set 'box.cells=[8,x,8]'", {"--set box.cells=[8,x,8]", "x"}},
    {"set_wrong_unit", valid, "--set box.size=3uG", {"--set box.size=3uG", "magnetic field"}},
    {"compression_level_out_of_range",
     valid + "output:\n  compression: deflate\n  compression_level: 12\n",
     "",
     {"@:7:22: output.compression_level", "found 12"}},
    {"unknown_compression",
     valid + "output:\n  compression: zstd\n",
     "",
     {"@:6:16: output.compression", "none, deflate"}},
    {"two_files", valid, "other.yaml", {"brume check takes one configuration file"}},
    {"unknown_option", valid, "--fast", {"unknown option '--fast'"}},
};

INSTANTIATE_TEST_SUITE_P(Cases, BadInput, ::testing::ValuesIn(cases),
                         [](const auto& test) { return test.param.name; });

TEST(BadFiles, MissingFileAndFolderInsteadOfFile) {
  const fs::path folder = fresh_folder("brume-bad-files");
  auto r = run_brume("check '" + (folder / "absent.yaml").string() + "'");
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_NE(r.err.find((folder / "absent.yaml").string()), std::string::npos) << r.err;
  EXPECT_NE(r.err.find("no such file"), std::string::npos) << r.err;
  r = run_brume("check '" + folder.string() + "'");
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_NE(r.err.find("folder"), std::string::npos) << r.err;
  fs::remove_all(folder);
}

TEST(BadFiles, RunRefusesAFolderThatHoldsFilesAndTouchesNothing) {
  const fs::path folder = fresh_folder("brume-bad-run");
  const fs::path input = folder / "box.yaml";
  std::ofstream(input) << valid;
  const fs::path taken = folder / "taken";
  fs::create_directories(taken);
  std::ofstream(taken / "results.h5") << "someone's data";
  const auto r = run_brume("run '" + input.string() + "' --out '" + taken.string() + "'");
  EXPECT_EQ(r.exit_code, 2) << r.err;
  EXPECT_NE(r.err.find("already holds files"), std::string::npos) << r.err;
  EXPECT_EQ(std::distance(fs::directory_iterator(taken), fs::directory_iterator{}), 1);
  fs::remove_all(folder);
}

TEST(BadFiles, RunWithBadConfigurationCreatesNoFolder) {
  const fs::path folder = fresh_folder("brume-bad-run-config");
  const fs::path input = folder / "box.yaml";
  std::ofstream(input) << valid + "box:\n  cells: -4\n";
  const auto r =
      run_brume("run '" + input.string() + "' --out '" + (folder / "out").string() + "'");
  EXPECT_EQ(r.exit_code, 2) << r.err;
  EXPECT_FALSE(fs::exists(folder / "out"));
  fs::remove_all(folder);
}

}  // namespace
