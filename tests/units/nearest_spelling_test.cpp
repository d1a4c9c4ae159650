// edit_distance and nearest_spelling ("did you mean").
#include "solver/units/nearest_spelling.hpp"

#include <gtest/gtest.h>

#include <array>

namespace brume::units {
namespace {

TEST(EditDistance, TextbookExamples) {
  // Levenshtein distance; "kitten" → "sitting" is 3 (the classic textbook example, from memory).
  EXPECT_EQ(edit_distance("kitten", "sitting"), 3);
  EXPECT_EQ(edit_distance("", "abc"), 3);
  EXPECT_EQ(edit_distance("pc", "pc"), 0);
  EXPECT_EQ(edit_distance("pcc", "pc"), 1);
  // Counted in code points: μ (two bytes in UTF-8) against u is one substitution.
  EXPECT_EQ(edit_distance("\u03bcG", "uG"), 1);
  EXPECT_EQ(edit_distance("\u03bcG", "\u00b5G"), 1);
}

TEST(NearestSpelling, PicksTheClosestCloseCandidate) {
  constexpr std::array<std::string_view, 6> candidates{"cm", "pc", "kpc", "M_sun", "K", "km"};
  EXPECT_EQ(nearest_spelling("pcc", candidates), "pc");
  EXPECT_EQ(nearest_spelling("Msun", candidates), "M_sun");
  EXPECT_EQ(nearest_spelling("KPC", candidates), "kpc");  // case differences count first as zero
  EXPECT_EQ(nearest_spelling("k", candidates), "K");      // one letter: only another case
  EXPECT_FALSE(nearest_spelling("x", candidates).has_value());
  EXPECT_FALSE(nearest_spelling("furlong", candidates).has_value());
  EXPECT_FALSE(nearest_spelling("pc", candidates).has_value());  // known: no suggestion
  EXPECT_FALSE(nearest_spelling("", candidates).has_value());
}

}  // namespace
}  // namespace brume::units

namespace brume::units {
namespace {

TEST(NearestSpelling, AdjacentTranspositionCountsOnce) {
  // An adjacent transposition counts once (Damerau 1964; common practice, no source).
  EXPECT_EQ(edit_distance("courant", "cuorant"), 1);
  // Optimal string alignment does not edit a transposed pair again: "ca" -> "abc" is 3 (from
  // memory).
  EXPECT_EQ(edit_distance("ca", "abc"), 3);
}

TEST(NearestSpelling, NamesAreMoreLenientThanSymbols) {
  const std::vector<std::string> names{"cells", "size", "origin"};
  EXPECT_EQ(nearest_name("cels", names), "cells");
  EXPECT_EQ(nearest_name("orign", names), "origin");
  EXPECT_EQ(nearest_name("Cells", names), "cells");
  EXPECT_EQ(nearest_name("resolution", names), std::nullopt);
  EXPECT_EQ(nearest_name("x", {"y"}), std::nullopt);  // replacing the whole word is no suggestion
}

}  // namespace
}  // namespace brume::units
