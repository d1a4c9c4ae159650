// The exact accumulator: sums that plain double addition gets wrong, independence of the order
// and of the split over ranks, and the non-finite case. Exact values are by construction
// (integers and powers of two), common practice, no source.
#include <gtest/gtest.h>

#include <algorithm>
#include <bit>
#include <cmath>
#include <cstdint>
#include <limits>
#include <random>
#include <vector>

#include "solver/exact_sum.hpp"
#include "tests/mpi/sub_communicator.hpp"

namespace brume::mpi_testing {
namespace {

using solver::ExactSum;

double sum_of(const std::vector<double>& values) {
  ExactSum s;
  for (const double v : values)
    s.add(v);
  return s.value();
}

TEST(MpiExactSum, CancellationThatDoublesLose) {
  // 1e16 + 1 − 1e16 is 0 in left-to-right double addition, 1 exactly.
  EXPECT_EQ(sum_of({1e16, 1.0, -1e16}), 1.0);
  EXPECT_EQ(sum_of({1e300, 1e-300, -1e300}), 1e-300);
  EXPECT_EQ(sum_of({0x1p-1074, 0x1p-1074, -0x1p-1073}), 0.0);  // subnormals
  EXPECT_EQ(sum_of({0x1p-1074, 3.0 * 0x1p-1074}), 0x1p-1072);
  EXPECT_EQ(sum_of({-2.5, -0.25}), -2.75);
  EXPECT_EQ(sum_of({}), 0.0);
  EXPECT_EQ(sum_of({std::numeric_limits<double>::max(), -std::numeric_limits<double>::max(), 0.5}),
            0.5);
}

TEST(MpiExactSum, ManyCarriesOfLargeAndSmallValues) {
  // 2^20 copies of 0.1 and of −0.1 cancel exactly whatever the order.
  std::vector<double> values;
  for (int i = 0; i < (1 << 20); ++i) {
    values.push_back(0.1);
    values.push_back(-0.1);
  }
  std::mt19937_64 random(3);
  std::shuffle(values.begin(), values.end(), random);
  EXPECT_EQ(sum_of(values), 0.0);
}

TEST(MpiExactSum, NonFiniteGivesNaN) {
  EXPECT_TRUE(std::isnan(sum_of({1.0, std::numeric_limits<double>::infinity()})));
  EXPECT_TRUE(std::isnan(sum_of({std::numeric_limits<double>::quiet_NaN()})));
}

// The same values split over 1, 2, 3 or 4 ranks in different ways: the same bits, and different
// from what naive left-to-right addition gives for one of the orders (so that the test can fail).
TEST(MpiExactSum, SameBitsForAnySplitOverRanks) {
  std::vector<double> values(10000);
  std::mt19937_64 random(42);
  std::lognormal_distribution<double> magnitude(0.0, 8.0);
  for (double& v : values)
    v = (random() % 2 ? 1.0 : -1.0) * magnitude(random);
  const double reference = sum_of(values);
  double forward = 0.0, backward = 0.0;
  for (const double v : values)
    forward += v;
  for (auto v = values.rbegin(); v != values.rend(); ++v)
    backward += *v;
  if (world_rank() == 0) {
    EXPECT_NE(forward, backward) << "naive sums agree: pick other values";
  }
  for (int ranks = 1; ranks <= world_size(); ++ranks) {
    for (int stride : {1, 7}) {
      SubCommunicator sub(ranks);
      if (!sub.member()) continue;
      int rank = 0;
      MPI_Comm_rank(sub.comm(), &rank);
      ExactSum s;
      // Rank r takes every value whose (index / stride) mod ranks is r, in reverse order.
      for (std::size_t i = values.size(); i-- > 0;) {
        if (int((i / std::size_t(stride)) % std::size_t(ranks)) == rank) s.add(values[i]);
      }
      s.combine(sub.comm());
      EXPECT_EQ(std::bit_cast<std::uint64_t>(s.value()), std::bit_cast<std::uint64_t>(reference))
          << ranks << " ranks, stride " << stride;
    }
  }
}

// The rounded result is within one unit in the last place of the exact sum, here known: a value
// of 2^60 plus values that only the exact sum keeps.
TEST(MpiExactSum, RoundsToNearbyDouble) {
  ExactSum s;
  s.add(0x1p60);
  for (int i = 0; i < 1024; ++i)
    s.add(1.0);  // 2^60 + 2^10: exactly representable
  EXPECT_EQ(s.value(), 0x1p60 + 0x1p10);
}

}  // namespace
}  // namespace brume::mpi_testing
