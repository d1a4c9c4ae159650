// factor_to (dimension checks, the P/k_B equivalence) and describe (dimension names).
#include <gtest/gtest.h>

#include <set>
#include <string>

#include "solver/units/constants.hpp"
#include "solver/units/unit_table.hpp"

namespace brume::units {
namespace {

Unit unit_of(std::string_view text) {
  const UnitParse parse = parse_unit(text);
  EXPECT_TRUE(parse.ok) << parse.error;
  return parse.unit;
}

TEST(FactorTo, MatchingDimensionGivesTheFactor) {
  const auto factor = factor_to(unit_of("km/s"), dim::velocity);
  ASSERT_TRUE(factor.has_value());
  EXPECT_DOUBLE_EQ(*factor, 1e5);
  const auto length = factor_to(unit_of("kpc"), dim::length);
  ASSERT_TRUE(length.has_value());
  EXPECT_DOUBLE_EQ(*length, 3.085677581491367e21);  // IAU 2015 B2 parsec × 1e3
}

TEST(FactorTo, MismatchedDimensionGivesNothing) {
  EXPECT_FALSE(factor_to(unit_of("km/s"), dim::length).has_value());
  EXPECT_FALSE(factor_to(unit_of("cm^-3"), dim::mass_density).has_value());
  EXPECT_FALSE(factor_to(unit_of("K"), dim::energy).has_value());
  EXPECT_FALSE(factor_to(unit_of("erg"), dim::pressure).has_value());
  // The P/k_B equivalence applies to pressures only, not to energy densities in another guise.
  EXPECT_FALSE(factor_to(unit_of("K cm^-3"), dim::energy).has_value());
  EXPECT_FALSE(factor_to(unit_of("K cm^-3"), dim::number_density).has_value());
  EXPECT_FALSE(factor_to(unit_of("K cm^-2"), dim::pressure).has_value());
}

TEST(FactorTo, PressureOverBoltzmann) {
  // P = (P/k_B) k_B; k_B = 1.380649e-16 erg/K (CODATA 2018, exact): 1e4 K cm^-3 is 1.380649e-12
  // erg cm^-3. One product: tolerance 4 ulp.
  const auto factor = factor_to(unit_of("K cm^-3"), dim::pressure);
  ASSERT_TRUE(factor.has_value());
  EXPECT_DOUBLE_EQ(*factor, 1.380649e-16);
  EXPECT_DOUBLE_EQ(1e4 * *factor, 1.380649e-12);
  const auto per_m3 = factor_to(unit_of("K m^-3"), dim::pressure);
  ASSERT_TRUE(per_m3.has_value());
  EXPECT_DOUBLE_EQ(*per_m3, 1.380649e-22);
  // A pressure written as a pressure still converts directly.
  const auto direct = factor_to(unit_of("dyn cm^-2"), dim::pressure);
  ASSERT_TRUE(direct.has_value());
  EXPECT_DOUBLE_EQ(*direct, 1.0);
}

TEST(Describe, NamesCommonDimensions) {
  EXPECT_EQ(describe(dim::length), "length");
  EXPECT_EQ(describe(dim::time), "time");
  EXPECT_EQ(describe(dim::mass), "mass");
  EXPECT_EQ(describe(dim::temperature), "temperature");
  EXPECT_EQ(describe(dim::velocity), "velocity");
  EXPECT_EQ(describe(dim::number_density), "number density");
  EXPECT_EQ(describe(dim::mass_density), "mass density");
  EXPECT_EQ(describe(dim::pressure), "pressure");
  EXPECT_EQ(describe(dim::energy), "energy");
  EXPECT_EQ(describe(dim::power), "power");
  EXPECT_EQ(describe(dim::magnetic_field), "magnetic field");
  EXPECT_EQ(describe(dim::cooling_rate), "cooling function");
  EXPECT_EQ(describe(dim::conductivity), "thermal conductivity");
  EXPECT_EQ(describe(dim::diffusivity), "diffusivity");
  EXPECT_EQ(describe(dim::none), "dimensionless");
  EXPECT_EQ(describe(unit_of("K cm^-3").dimension), "pressure over k_B");
}

TEST(Describe, FallsBackToBaseUnits) {
  EXPECT_EQ(describe(dim::length.pow(7)), "cm^7");
  EXPECT_EQ(describe(dim::magnetic_field * dim::length), "g^1/2 cm^1/2 s^-1");
}

TEST(Describe, NamesAreDistinctForTheTable) {
  // Two table dimensions with one name would make error messages ambiguous.
  std::set<std::string> names;
  std::set<std::string> dimensions;
  for (const auto& named : named_units()) {
    names.insert(describe(named.unit.dimension));
    dimensions.insert(named.unit.dimension.to_string());
  }
  EXPECT_EQ(names.size(), dimensions.size());
}

}  // namespace
}  // namespace brume::units
