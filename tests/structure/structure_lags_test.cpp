// The lag sets. Expected lists by hand from their definition (physics/structure_lags.hpp):
// round(2^(k/4)) for k = 0 … 20 is 1 1 1 2 2 2 3 3 4 5 6 7 8 10 11 13 16 19 23 27 32 (common
// practice, no source).
#include <gtest/gtest.h>

#include <vector>

#include "physics/structure_lags.hpp"

namespace brume::physics {
namespace {

TEST(StructureLags, EveryCellIsOneToHalf) {
  EXPECT_EQ(structure_lags(StructureLagSet::every_cell, 4, 5), (std::vector<long>{1, 2, 3, 4, 5}));
  EXPECT_TRUE(structure_lags(StructureLagSet::every_cell, 4, 0).empty());
}

TEST(StructureLags, LogarithmicQuarterOctaves) {
  EXPECT_EQ(structure_lags(StructureLagSet::logarithmic, 4, 32),
            (std::vector<long>{1, 2, 3, 4, 5, 6, 7, 8, 10, 11, 13, 16, 19, 23, 27, 32}));
}

TEST(StructureLags, LogarithmicKeepsHalfTheBox) {
  // Octaves 1 2 4 8 16, then 24 (= N/2 of a 48-cell axis) appended.
  EXPECT_EQ(structure_lags(StructureLagSet::logarithmic, 1, 24),
            (std::vector<long>{1, 2, 4, 8, 16, 24}));
  EXPECT_EQ(structure_lags(StructureLagSet::logarithmic, 2, 1), (std::vector<long>{1}));
}

}  // namespace
}  // namespace brume::physics
