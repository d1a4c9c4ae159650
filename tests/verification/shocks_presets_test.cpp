// The shock-tube inputs next to the problem load through brume's schema, and the problem's
// cross-key rules reject impossible tubes with a configuration error.
#include <gtest/gtest.h>

#include <filesystem>

#include "app/schema.hpp"
#include "io/config/load.hpp"
#include "tests/verification/shocks_tube_run.hpp"

namespace brume::shocks {
namespace {

TEST(ShockTubePresets, EveryInputLoads) {
  int count = 0;
  for (const auto& entry :
       std::filesystem::directory_iterator(std::string(BRUME_SOURCE_DIR) + "/problems")) {
    const std::string name = entry.path().filename().string();
    if (!name.starts_with("shock_tube_") || entry.path().extension() != ".yaml") continue;
    EXPECT_NO_THROW({
      const auto c = config::load(app::brume_schema(), entry.path(), {});
      EXPECT_EQ(c.text("problem.name"), "shock_tube");
    }) << name;
    ++count;
  }
  EXPECT_EQ(count, 7);  // Toro 1–5, Brio & Wu, Ryu & Jones 2a
}

TEST(ShockTubePresets, ImpossibleTubesAreConfigurationErrors) {
  // div B = 0 across the plane needs the same normal field on both sides.
  EXPECT_THROW((void)config::load(app::brume_schema(), preset_path("brio_wu"),
                                  {"problem.shock_tube.right_field=[0.7, -1, 0]"}),
               config::Error);
  // The diagonal needs a 2D x–y box; a tube along y needs cells along y.
  EXPECT_THROW((void)config::load(app::brume_schema(), preset_path("brio_wu"),
                                  {"problem.shock_tube.direction=xy"}),
               config::Error);
  EXPECT_THROW((void)config::load(app::brume_schema(), preset_path("toro1"),
                                  {"problem.shock_tube.direction=y"}),
               config::Error);
  // A field for unmagnetized gas would be dropped silently.
  EXPECT_THROW((void)config::load(app::brume_schema(), preset_path("toro1"),
                                  {"problem.shock_tube.left_field=[0, 1, 0]"}),
               config::Error);
  // The control: the preset itself is fine.
  EXPECT_NO_THROW((void)config::load(app::brume_schema(), preset_path("toro1"), {}));
}

}  // namespace
}  // namespace brume::shocks
