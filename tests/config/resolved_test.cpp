// Where values come from, the getters' guard against programming errors, sections that apply
// only to the chosen problem, and section rules.
#include <gtest/gtest.h>

#include "io/config/load.hpp"
#include "tests/config/test_schema.hpp"

namespace brume::config {
namespace {

using testing::minimal_input;
using testing::test_schema;

TEST(ConfigSources, FileDefaultAndCommandLine) {
  const ResolvedConfig config = load_text(test_schema(), minimal_input + "box:\n  cells: 32\n",
                                          "run.yaml", {"scheme.courant=0.2"});
  EXPECT_EQ(config.source("box.cells").to_string(), "run.yaml:6:3");
  EXPECT_EQ(config.source("clock.stop_time").to_string(), "run.yaml:4:3");
  EXPECT_EQ(config.source("box.size").to_string(), "default");
  EXPECT_EQ(config.source("scheme.courant").to_string(), "--set scheme.courant=0.2");
}

TEST(ConfigSources, OriginalTextAndNameAreKept) {
  const ResolvedConfig config = load_text(test_schema(), minimal_input, "kept.yaml", {});
  EXPECT_EQ(config.original_text(), minimal_input);
  EXPECT_EQ(config.file_name(), "kept.yaml");
}

TEST(ConfigGetters, WrongPathOrKindIsALogicError) {
  const ResolvedConfig config = load_text(test_schema(), minimal_input, "g.yaml", {});
  EXPECT_THROW((void)config.integer("box.cellz"), std::logic_error);
  EXPECT_THROW((void)config.integer("box.size"), std::logic_error);           // a quantity ×3
  EXPECT_THROW((void)config.integers3("clock.max_steps"), std::logic_error);  // a scalar
  EXPECT_THROW((void)config.real("box.size"), std::logic_error);              // three values
  EXPECT_THROW((void)config.flag("scheme.limiter"), std::logic_error);
  EXPECT_THROW((void)config.text("scheme.courant"), std::logic_error);
  try {
    (void)config.real("gas.sound_sped");
    FAIL() << "expected std::logic_error";
  } catch (const std::logic_error& e) {
    EXPECT_NE(std::string(e.what()).find("gas.sound_sped"), std::string::npos);
  }
}

TEST(ConfigActivation, OnlyTheChosenProblemsSectionApplies) {
  const ResolvedConfig config = load_text(test_schema(), minimal_input, "a.yaml", {});
  EXPECT_TRUE(config.active("problem.quiet_box"));
  EXPECT_FALSE(config.active("problem.blast_wave"));
  EXPECT_THROW((void)config.real("problem.blast_wave.radius"), std::logic_error);
}

TEST(ConfigActivation, ChosenProblemNeedsItsRequiredKey) {
  const std::string input = "problem:\n  name: blast_wave\nclock:\n  stop_time: 1 Myr\n";
  EXPECT_THROW((void)load_text(test_schema(), input, "b.yaml", {}), Error);
  const ResolvedConfig config =
      load_text(test_schema(), input, "b.yaml", {"problem.blast_wave.energy=1e51 erg"});
  EXPECT_DOUBLE_EQ(config.real("problem.blast_wave.energy"), 1e51);
  EXPECT_FALSE(config.active("problem.quiet_box"));
}

TEST(ConfigActivation, InactiveSectionIsStillChecked) {
  const std::string input = minimal_input + "  blast_wave:\n    radius: -1 pc\n";
  // problem.blast_wave is not in use, but a wrong value in it is still reported.
  EXPECT_THROW((void)load_text(test_schema(), input, "c.yaml", {}), Error);
}

TEST(ConfigRules, PeriodicBoundariesComeInPairs) {
  const std::string both =
      minimal_input + "box:\n  boundaries:\n    x_lower: outflow\n    x_upper: reflecting\n";
  const ResolvedConfig config = load_text(test_schema(), both, "d.yaml", {});
  EXPECT_EQ(config.text("box.boundaries.x_lower"), "outflow");
  EXPECT_EQ(config.text("box.boundaries.x_upper"), "reflecting");
  try {
    (void)load_text(test_schema(), minimal_input, "d.yaml", {"box.boundaries.y_upper=outflow"});
    FAIL() << "expected config::Error";
  } catch (const Error& e) {
    EXPECT_EQ(e.key_path(), "box.boundaries.y_upper");
    EXPECT_NE(e.detail().find("y_lower is periodic but y_upper is outflow"), std::string::npos)
        << e.what();
  }
}

}  // namespace
}  // namespace brume::config
