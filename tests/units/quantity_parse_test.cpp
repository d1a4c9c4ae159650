// parse_quantity: a C-locale number followed by an optional unit expression.
#include <gtest/gtest.h>

#include <string>

#include "solver/units/constants.hpp"
#include "solver/units/unit_table.hpp"

namespace brume::units {
namespace {

QuantityParse parsed(std::string_view text) {
  const QuantityParse parse = parse_quantity(text);
  EXPECT_TRUE(parse.ok) << "'" << text << "': " << parse.error;
  return parse;
}

std::string error_of(std::string_view text) {
  const QuantityParse parse = parse_quantity(text);
  EXPECT_FALSE(parse.ok) << "'" << text << "' should not parse";
  return parse.error;
}

TEST(ParseQuantity, BareNumbers) {
  for (const auto& [text, value] :
       std::initializer_list<std::pair<std::string_view, double>>{{"-3", -3.0},
                                                                  {"0.5", 0.5},
                                                                  {"+2", 2.0},
                                                                  {" 1.5e4 ", 1.5e4},
                                                                  {".25", 0.25},
                                                                  {"7.", 7.0}}) {
    const QuantityParse parse = parsed(text);
    EXPECT_EQ(parse.number, value) << text;  // exactly representable or one correctly rounded value
    EXPECT_FALSE(parse.has_unit) << text;
  }
}

TEST(ParseQuantity, NumberWithUnit) {
  QuantityParse parse = parsed("20 pc");
  EXPECT_EQ(parse.number, 20.0);
  ASSERT_TRUE(parse.has_unit);
  EXPECT_DOUBLE_EQ(parse.unit.to_cgs, cgs::parsec);
  EXPECT_EQ(parse.unit.dimension, dim::length);

  for (const std::string_view text : {"1e4K", "1e4 K", "1e4\tK", "1.0e+04 K "}) {
    parse = parsed(text);
    EXPECT_EQ(parse.number, 1e4) << text;
    EXPECT_TRUE(parse.has_unit) << text;
    EXPECT_EQ(parse.unit.dimension, dim::temperature) << text;
  }

  parse = parsed("2e-26 erg/s");
  EXPECT_EQ(parse.number, 2e-26);
  EXPECT_EQ(parse.unit.dimension, dim::power);

  // A unit starting with 'e' right after the number is not taken for an exponent.
  parse = parsed("13.6eV");
  EXPECT_EQ(parse.number, 13.6);
  EXPECT_DOUBLE_EQ(parse.unit.to_cgs, cgs::electron_volt);
  parse = parsed("5erg");
  EXPECT_EQ(parse.number, 5.0);
  EXPECT_EQ(parse.unit.dimension, dim::energy);

  parse = parsed("3 \u03bcG");
  EXPECT_DOUBLE_EQ(parse.number * parse.unit.to_cgs, 3e-6);
  parse = parsed("1 cm\u207b\u00b3");
  EXPECT_EQ(parse.unit.dimension, dim::number_density);
}

TEST(ParseQuantity, Errors) {
  EXPECT_NE(error_of("").find("empty"), std::string::npos);
  EXPECT_NE(error_of("   ").find("empty"), std::string::npos);
  EXPECT_NE(error_of("abc").find("expected a number"), std::string::npos);
  EXPECT_NE(error_of("pc 20").find("expected a number"), std::string::npos);
  EXPECT_NE(error_of("+").find("expected a number"), std::string::npos);
  std::string error = error_of("1.2.3 pc");
  EXPECT_NE(error.find("malformed number '1.2.3'"), std::string::npos) << error;
  error = error_of("1,5 pc");
  EXPECT_NE(error.find("malformed number '1,5'"), std::string::npos) << error;
  error = error_of("1e999 K");
  EXPECT_NE(error.find("outside the range"), std::string::npos) << error;
  EXPECT_NE(error_of("nan").find("not finite"), std::string::npos);
  EXPECT_NE(error_of("inf K").find("not finite"), std::string::npos);
  // Unit errors pass through with the offending symbol and the suggestion.
  error = error_of("20 pcc");
  EXPECT_NE(error.find("'pcc'"), std::string::npos) << error;
  EXPECT_NE(error.find("did you mean 'pc'?"), std::string::npos) << error;
  EXPECT_NE(error_of("3 km/").find("trailing '/'"), std::string::npos);
}

}  // namespace
}  // namespace brume::units
