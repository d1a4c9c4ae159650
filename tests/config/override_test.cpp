// Command-line overrides "section.key=value".
#include <gtest/gtest.h>

#include "io/config/load.hpp"
#include "tests/config/reference_values.hpp"
#include "tests/config/test_schema.hpp"

namespace brume::config {
namespace {

using testing::minimal_input;
using testing::test_schema;

TEST(ConfigOverrides, ListUnitAndQuotedValues) {
  const ResolvedConfig config =
      load_text(test_schema(), minimal_input, "o.yaml",
                {"box.cells=[32,32,16]", "box.size=20pc", "clock.stop_time=\"5 Myr\""});
  EXPECT_EQ(config.integers3("box.cells"), (std::array<long long, 3>{32, 32, 16}));
  const double twenty_pc = 20.0 * testing::parsec_cm;
  EXPECT_NEAR(config.reals3("box.size")[1], twenty_pc, twenty_pc * testing::factor_tolerance);
  const double five_myr = 5.0 * testing::megayear_s;
  EXPECT_NEAR(config.real("clock.stop_time"), five_myr, five_myr * testing::factor_tolerance);
}

TEST(ConfigOverrides, ReplaceTheFileValueAndTheLastOneWins) {
  const ResolvedConfig config =
      load_text(test_schema(), minimal_input + "scheme:\n  courant: 0.4\n", "o.yaml",
                {"scheme.courant=0.2", "scheme.courant=0.1"});
  EXPECT_EQ(config.real("scheme.courant"), 0.1);
  EXPECT_EQ(config.source("scheme.courant").to_string(), "--set scheme.courant=0.1");
}

TEST(ConfigOverrides, ProvideARequiredKeyAndSwitchTheProblem) {
  const std::string input = "problem:\n  name: quiet_box\n";
  const ResolvedConfig config =
      load_text(test_schema(), input, "o.yaml",
                {"clock.stop_time=2", "problem.name=blast_wave", "problem.blast_wave.energy=1e50"});
  EXPECT_TRUE(config.active("problem.blast_wave"));
  EXPECT_FALSE(config.active("problem.quiet_box"));
  EXPECT_DOUBLE_EQ(config.real("problem.blast_wave.energy"), 1e50);
}

TEST(ConfigOverrides, SpacesAroundTheKeyAreIgnored) {
  const ResolvedConfig config =
      load_text(test_schema(), minimal_input, "o.yaml", {" scheme.limiter =van_leer"});
  EXPECT_EQ(config.text("scheme.limiter"), "van_leer");
}

}  // namespace
}  // namespace brume::config
