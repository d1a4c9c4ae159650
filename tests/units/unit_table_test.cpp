// The named-unit table: each symbol's factor and dimension against the published value.
#include "solver/units/unit_table.hpp"

#include <gtest/gtest.h>

#include <cmath>
#include <set>
#include <string>

namespace brume::units {
namespace {

const NamedUnit* find(std::string_view symbol) {
  for (const auto& named : named_units())
    if (named.symbol == symbol) return &named;
  return nullptr;
}

// Checks that `symbol` is in the table with dimension `dimension` and a factor to cgs equal to
// `expected` within 4 ulp (EXPECT_DOUBLE_EQ): the table stores constants or one product of them.
void expect_unit(std::string_view symbol, double expected, Dimension dimension) {
  SCOPED_TRACE(std::string(symbol));
  const NamedUnit* named = find(symbol);
  ASSERT_NE(named, nullptr);
  EXPECT_DOUBLE_EQ(named->unit.to_cgs, expected);
  EXPECT_EQ(named->unit.dimension, dimension);
  EXPECT_FALSE(named->meaning.empty());
}

TEST(UnitTable, Lengths) {
  expect_unit("cm", 1.0, dim::length);
  expect_unit("m", 1e2, dim::length);
  expect_unit("km", 1e5, dim::length);
  expect_unit("au", 1.495978707e13, dim::length);         // IAU 2012 Resolution B2 (exact)
  expect_unit("pc", 3.085677581491367e18, dim::length);   // IAU 2015 B2: (648000/π) au
  expect_unit("kpc", 3.085677581491367e21, dim::length);  // 1e3 pc
  expect_unit("Mpc", 3.085677581491367e24, dim::length);  // 1e6 pc
  expect_unit("R_sun", 6.957e10, dim::length);            // IAU 2015 Resolution B3 (nominal)
}

TEST(UnitTable, Times) {
  expect_unit("s", 1.0, dim::time);
  expect_unit("min", 60.0, dim::time);
  expect_unit("h", 3600.0, dim::time);
  expect_unit("d", 86400.0, dim::time);
  expect_unit("yr", 3.15576e7, dim::time);  // Julian year, 365.25 d (IAU)
  expect_unit("kyr", 3.15576e10, dim::time);
  expect_unit("Myr", 3.15576e13, dim::time);
  expect_unit("Gyr", 3.15576e16, dim::time);
}

TEST(UnitTable, MassesTemperatureEnergies) {
  expect_unit("g", 1.0, dim::mass);
  expect_unit("kg", 1e3, dim::mass);
  // (GM)_sun^N (IAU 2015 B3) / G (CODATA 2018); the 9-digit figure is checked in constants_test.
  expect_unit("M_sun", 1.3271244e26 / 6.67430e-8, dim::mass);
  expect_unit("m_H", 1.00784 * 1.66053906660e-24, dim::mass);  // IUPAC 1.00784 u × CODATA 2018 m_u
  expect_unit("K", 1.0, dim::temperature);
  expect_unit("erg", 1.0, dim::energy);
  expect_unit("J", 1e7, dim::energy);
  expect_unit("eV", 1.602176634e-12, dim::energy);  // CODATA 2018 (exact)
  expect_unit("keV", 1.602176634e-9, dim::energy);
  expect_unit("L_sun", 3.828e33, dim::power);  // IAU 2015 Resolution B3 (nominal)
  expect_unit("dyn", 1.0, dim::energy / dim::length);
}

TEST(UnitTable, MagneticFields) {
  expect_unit("G", 1.0, dim::magnetic_field);
  expect_unit("mG", 1e-3, dim::magnetic_field);
  expect_unit("uG", 1e-6, dim::magnetic_field);
  expect_unit("\u03bcG", 1e-6, dim::magnetic_field);  // Greek small letter mu
  expect_unit("\u00b5G", 1e-6, dim::magnetic_field);  // micro sign
  expect_unit("nG", 1e-9, dim::magnetic_field);
}

TEST(UnitTable, SymbolsAreUniqueAndParseToThemselves) {
  std::set<std::string_view> seen;
  for (const auto& named : named_units()) {
    SCOPED_TRACE(std::string(named.symbol));
    EXPECT_TRUE(seen.insert(named.symbol).second) << "duplicate symbol";
    const UnitParse parse = parse_unit(named.symbol);
    ASSERT_TRUE(parse.ok) << parse.error;
    EXPECT_EQ(parse.unit.to_cgs, named.unit.to_cgs);
    EXPECT_EQ(parse.unit.dimension, named.unit.dimension);
  }
  EXPECT_GE(seen.size(), 33u);
}

}  // namespace
}  // namespace brume::units
