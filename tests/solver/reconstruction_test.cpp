#include "solver/reconstruction.hpp"

#include <gtest/gtest.h>

#include <cmath>
#include <vector>

#include "solver/ppm.hpp"

namespace brume::solver {
namespace {

template <class R>
void faces_at(const std::vector<double>& q, int c, double& l, double& r) {
  face_states<R>(ArrayReader{q.data()}, c, 1, l, r);
}

// Linear data are reconstructed exactly by every second-order scheme (common practice).
TEST(Reconstruction, LinearDataAreExact) {
  std::vector<double> q(10);
  for (int i = 0; i < 10; ++i)
    q[std::size_t(i)] = 3.0 + 0.5 * i;  // face c at 3 + 0.5 (c − ½)
  double l, r;
  const double exact = 3.0 + 0.5 * 4.5;
  faces_at<PlmMonotonizedCentral>(q, 5, l, r);
  EXPECT_NEAR(l, exact, 1e-14);
  EXPECT_NEAR(r, exact, 1e-14);
  faces_at<PlmVanLeer>(q, 5, l, r);
  EXPECT_NEAR(l, exact, 1e-14);
  EXPECT_NEAR(r, exact, 1e-14);
  faces_at<Ppm>(q, 5, l, r);
  EXPECT_NEAR(l, exact, 1e-14);
  EXPECT_NEAR(r, exact, 1e-14);
  faces_at<DonorCell>(q, 5, l, r);
  EXPECT_EQ(l, q[4]);
  EXPECT_EQ(r, q[5]);
}

// At a smooth monotone profile the PPM interface value is fourth-order accurate
// (Colella & Woodward 1984, eq. 1.6 is exact for cubics when the slopes are not limited); PLM
// faces are second-order. Measured by halving h: error ratios ≈ 16 and ≈ 4.
TEST(Reconstruction, PpmIsFourthOrderAndPlmSecondOrderOnSmoothData) {
  double ppm_error[2], plm_error[2];  // exact averages of q = x³ + x on [0.5, 0.5 + 12h]
  for (int r = 0; r < 2; ++r) {
    const double h = 0.005 / (1 << r);
    const int n = 12;
    std::vector<double> avg(static_cast<std::size_t>(n));
    auto primitive = [](double x) { return 0.25 * x * x * x * x + 0.5 * x * x; };
    const double x0 = 0.5;
    for (int i = 0; i < n; ++i) {
      avg[std::size_t(i)] = (primitive(x0 + (i + 1) * h) - primitive(x0 + i * h)) / h;
    }
    const int c = 6;
    const double xf = x0 + c * h;
    const double exact = xf * xf * xf + xf;
    double l, rr;
    faces_at<Ppm>(avg, c, l, rr);
    ppm_error[r] = std::fmax(std::fabs(l - exact), std::fabs(rr - exact));
    faces_at<PlmMonotonizedCentral>(avg, c, l, rr);
    plm_error[r] = std::fmax(std::fabs(l - exact), std::fabs(rr - exact));
  }
  EXPECT_LT(ppm_error[1], 1e-9);                // cubic data: eq. 1.6 is exact up to round-off
  EXPECT_GT(plm_error[0] / plm_error[1], 3.5);  // second order: ratio 4 (tolerance ±0.5)
  EXPECT_LT(plm_error[0] / plm_error[1], 4.5);
}

// No new extrema at a discontinuity (the limiters' purpose; van Leer 1979; Colella & Woodward
// 1984, eq. 1.10): face states stay within the range of the neighbouring cell values.
TEST(Reconstruction, StepCreatesNoNewExtrema) {
  std::vector<double> q = {1, 1, 1, 1, 1, 0.1, 0.1, 0.1, 0.1, 0.1};
  for (int c = 3; c <= 7; ++c) {
    double l, r;
    faces_at<PlmMonotonizedCentral>(q, c, l, r);
    EXPECT_GE(l, 0.1);
    EXPECT_LE(l, 1.0);
    EXPECT_GE(r, 0.1);
    EXPECT_LE(r, 1.0);
    faces_at<Ppm>(q, c, l, r);
    EXPECT_GE(l, 0.1 - 1e-15);
    EXPECT_LE(l, 1.0 + 1e-15);
    EXPECT_GE(r, 0.1 - 1e-15);
    EXPECT_LE(r, 1.0 + 1e-15);
  }
}

TEST(Reconstruction, LimitersVanishAtExtremaAndMatchTheirDefinitions) {
  EXPECT_EQ(MonotonizedCentral::slope(1.0, -1.0), 0.0);
  EXPECT_EQ(VanLeerLimiter::slope(-2.0, 3.0), 0.0);
  EXPECT_DOUBLE_EQ(MonotonizedCentral::slope(1.0, 3.0), 2.0);  // min(2, 2, 6)
  EXPECT_DOUBLE_EQ(MonotonizedCentral::slope(0.1, 1.0), 0.2);  // 2Δ− limits
  EXPECT_DOUBLE_EQ(VanLeerLimiter::slope(1.0, 3.0), 1.5);      // 2·3/4
}

}  // namespace
}  // namespace brume::solver
