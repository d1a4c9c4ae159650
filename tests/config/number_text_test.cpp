// Strict number parsing and round-trip number formatting.
#include <gtest/gtest.h>

#include <cmath>

#include "io/config/number_text.hpp"

namespace brume::config {
namespace {

TEST(ConfigNumbers, FormattingRoundTrips) {
  for (double value : {0.1, 1.0 / 3.0, 5.0 / 3.0, 1e-8, 6.02214076e23, -2.5, 1e300}) {
    EXPECT_EQ(*parse_number(format_number(value)), value) << format_number(value);
  }
  EXPECT_EQ(format_number(0.3), "0.3");  // shortest form (common practice, no source)
  EXPECT_EQ(format_number(64.0), "64");
}

TEST(ConfigNumbers, ParsingIsStrict) {
  EXPECT_EQ(parse_number("+1.5e3"), 1500.0);
  EXPECT_EQ(parse_number(".5"), 0.5);
  EXPECT_FALSE(parse_number("1.5 pc"));
  EXPECT_FALSE(parse_number("0x10"));
  EXPECT_FALSE(parse_number(""));
  EXPECT_FALSE(parse_number("nan"));
  EXPECT_EQ(parse_integer("-42"), -42);
  EXPECT_FALSE(parse_integer("4.0"));
  EXPECT_FALSE(parse_integer("99999999999999999999"));
}

TEST(ConfigNumbers, NonFiniteSpellings) {
  for (const char* text : {".inf", "-.Inf", ".NaN", "nan", "inf", "Infinity", "1e400"}) {
    EXPECT_TRUE(non_finite(text)) << text;
  }
  for (const char* text : {"1e300", "abc", "0", "1e-400"})
    EXPECT_FALSE(non_finite(text)) << text;
}

}  // namespace
}  // namespace brume::config
