// The building blocks of the histograms: logarithmic bin slots and the exact per-bin sums of the
// mass weights (against Python's math.fsum, the correctly rounded sum of Shewchuk 1997).
#include <gtest/gtest.h>

#include <cmath>
#include <cstdint>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <limits>
#include <sstream>
#include <vector>

#include "physics/distributions_exact_bins.hpp"
#include "physics/distributions_log_bins.hpp"
#include "tests/support/run_python.hpp"

namespace brume::physics {
namespace {

// One bin per decade from 1 to 1e10: slots by the definition of logarithmic bins (common
// practice, no source); non-positive values below, NaN undefined, +inf above.
TEST(DistributionsBins, SlotsOfLogarithmicBins) {
  const LogBins bins{10, 1.0, 1e10};
  const LogBinner b(bins);
  EXPECT_EQ(b.slot(1.0), 0u);
  EXPECT_EQ(b.slot(5.0), 0u);
  EXPECT_EQ(b.slot(50.0), 1u);
  EXPECT_EQ(b.slot(5e9), 9u);
  EXPECT_EQ(b.slot(1e10), bins.overflow());
  EXPECT_EQ(b.slot(std::numeric_limits<double>::infinity()), bins.overflow());
  EXPECT_EQ(b.slot(0.5), bins.underflow());
  EXPECT_EQ(b.slot(0.0), bins.underflow());
  EXPECT_EQ(b.slot(-3.0), bins.underflow());
  EXPECT_EQ(b.slot(std::numeric_limits<double>::quiet_NaN()), bins.undefined());
  const std::vector<double> e = bins.edges();
  ASSERT_EQ(e.size(), 11u);
  for (std::size_t k = 0; k <= 10; ++k)  // 10^k to rounding of pow (a few ulp)
    EXPECT_NEAR(e[k] / std::pow(10.0, double(k)), 1.0, 1e-14) << k;
  EXPECT_NEAR(bins.centres()[3] / std::sqrt(1e7), 1.0, 1e-14);
}

// Ten times the double nearest 0.1 is 1 + 2^-54·(…) exactly, which rounds to 1.0, while adding
// in double precision gives 0.9999999999999999 (IEEE 754 binary64; common practice, no source).
TEST(DistributionsBins, ExactSumOfTenthsIsOne) {
  ExactBinSums sums(1, ExponentWindow{-3, -3});
  double naive = 0.0;
  for (int i = 0; i < 10; ++i) {
    sums.add(0, 0.1);
    naive += 0.1;
  }
  EXPECT_NE(naive, 1.0);
  EXPECT_EQ(sums.value(0), 1.0);
  EXPECT_EQ(sums.total(), 1.0);
}

std::vector<double> spread_values(std::size_t n) {
  std::vector<double> v(n);
  std::uint64_t x = 88172645463325252ULL;  // xorshift64 (Marsaglia 2003, J. Stat. Softw. 8)
  for (double& value : v) {
    x ^= x << 13;
    x ^= x >> 7;
    x ^= x << 17;
    const double u = double(x >> 11) * 0x1p-53;  // [0, 1)
    value = std::pow(10.0, -8.0 + 16.0 * u);     // 1e-8 … 1e8
  }
  return v;
}

// Three bins of 20000 weights spanning 16 decades: each bin against math.fsum (correctly rounded;
// ours is within one unit in the last place, hence the tolerance of 1 ulp), the same bits when
// added in reverse order, and the total the exact sum of the bins.
TEST(DistributionsBins, ExactSumsMatchFsumInAnyOrder) {
  const std::vector<double> v = spread_values(20000);
  ExponentWindow window{0, 0};
  window.lowest = std::numeric_limits<int>::max();
  window.highest = std::numeric_limits<int>::min();
  for (const double x : v) {
    int e = 0;
    static_cast<void>(std::frexp(x, &e));
    window.lowest = std::min(window.lowest, e);
    window.highest = std::max(window.highest, e);
  }
  ExactBinSums forward(3, window), backward(3, window);
  for (std::size_t i = 0; i < v.size(); ++i)
    forward.add(i % 3, v[i]);
  for (std::size_t i = v.size(); i-- > 0;)
    backward.add(i % 3, v[i]);
  const std::filesystem::path file =
      std::filesystem::temp_directory_path() / "brume-distributions-fsum.txt";
  {
    std::ofstream out(file);
    char text[32];
    for (std::size_t i = 0; i < v.size(); ++i) {
      std::snprintf(text, sizeof text, "%zu %.17g\n", i % 3, v[i]);
      out << text;
    }
  }
  const auto reference = brume::testing::run_python(
      brume::testing::source_script("tests/physics/distributions_reference.py"),
      {"fsum", file.string(), "3"});
  std::filesystem::remove(file);
  ASSERT_EQ(reference.exit_code, 0) << reference.output;
  std::istringstream lines(reference.output);
  for (std::size_t b = 0; b < 3; ++b) {
    double expected = 0.0;
    ASSERT_TRUE(lines >> expected);
    EXPECT_EQ(forward.value(b), backward.value(b)) << b;
    EXPECT_LE(std::fabs(forward.value(b) - expected), std::nextafter(expected, 1e300) - expected)
        << b;
  }
  double total = 0.0;
  ASSERT_TRUE(lines >> total);
  EXPECT_LE(std::fabs(forward.total() - total), std::nextafter(total, 1e300) - total);
  EXPECT_EQ(forward.total(), backward.total());
}

// Weights outside the window, zero, negative and non-finite are not added (documented).
TEST(DistributionsBins, WeightsOutsideTheWindowAreNotAdded) {
  ExactBinSums sums(1, ExponentWindow{1, 2});  // [1, 4)
  for (const double w : {0.0, -2.0, 0.5, 4.0, std::numeric_limits<double>::infinity(),
                         std::numeric_limits<double>::quiet_NaN()})
    sums.add(0, w);
  EXPECT_EQ(sums.value(0), 0.0);
  sums.add(0, 3.5);
  sums.add(0, 1.0);
  EXPECT_EQ(sums.value(0), 4.5);
}

}  // namespace
}  // namespace brume::physics
