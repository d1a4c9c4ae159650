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
  faces_at<PpmExtremumPreserving>(q, 5, l, r);
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
    // Colella & Sekora 2008, §3: at a jump the second differences change sign, so the extremum
    // limiter flattens just as eq. 1.10 of Colella & Woodward 1984 does.
    faces_at<PpmExtremumPreserving>(q, c, l, r);
    EXPECT_GE(l, 0.1 - 1e-15);
    EXPECT_LE(l, 1.0 + 1e-15);
    EXPECT_GE(r, 0.1 - 1e-15);
    EXPECT_LE(r, 1.0 + 1e-15);
  }
}

// Largest error of the edge values against the exact point values, over all cells of a sampled
// sine: cell means of sin(2πx + φ) on n cells (φ = 0.3 puts the extrema off the faces).
template <class R>
double sine_edge_error(int n) {
  const double h = 1.0 / n, phi = 0.3, k = 2 * 3.14159265358979323846;
  std::vector<double> avg(std::size_t(n + 4));
  for (int i = -2; i < n + 2; ++i) {  // two ghost cells on each side (periodic data)
    const double x0 = i * h, x1 = (i + 1) * h;
    avg[std::size_t(i + 2)] = (std::cos(k * x0 + phi) - std::cos(k * x1 + phi)) / (k * h);
  }
  double error = 0.0;
  for (int i = 0; i < n; ++i) {
    double lo, hi;
    R::edges(ArrayReader{avg.data()}, i + 2, 1, lo, hi);
    error = std::fmax(error, std::fabs(lo - std::sin(k * i * h + phi)));
    error = std::fmax(error, std::fabs(hi - std::sin(k * (i + 1) * h + phi)));
  }
  return error;
}

// Smooth extrema are kept by the extremum-preserving limiter (Colella & Sekora 2008, §3): on a
// sampled sine its edges are the fourth-order interface values everywhere, so the largest edge
// error falls by ≈ 16 per halving of h (≥ 12 required: the extrema move relative to the grid);
// the monotone limiter (Colella & Woodward 1984, eq. 1.10) flattens the cells at the extrema,
// an O(h²) error (ratio ≈ 4), so at 128 cells it is more than ten times larger.
TEST(Reconstruction, ExtremumPreservingPpmKeepsSmoothExtrema) {
  const double ep64 = sine_edge_error<PpmExtremumPreserving>(64);
  const double ep128 = sine_edge_error<PpmExtremumPreserving>(128);
  const double mono128 = sine_edge_error<Ppm>(128);
  EXPECT_GT(ep64 / ep128, 12.0) << ep64 << " " << ep128;
  EXPECT_LT(ep128, 0.1 * mono128) << ep128 << " " << mono128;
  // A maximum at the centre of cell 3 of 16: the monotone limiter flattens that cell (eq. 1.10,
  // first case: both edges on the same side of the mean), the extremum-preserving one keeps its
  // edges near the exact values. Required: within a fifth of the flattening error q̄ − f(edge)
  // (the fourth-order error here is ≈ h⁴k⁴/30 ≈ 8e-4 of 1.3e-2, from the Taylor series).
  const double h = 1.0 / 16, k = 2 * 3.14159265358979323846;
  const double phi = 0.5 * 3.14159265358979323846 - k * 3.5 * h;
  std::vector<double> avg(20);
  for (int i = -2; i < 18; ++i)
    avg[std::size_t(i + 2)] =
        (std::cos(k * i * h + phi) - std::cos(k * (i + 1) * h + phi)) / (k * h);
  const double mean = avg[5], exact_lo = std::sin(k * 3 * h + phi),
               exact_hi = std::sin(k * 4 * h + phi);
  double lo, hi;
  Ppm::edges(ArrayReader{avg.data()}, 3 + 2, 1, lo, hi);
  EXPECT_EQ(lo, mean);
  EXPECT_EQ(hi, mean);
  PpmExtremumPreserving::edges(ArrayReader{avg.data()}, 3 + 2, 1, lo, hi);
  EXPECT_LT(std::fabs(lo - exact_lo), 0.2 * (mean - exact_lo)) << lo << " " << mean;
  EXPECT_LT(std::fabs(hi - exact_hi), 0.2 * (mean - exact_hi)) << hi << " " << mean;
}

// The curvature limiter (Colella & Sekora 2008, eqs. 18 and 26, from memory): the smallest of
// |D²| and C |D²_k| with the common sign, zero when the signs differ; C = 1.25.
TEST(Reconstruction, CurvatureLimiterMatchesItsDefinition) {
  using P = PpmExtremumPreserving;
  EXPECT_DOUBLE_EQ(P::limited_curvature(-1.0, -2.0, -3.0, -4.0), -1.0);
  EXPECT_DOUBLE_EQ(P::limited_curvature(4.0, 2.0, 3.0, 5.0), 2.5);  // 1.25 · 2
  EXPECT_EQ(P::limited_curvature(1.0, 2.0, -3.0, 4.0), 0.0);
  EXPECT_EQ(P::limited_curvature(0.0, 2.0, 3.0, 4.0), 0.0);
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
