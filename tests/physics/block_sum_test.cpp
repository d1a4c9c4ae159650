// The fast block-local exact sum of the source terms gives the same bits as solver::ExactSum, the
// shared exact accumulator (Kulisch & Miranker 1986, SIAM Review 28, 1, for the idea), over values
// of every sign and magnitude, subnormals included, and sums that cancel exactly. Tolerance: none.
#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <vector>

#include "physics/block_sum.hpp"
#include "physics/stirring_random.hpp"

namespace brume::physics {
namespace {

double through_block(const std::vector<double>& values) {
  BlockSum block;
  for (double v : values)
    block.add(v);
  solver::ExactSum sum;
  block.add_to(sum);
  return sum.value();
}

double through_exact(const std::vector<double>& values) {
  solver::ExactSum sum;
  for (double v : values)
    sum.add(v);
  return sum.value();
}

TEST(BlockSum, MatchesTheSharedExactSum) {
  std::vector<double> values;
  for (std::uint64_t n = 0; n < 20000; ++n) {
    const NormalPair z = stirring_normal_pair(3, n);
    // Magnitudes from 2^-1074 (subnormal) to ~2^1000, both signs.
    const int exponent = int(std::fmod(std::fabs(z.second) * 1000.0, 2070.0)) - 1070;
    values.push_back(std::ldexp(z.first, exponent));
  }
  values.push_back(std::numeric_limits<double>::denorm_min());
  values.push_back(-std::numeric_limits<double>::max());
  EXPECT_EQ(through_block(values), through_exact(values));
  std::vector<double> small(values.begin(), values.begin() + 100);
  for (double& v : small)
    v = std::ldexp(v, -600);
  EXPECT_EQ(through_block(small), through_exact(small));
}

TEST(BlockSum, CancelsExactly) {
  // 1e16 + 1 − 1e16 is 1 exactly, and x − x is 0, where a double sum loses the 1.
  EXPECT_EQ(through_block({1e16, 1.0, -1e16}), 1.0);
  EXPECT_EQ(through_block({-3.5, 1e-300, 3.5, -1e-300}), 0.0);
  EXPECT_EQ(through_block({-1e-320, -2.0}), -2.0);  // a negative total of mixed magnitudes
  EXPECT_TRUE(std::isnan(through_block({1.0, std::numeric_limits<double>::infinity()})));
}

}  // namespace
}  // namespace brume::physics
