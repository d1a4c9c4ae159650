// parse_unit: powers, products, division, Unicode spellings and error messages.
#include <gtest/gtest.h>

#include <cmath>
#include <string>

#include "solver/units/constants.hpp"
#include "solver/units/unit_table.hpp"

namespace brume::units {
namespace {

// A product of up to four table factors rounds up to 4 times: tolerance 1e-15 relative.
constexpr double tolerance = 1e-15;

void expect_parses(std::string_view text, double to_cgs, Dimension dimension) {
  SCOPED_TRACE(std::string(text));
  const UnitParse parse = parse_unit(text);
  ASSERT_TRUE(parse.ok) << parse.error;
  EXPECT_NEAR(parse.unit.to_cgs / to_cgs, 1.0, tolerance);
  EXPECT_EQ(parse.unit.dimension, dimension) << parse.unit.dimension.to_string();
}

// Returns the error message, failing the test if `text` parses.
std::string error_of(std::string_view text) {
  const UnitParse parse = parse_unit(text);
  EXPECT_FALSE(parse.ok) << "'" << text << "' should not parse";
  EXPECT_FALSE(parse.error.empty());
  return parse.error;
}

TEST(ParseUnit, DimensionlessForms) {
  expect_parses("", 1.0, dim::none);
  expect_parses("   ", 1.0, dim::none);
  expect_parses("1", 1.0, dim::none);
}

TEST(ParseUnit, AsciiPowers) {
  expect_parses("cm^-3", 1.0, dim::number_density);
  expect_parses("cm^3", 1.0, dim::length.pow(3));
  expect_parses("s^-1", 1.0, dim::time.pow(-1));
  expect_parses("pc^-3", std::pow(cgs::parsec, -3), dim::number_density);
  expect_parses("km^2", 1e10, dim::length.pow(2));
  expect_parses("km^+2", 1e10, dim::length.pow(2));
  expect_parses("km^\u22122", 1e-10, dim::length.pow(-2));  // U+2212 minus sign
  expect_parses("km^0", 1.0, dim::none);
  expect_parses("uG^2", 1e-12, dim::pressure);  // B² is an energy density (Gaussian units)
}

TEST(ParseUnit, UnicodeSuperscripts) {
  expect_parses("cm\u207b\u00b3", 1.0, dim::number_density);   // cm⁻³
  expect_parses("cm\u00b3", 1.0, dim::length.pow(3));          // cm³
  expect_parses("km\u00b2", 1e10, dim::length.pow(2));         // km²
  expect_parses("s\u207b\u00b9", 1.0, dim::time.pow(-1));      // s⁻¹
  expect_parses("km\u2074", 1e20, dim::length.pow(4));         // km⁴
  expect_parses("km\u00b9\u2070", 1e50, dim::length.pow(10));  // km¹⁰
  expect_parses("km\u207a\u00b2", 1e10, dim::length.pow(2));   // km⁺²
}

TEST(ParseUnit, ProductsAndDivision) {
  expect_parses("km/s", 1e5, dim::velocity);
  expect_parses("km / s", 1e5, dim::velocity);
  expect_parses("km s^-1", 1e5, dim::velocity);
  expect_parses("pc/Myr", cgs::parsec / cgs::megayear, dim::velocity);
  expect_parses("g cm^-3", 1.0, dim::mass_density);
  expect_parses("M_sun pc^-3", cgs::solar_mass / std::pow(cgs::parsec, 3), dim::mass_density);
  expect_parses("M_sun/yr", cgs::solar_mass / cgs::julian_year, dim::mass / dim::time);
  expect_parses("erg cm^3 s^-1", 1.0, dim::cooling_rate);
  expect_parses("erg*cm^3*s^-1", 1.0, dim::cooling_rate);
  expect_parses("erg * cm^3 * s^-1", 1.0, dim::cooling_rate);
  expect_parses("erg\u00b7cm\u00b3\u00b7s\u207b\u00b9", 1.0, dim::cooling_rate);  // erg·cm³·s⁻¹
  expect_parses("erg\u22c5cm^3", 1.0, dim::energy * dim::length.pow(3));          // dot operator
  expect_parses("J/kg", 1e4, dim::velocity * dim::velocity);
  expect_parses("1/s", 1.0, dim::time.pow(-1));
  expect_parses("K cm^-3", 1.0, dim::temperature * dim::number_density);
  expect_parses("K\tcm^-3", 1.0, dim::temperature * dim::number_density);
  expect_parses("eV/m_H", cgs::electron_volt / cgs::hydrogen_mass, dim::velocity * dim::velocity);
}

TEST(ParseUnit, SlashDividesTheNextFactorOnly) {
  // "erg/s/cm^3" is erg s^-1 cm^-3, not erg s cm^-3 (documented in unit_table.hpp).
  expect_parses("erg/s/cm^3", 1.0, dim::pressure / dim::time);
  expect_parses("erg/s cm^3", 1.0, dim::cooling_rate);  // cm^3 multiplies
  expect_parses("km/s^-1", 1e5, dim::length * dim::time);
}

TEST(ParseUnit, MicrogaussSpellingsAgree) {
  expect_parses("uG", 1e-6, dim::magnetic_field);
  expect_parses("\u03bcG", 1e-6, dim::magnetic_field);
  expect_parses("\u00b5G", 1e-6, dim::magnetic_field);
}

TEST(ParseUnit, UnknownSymbolSuggestsNearest) {
  std::string error = error_of("pcc");
  EXPECT_NE(error.find("'pcc'"), std::string::npos) << error;
  EXPECT_NE(error.find("did you mean 'pc'?"), std::string::npos) << error;
  error = error_of("km/Msun");
  EXPECT_NE(error.find("'Msun'"), std::string::npos) << error;
  EXPECT_NE(error.find("did you mean 'M_sun'?"), std::string::npos) << error;
  error = error_of("KM/s");
  EXPECT_NE(error.find("'KM'"), std::string::npos) << error;
  EXPECT_NE(error.find("did you mean 'km'?"), std::string::npos) << error;
  error = error_of("cm3");
  EXPECT_NE(error.find("did you mean 'cm'?"), std::string::npos) << error;
  // Nothing close: no suggestion.
  error = error_of("furlong");
  EXPECT_NE(error.find("'furlong'"), std::string::npos) << error;
  EXPECT_EQ(error.find("did you mean"), std::string::npos) << error;
  error = error_of("x");
  EXPECT_EQ(error.find("did you mean"), std::string::npos) << error;
}

TEST(ParseUnit, MalformedPowers) {
  for (const std::string_view text :
       {"cm^", "cm^x", "cm^-", "cm^1.5", "cm^3x", "cm^3^2", "cm\u207b", "cm\u00b3^2", "cm^-3km",
        "^3", "cm ^3", "cm \u00b3", "cm^100"}) {
    const std::string error = error_of(text);
    EXPECT_NE(error.find("malformed power"), std::string::npos) << text << ": " << error;
  }
  const std::string error = error_of("km/cm^x");
  EXPECT_NE(error.find("'cm^x'"), std::string::npos) << error;
}

TEST(ParseUnit, EmptyFactorsAndTrailingSlash) {
  for (const std::string_view text : {"km//s", "/s", "*km", "km**s", "km*/s", "km /  / s"}) {
    const std::string error = error_of(text);
    EXPECT_NE(error.find("empty factor"), std::string::npos) << text << ": " << error;
  }
  EXPECT_NE(error_of("km*").find("empty factor"), std::string::npos);
  const std::string error = error_of("km/");
  EXPECT_NE(error.find("trailing '/'"), std::string::npos) << error;
  EXPECT_NE(error_of("km / ").find("trailing '/'"), std::string::npos);
}

TEST(ParseUnit, ParenthesesAndOverflowAreRejected) {
  EXPECT_NE(error_of("erg/(s cm^3)").find("parentheses"), std::string::npos);
  // (3.1e24 cm)^20 = 6e488 exceeds the largest double (1.8e308, IEEE 754).
  EXPECT_NE(error_of("Mpc^20").find("outside the range"), std::string::npos);
}

}  // namespace
}  // namespace brume::units
