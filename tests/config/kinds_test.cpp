// Each kind of key read from a file: integer, real, boolean, text, choice, quantity, and the
// three-valued forms with broadcast.
#include <gtest/gtest.h>

#include "io/config/load.hpp"
#include "tests/config/reference_values.hpp"
#include "tests/config/test_schema.hpp"

namespace brume::config {
namespace {

using testing::factor_tolerance;
using testing::minimal_input;
using testing::parsec_cm;
using testing::test_schema;

ResolvedConfig with(const std::string& extra) {
  return load_text(test_schema(), minimal_input + extra, "kinds.yaml", {});
}

TEST(ConfigKinds, IntegerRealBooleanTextChoice) {
  const ResolvedConfig config = with(
      "scheme:\n"
      "  courant: 0.45\n"
      "  characteristic_limiting: true\n"
      "  reconstruction: ppm\n"
      "output:\n"
      "  folder: \"runs/a b\"\n");
  EXPECT_EQ(config.integer("clock.max_steps"), 0);
  EXPECT_EQ(config.real("scheme.courant"), 0.45);
  EXPECT_TRUE(config.flag("scheme.characteristic_limiting"));
  EXPECT_EQ(config.text("scheme.reconstruction"), "ppm");
  EXPECT_EQ(config.text("output.folder"), "runs/a b");
  EXPECT_EQ(config.text("scheme.limiter"), "mc");  // default
}

TEST(ConfigKinds, NegativeAndSignedNumbers) {
  const ResolvedConfig config = with("box:\n  origin: [-0.5, +0.5, -1e-1]\n");
  const auto origin = config.reals3("box.origin");
  EXPECT_NEAR(origin[0], -0.5 * parsec_cm, 0.5 * parsec_cm * factor_tolerance);
  EXPECT_NEAR(origin[1], 0.5 * parsec_cm, 0.5 * parsec_cm * factor_tolerance);
  EXPECT_NEAR(origin[2], -0.1 * parsec_cm, 0.1 * parsec_cm * factor_tolerance);
}

TEST(ConfigKinds, QuantityBareNumberIsInTheKeysUnit) {
  const ResolvedConfig config = with("gas:\n  sound_speed: 10\n");
  EXPECT_DOUBLE_EQ(config.real("gas.sound_speed"), 10.0 * 1e5);  // 1 km/s = 1e5 cm/s by definition
}

TEST(ConfigKinds, QuantityInAnotherUnitIsConverted) {
  const ResolvedConfig config = with("gas:\n  sound_speed: 2e5 cm/s\n");
  EXPECT_DOUBLE_EQ(config.real("gas.sound_speed"), 2e5);
  const auto in_unit = std::get<double>(config.setting("gas.sound_speed").value);
  EXPECT_DOUBLE_EQ(in_unit, 2.0);  // kept in km/s, the key's unit
}

TEST(ConfigKinds, PressureReadAsPOverKB) {
  const ResolvedConfig config = with("scheme:\n  pressure_floor: 3 K cm^-3\n");
  EXPECT_NEAR(config.real("scheme.pressure_floor"), 3.0 * testing::boltzmann_erg_per_k,
              3.0 * testing::boltzmann_erg_per_k * factor_tolerance);
}

TEST(ConfigKinds, TimeInMegayears) {
  const ResolvedConfig config = with("");
  EXPECT_NEAR(config.real("clock.stop_time"), testing::megayear_s,
              testing::megayear_s * factor_tolerance);
}

TEST(ConfigKinds, ThreeIntegers) {
  const ResolvedConfig config = with("box:\n  cells: [8, 16, 32]\n");
  EXPECT_EQ(config.integers3("box.cells"), (std::array<long long, 3>{8, 16, 32}));
}

TEST(ConfigKinds, OneValueIsBroadcastToThree) {
  const ResolvedConfig config = with("box:\n  cells: 24\n  size: 20 pc\n");
  EXPECT_EQ(config.integers3("box.cells"), (std::array<long long, 3>{24, 24, 24}));
  for (double edge : config.reals3("box.size")) {
    EXPECT_NEAR(edge, 20.0 * parsec_cm, 20.0 * parsec_cm * factor_tolerance);
  }
}

TEST(ConfigKinds, ThreeQuantitiesWithMixedUnits) {
  const ResolvedConfig config = with("box:\n  size: [1 kpc, 2, 3.0e18 cm]\n");
  const auto size = config.reals3("box.size");
  EXPECT_NEAR(size[0], 1000.0 * parsec_cm, 1000.0 * parsec_cm * factor_tolerance);
  EXPECT_NEAR(size[1], 2.0 * parsec_cm, 2.0 * parsec_cm * factor_tolerance);
  EXPECT_NEAR(size[2], 3.0e18, 3.0e18 * factor_tolerance);
}

TEST(ConfigKinds, DefaultsAreFilledAndReadThroughTheirKeys) {
  const ResolvedConfig config = with("");
  EXPECT_EQ(config.integers3("box.cells"), (std::array<long long, 3>{64, 64, 64}));
  EXPECT_DOUBLE_EQ(config.real("gas.adiabatic_index"), 5.0 / 3.0);
  EXPECT_EQ(config.text("box.boundaries.z_upper"), "periodic");
  EXPECT_EQ(config.text("output.folder"), "");
  EXPECT_NEAR(config.real("scheme.density_floor"), 1e-8, 1e-8 * factor_tolerance);
  EXPECT_EQ(config.integer("problem.quiet_box.seed"), 1);
}

TEST(ConfigKinds, EmptySectionIsAccepted) {
  const ResolvedConfig config = with("gas:\n");
  EXPECT_EQ(config.text("gas.equation_of_state"), "ideal");
}

TEST(ConfigKinds, InclusiveAndExclusiveBoundsAtTheEdge) {
  // adiabatic_index is in (1, 3]: 3 is allowed, 1 is not.
  EXPECT_EQ(with("gas:\n  adiabatic_index: 3\n").real("gas.adiabatic_index"), 3.0);
  EXPECT_THROW((void)with("gas:\n  adiabatic_index: 1\n"), Error);
  EXPECT_EQ(with("box:\n  cells: 1048576\n").integers3("box.cells")[2], 1048576);
  EXPECT_THROW((void)with("box:\n  cells: 1048577\n"), Error);
}

}  // namespace
}  // namespace brume::config
