// The least-squares slope and its standard error against scipy.stats.linregress (Debian scipy
// 1.10, run once through /usr/bin/python3: slope and stderr printed with repr). Tolerance 1e-13
// relative: a few roundings of sums of a handful of terms.
#include <gtest/gtest.h>

#include <cmath>
#include <vector>

#include "physics/structure_fit.hpp"

namespace brume::physics {
namespace {

TEST(StructureFit, MatchesScipyLinregress) {
  // linregress([0, 1, 2, 3], [0, 1, 1, 3]): slope 0.9, stderr 0.26457513110645886.
  const SlopeFit a = least_squares_slope({0, 1, 2, 3}, {0, 1, 1, 3});
  EXPECT_NEAR(a.slope, 0.9, 1e-13);
  EXPECT_NEAR(a.error, 0.26457513110645886, 1e-13 * 0.27);
  EXPECT_EQ(a.points, 4);
  // linregress(log([2, 3, 4, 5, 6, 8, 11]), [0.3, 0.5, 0.55, 0.8, 0.9, 1.2, 1.3]):
  // slope 0.6268461875723338, stderr 0.0530893241999691.
  std::vector<double> x;
  for (const double l : {2.0, 3.0, 4.0, 5.0, 6.0, 8.0, 11.0})
    x.push_back(std::log(l));
  const SlopeFit b = least_squares_slope(x, {0.3, 0.5, 0.55, 0.8, 0.9, 1.2, 1.3});
  EXPECT_NEAR(b.slope, 0.6268461875723338, 1e-13 * 0.63);
  EXPECT_NEAR(b.error, 0.0530893241999691, 1e-13 * 0.053);
}

TEST(StructureFit, TooFewPointsGiveNaN) {
  const SlopeFit two = least_squares_slope({1, 2}, {1, 3});
  EXPECT_DOUBLE_EQ(two.slope, 2.0);  // a line through two points (common practice, no source)
  EXPECT_TRUE(std::isnan(two.error));
  EXPECT_TRUE(std::isnan(least_squares_slope({1}, {1}).slope));
  EXPECT_TRUE(std::isnan(least_squares_slope({2, 2, 2}, {1, 2, 3}).slope));  // no spread in x
}

}  // namespace
}  // namespace brume::physics
