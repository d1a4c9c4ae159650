// The section `structure_functions` through brume's whole schema: the cold threshold from the
// cooling equilibrium or from the key, the refused fit range (a user error naming the key), the
// warning for a box that is not periodic, and no diagnostic when disabled.
#include <gtest/gtest.h>

#include <string>
#include <vector>

#include "app/schema.hpp"
#include "io/config/error.hpp"
#include "io/config/load.hpp"
#include "physics/cooling_equilibrium.hpp"
#include "physics/cooling_settings.hpp"
#include "physics/structure_functions.hpp"
#include "tests/structure/structure_test_support.hpp"

namespace brume::testing {
namespace {

const std::string input = std::string(BRUME_SOURCE_DIR) + "/tests/mpi/decaying_box.yaml";

config::ResolvedConfig load(const std::vector<std::string>& overrides) {
  return config::load(app::brume_schema(), input, overrides);
}

// The cold phase is the section `phases`'s: by default the lower end of the unstable range, which
// docs/cooling.md gives as T_eq ≈ 184 K for the default Koyama–Inutsuka cooling (brume's own
// figure, rounded there: tolerance 1 K), exactly what unstable_range() returns; or set by hand.
TEST(StructureSettings, ColdThresholdIsThePhasesBoundary) {
  const config::ResolvedConfig config = load({"cooling.enabled=true"});
  const physics::StructureSettings s = physics::structure_settings(config);
  const physics::CoolingSettings cooling = physics::cooling_settings(config);
  const physics::UnstableRange range = physics::unstable_range(cooling.net);
  ASSERT_TRUE(range.found);
  EXPECT_EQ(s.cold_temperature, range.t_low);
  EXPECT_NEAR(s.cold_temperature, 184.0, 1.0);
  EXPECT_NE(s.cold_origin.find("unstable range"), std::string::npos);
  EXPECT_TRUE(s.periodic_box);
  const physics::StructureSettings fixed =
      physics::structure_settings(load({"phases.cold_below=50 K", "phases.warm_above=5000 K"}));
  EXPECT_EQ(fixed.cold_temperature, 50.0);
}

TEST(StructureSettings, FitRangeMustBeOrdered) {
  try {
    (void)load({"structure_functions.fit_lowest_lag=8", "structure_functions.fit_highest_lag=4"});
    FAIL() << "an empty fit range was accepted";
  } catch (const config::Error& e) {
    EXPECT_EQ(e.key_path(), "structure_functions.fit_highest_lag");
    EXPECT_NE(e.detail().find("not above fit_lowest_lag"), std::string::npos) << e.what();
  }
  EXPECT_THROW((void)load({"structure_functions.max_order=7"}), config::Error);
}

TEST(StructureSettings, DisabledGivesNoDiagnostic) {
  const config::ResolvedConfig config = load({"structure_functions.enabled=false"});
  EXPECT_EQ(physics::make_structure_functions(config, one_rank_context({16, 16, 16})), nullptr);
  EXPECT_NE(physics::make_structure_functions(load({}), one_rank_context({16, 16, 16})), nullptr);
}

TEST(StructureSettings, BoxThatIsNotPeriodicWarns) {
  const physics::StructureSettings s = physics::structure_settings(
      load({"box.boundaries.z_lower=outflow", "box.boundaries.z_upper=outflow"}));
  EXPECT_FALSE(s.periodic_box);
  const io::Measurement m =
      measure_one_block(s, {4, 4, 4}, [](long, long, long) { return SyntheticCell{}; });
  bool warned = false;
  for (const std::string& w : m.warnings)
    warned = warned || w.find("not periodic") != std::string::npos;
  EXPECT_TRUE(warned);
}

}  // namespace
}  // namespace brume::testing
