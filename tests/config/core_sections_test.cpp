// The core sections carry exactly the agreed sections and keys, so a rename cannot slip through.
#include <gtest/gtest.h>

#include <map>

#include "io/config/core_sections.hpp"
#include "io/config/load.hpp"
#include "io/config/schema.hpp"
#include "tests/config/test_schema.hpp"

namespace brume::config {
namespace {

TEST(ConfigCoreSections, SectionsAndKeys) {
  const std::map<std::string, std::vector<std::string>> expected{
      {"box", {"cells", "size", "origin", "ranks"}},
      {"box.boundaries", {"x_lower", "x_upper", "y_lower", "y_upper", "z_lower", "z_upper"}},
      {"gas",
       {"equation_of_state", "adiabatic_index", "sound_speed", "mean_molecular_weight",
        "magnetized"}},
      {"units", {"length", "velocity", "number_density"}},
      {"scheme",
       {"reconstruction", "limiter", "ppm_limiter", "characteristic_limiting", "riemann_solver",
        "courant", "density_floor", "pressure_floor", "floor_limit"}},
      {"clock", {"stop_time", "max_steps", "wall_budget"}},
      {"output",
       {"folder", "snapshot_interval", "progress_interval", "precision", "compression",
        "compression_level", "checkpoint_interval", "checkpoints_kept"}},
      {"problem", {"name"}}};
  const std::vector<Section> sections = core_sections({{"only", "The only problem."}});
  ASSERT_EQ(sections.size(), expected.size());
  for (const Section& section : sections) {
    ASSERT_TRUE(expected.contains(section.path)) << section.path;
    std::vector<std::string> names;
    for (const Key& key : section.keys)
      names.push_back(key.name);
    EXPECT_EQ(names, expected.at(section.path)) << section.path;
    EXPECT_FALSE(section.description.empty()) << section.path;
  }
}

TEST(ConfigCoreSections, OnlyStopTimeAndProblemNameAreRequired) {
  const Schema& schema = testing::test_schema();
  std::vector<std::string> required;
  for (const KeyEntry& entry : schema.keys()) {
    if (!entry.default_value && schema.owner(entry).path.rfind("problem.", 0) != 0) {
      required.push_back(entry.path);
    }
  }
  EXPECT_EQ(required, (std::vector<std::string>{"clock.stop_time", "problem.name"}));
}

TEST(ConfigCoreSections, ProblemChoicesComeFromTheCaller) {
  const Schema schema(core_sections({{"alpha", "First."}, {"beta", "Second."}}));
  const Key& name = schema.spec(*schema.entry("problem.name"));
  ASSERT_EQ(name.choices.size(), 2U);
  EXPECT_EQ(name.choices[1].name, "beta");
  EXPECT_THROW(Schema(core_sections({})), std::logic_error);  // a choice needs choices
}

TEST(ConfigCoreSections, LoadsAMinimalFileFromDisk) {
  const auto file = std::filesystem::path(BRUME_SOURCE_DIR) / "tests/config/valid_minimal.yaml";
  const ResolvedConfig config = load(testing::test_schema(), file, {});
  EXPECT_EQ(config.text("problem.name"), "quiet_box");
  EXPECT_EQ(config.source("problem.name").to_string(), file.string() + ":2:3");
  EXPECT_EQ(config.file_name(), file.string());
}

}  // namespace
}  // namespace brume::config
