// to_yaml() writes YAML that reads back to exactly the same values.
#include <gtest/gtest.h>

#include "io/config/load.hpp"
#include "tests/config/test_schema.hpp"

namespace brume::config {
namespace {

using testing::test_schema;

const std::string unusual_input =
    "problem:\n"
    "  name: blast_wave\n"
    "  blast_wave:\n"
    "    energy: 1.000000000000001e51 erg\n"
    "    radius: 7 km\n"  // converted to pc: not a short decimal
    "clock:\n"
    "  stop_time: 0.1\n"
    "  wall_budget: 90 min\n"
    "box:\n"
    "  cells: [8, 16, 1]\n"
    "  size: [20, 3.3333333333333335, 1e-3]\n"
    "  origin: -10 pc\n"
    "  boundaries:\n"
    "    z_lower: reflecting\n"
    "    z_upper: outflow\n"
    "gas:\n"
    "  adiabatic_index: 1.4000000000000001\n"
    "scheme:\n"
    "  characteristic_limiting: true\n"
    "  pressure_floor: 2.5e-7 erg/cm^3\n"
    "output:\n"
    "  folder: \"runs/with \\\"quotes\\\" and # hash: colon\"\n";

void expect_same_values(const ResolvedConfig& a, const ResolvedConfig& b) {
  for (const KeyEntry& entry : a.schema().keys()) {
    const std::string& section = a.schema().owner(entry).path;
    ASSERT_EQ(a.active(section), b.active(section)) << section;
    if (!a.active(section)) continue;
    EXPECT_TRUE(a.setting(entry.path).value == b.setting(entry.path).value) << entry.path;
  }
}

TEST(ConfigRoundTrip, PlainYamlReadsBackToTheSameValues) {
  const ResolvedConfig first = load_text(test_schema(), unusual_input, "u.yaml", {});
  const std::string written = first.to_yaml(false);
  const ResolvedConfig second = load_text(test_schema(), written, "written.yaml", {});
  expect_same_values(first, second);
  EXPECT_EQ(second.to_yaml(false), written);  // a fixed point
}

TEST(ConfigRoundTrip, CommentedYamlReadsBackToTheSameValues) {
  const ResolvedConfig first = load_text(test_schema(), unusual_input, "u.yaml", {});
  const std::string written = first.to_yaml(true);
  const ResolvedConfig second = load_text(test_schema(), written, "written.yaml", {});
  expect_same_values(first, second);
}

TEST(ConfigRoundTrip, QuantitiesAreWrittenInTheirUnit) {
  const ResolvedConfig config =
      load_text(test_schema(), testing::minimal_input, "m.yaml", {"box.size=20pc"});
  const std::string plain = config.to_yaml(false);
  EXPECT_NE(plain.find("  size: [20 pc, 20 pc, 20 pc]\n"), std::string::npos) << plain;
  EXPECT_NE(plain.find("  pressure_floor: 1e-06 K cm^-3\n"), std::string::npos) << plain;
  EXPECT_NE(plain.find("  boundaries:\n    x_lower: periodic\n"), std::string::npos) << plain;
  EXPECT_EQ(plain.find("blast_wave:"), std::string::npos) << "inactive section written";
}

TEST(ConfigRoundTrip, CommentsCarryDescriptionsAndDefaultMarks) {
  const ResolvedConfig config =
      load_text(test_schema(), testing::minimal_input, "m.yaml", {"box.size=20pc"});
  const std::string commented = config.to_yaml(true);
  EXPECT_NE(commented.find("cells: [64, 64, 64]  # Number of cells along x, y and z. (default)"),
            std::string::npos)
      << commented;
  EXPECT_NE(commented.find("size: [20 pc, 20 pc, 20 pc]  # Edge lengths of the box along x, y "
                           "and z.\n"),
            std::string::npos)
      << commented;
  EXPECT_NE(commented.find("# The simulated Cartesian box"), std::string::npos);
}

}  // namespace
}  // namespace brume::config
