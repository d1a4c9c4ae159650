// The distributions diagnostic on synthetic blocks whose cells are set to chosen values, so that
// every count is known exactly (by construction; common practice, no source), and its
// equilibrium curve against scipy.optimize.brentq (tests/physics/distributions_reference.py).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <limits>
#include <numeric>
#include <sstream>
#include <string>
#include <vector>

#include "physics/distributions_diagnostic.hpp"
#include "solver/units/constants.hpp"
#include "tests/physics/distributions_test_support.hpp"
#include "tests/physics/measurement_lookup.hpp"
#include "tests/support/run_python.hpp"

namespace brume::physics {
namespace {

using testing::array_named;
using testing::CellValues;
using testing::number_named;
namespace cgs = units::cgs;

DistributionsSettings small_bins() {
  DistributionsSettings s;
  s.density = {4, 1e-2, 1e2};      // one decade per bin, cm^-3
  s.pressure = {2, 1e2, 1e4};      // K cm^-3
  s.temperature = {3, 10.0, 1e4};  // K
  s.plasma_beta = {2, 0.1, 10.0};
  s.dynamic_ratio = {2, 0.1, 10.0};
  s.field = {3, 1e-3, 1e3};  // μG
  return s;
}

// Number densities by x index (cm^-3): bins 0, 1, 2, 3, 1, 2, overflow, underflow.
constexpr double kDensity[8] = {0.03, 0.3, 3.0, 30.0, 0.3, 3.0, 1e3, 1e-3};
// P/k_B by y index (K cm^-3): bins 0, 1, 1, overflow.
constexpr double kPressure[4] = {300.0, 3000.0, 3000.0, 1e5};

// The block 8 × 4 × 2 of 1 pc cells; code density = n / (code n per cm^-3).
CellValues chosen(long i, long j, long k, const RunContext& c) {
  CellValues v;
  const double n_unit = c.code_units.density / cgs::hydrogen_mass;  // μ = 1
  v.density = kDensity[i] / n_unit;
  v.pressure = kPressure[j] * cgs::boltzmann / c.code_units.pressure();
  v.temperature = k == 0 ? 50.0 : std::numeric_limits<double>::quiet_NaN();
  const double beta = k == 0 ? 0.3 : 3.0;
  const double b = std::sqrt(2.0 * v.pressure / beta);
  v.field = {b, 0.0, 0.0};
  const double ratio = i % 2 == 0 ? 0.3 : 30.0;
  v.velocity = {0.0, std::sqrt(ratio * b * b / v.density), 0.0};
  return v;
}

struct Measured {
  RunContext context;
  io::Measurement m;
};

Measured measure_chosen(bool magnetic) {
  Measured r{testing::synthetic_context({8, 4, 2}, magnetic), {}};
  const CellQuantities q =
      testing::synthetic_cells({8, 4, 2}, {0, 0, 0}, {8, 4, 2},
                               [&](long i, long j, long k) { return chosen(i, j, k, r.context); });
  const DistributionsDiagnostic d(small_bins(), std::nullopt);
  r.m = d.measure(q, r.context);
  return r;
}

double sum_of(const std::vector<double>& v) {
  return std::accumulate(v.begin(), v.end(), 0.0);
}

TEST(DistributionsDiagnostic, DensityPdfCountsEveryCell) {
  const io::Measurement m = measure_chosen(true).m;
  EXPECT_EQ(number_named(m, "cells"), 64.0);
  const auto& v = array_named(m, "density_volume_fraction").values;
  ASSERT_EQ(v.size(), 4u);
  // 8 cells per x index: bins hold 1, 2, 2, 1 x indices. Exact: k/64 is a binary fraction.
  EXPECT_EQ(v[0], 8.0 / 64);
  EXPECT_EQ(v[1], 16.0 / 64);
  EXPECT_EQ(v[2], 16.0 / 64);
  EXPECT_EQ(v[3], 8.0 / 64);
  EXPECT_EQ(number_named(m, "density_volume_underflow"), 8.0 / 64);
  EXPECT_EQ(number_named(m, "density_volume_overflow"), 8.0 / 64);
  EXPECT_EQ(number_named(m, "density_volume_undefined"), 0.0);
  // Mass fraction of a bin: its densities over all of them (equal volumes). The exact sums are
  // rounded once each, the quotient once more: 1e-15 covers a few ulp.
  const double all = sum_of(std::vector<double>(std::begin(kDensity), std::end(kDensity)));
  const auto& w = array_named(m, "density_mass_fraction").values;
  EXPECT_NEAR(w[0], 0.03 / all, 1e-15 * w[0]);
  EXPECT_NEAR(w[1], 0.6 / all, 1e-15 * w[1]);
  EXPECT_NEAR(w[2], 6.0 / all, 1e-15 * w[2]);
  EXPECT_NEAR(w[3], 30.0 / all, 1e-15 * w[3]);
  EXPECT_NEAR(number_named(m, "density_mass_overflow"), 1e3 / all, 1e-15);
  EXPECT_NEAR(number_named(m, "density_mass_underflow"), 1e-3 / all, 1e-15);
  const auto& e = array_named(m, "density_edges");
  EXPECT_EQ(e.unit, "cm^-3");
  EXPECT_EQ(e.to_cgs, 1.0);
  EXPECT_NEAR(e.values[1], 0.1, 1e-16);
}

TEST(DistributionsDiagnostic, PhaseDiagramCountsJointBins) {
  const io::Measurement m = measure_chosen(true).m;
  const auto& v = array_named(m, "phase_volume_fraction");
  ASSERT_EQ(v.shape, (std::vector<std::size_t>{4, 2}));
  // [n bin][P bin]: n bin 1 holds x = 1, 4; P bin 1 holds y = 1, 2; two z: 8 cells.
  EXPECT_EQ(v.values[1 * 2 + 1], 8.0 / 64);
  EXPECT_EQ(v.values[1 * 2 + 0], 4.0 / 64);
  EXPECT_EQ(v.values[3 * 2 + 0], 2.0 / 64);
  // Outside: x = 6, 7 (16 cells) or y = 3 (16), 4 counted twice.
  EXPECT_EQ(number_named(m, "phase_volume_outside"), 28.0 / 64);
  EXPECT_NEAR(sum_of(v.values) + number_named(m, "phase_volume_outside"), 1.0, 1e-15);
  const auto& w = array_named(m, "phase_mass_fraction").values;
  EXPECT_NEAR(sum_of(w) + number_named(m, "phase_mass_outside"), 1.0, 1e-15);
  EXPECT_EQ(array_named(m, "phase_pressure_edges").unit, "K cm^-3");
  EXPECT_EQ(array_named(m, "phase_pressure_edges").to_cgs, cgs::boltzmann);
  EXPECT_NEAR(array_named(m, "phase_pressure_edges").values[1], 1e3, 1e-12);
}

TEST(DistributionsDiagnostic, TemperatureNanIsUndefined) {
  const io::Measurement m = measure_chosen(true).m;
  const auto& v = array_named(m, "temperature_volume_fraction").values;
  EXPECT_EQ(v[0], 0.5);  // T = 50 K: the first bin [10, 100) K
  EXPECT_EQ(v[1] + v[2], 0.0);
  EXPECT_EQ(number_named(m, "temperature_volume_undefined"), 0.5);
  EXPECT_NEAR(number_named(m, "temperature_mass_undefined"), 0.5, 1e-15);  // same n on each z
}

TEST(DistributionsDiagnostic, MagneticPdfs) {
  const io::Measurement m = measure_chosen(true).m;
  const auto& beta = array_named(m, "plasma_beta_volume_fraction").values;
  // β = 2p/B² = 0.3 on z = 0, 3 on z = 1 to rounding of sqrt and squares, far from the edges.
  EXPECT_EQ(beta[0], 0.5);
  EXPECT_EQ(beta[1], 0.5);
  const auto& ratio = array_named(m, "dynamic_ratio_volume_fraction").values;
  EXPECT_EQ(ratio[0], 0.5);  // even x: ρv²/B² = 0.3
  EXPECT_EQ(ratio[1], 0.0);
  EXPECT_EQ(number_named(m, "dynamic_ratio_volume_overflow"), 0.5);  // odd x: 30
  const auto& fd = array_named(m, "field_density_volume_fraction");
  EXPECT_EQ(fd.shape, (std::vector<std::size_t>{4, 3}));
  EXPECT_NEAR(sum_of(fd.values) + number_named(m, "field_density_volume_outside"), 1.0, 1e-15);
  EXPECT_EQ(array_named(m, "field_density_field_edges").unit, "uG");
}

TEST(DistributionsDiagnostic, HydrodynamicsHasNoMagneticPdfsAndSaysSo) {
  const io::Measurement m = measure_chosen(false).m;
  EXPECT_FALSE(testing::has_array(m, "plasma_beta_volume_fraction"));
  EXPECT_FALSE(testing::has_array(m, "field_density_volume_fraction"));
  EXPECT_NE(testing::note_named(m, "magnetic_histograms").find("not magnetized"),
            std::string::npos);
  EXPECT_NE(testing::note_named(m, "equilibrium_curve").find("cooling is off"), std::string::npos);
  EXPECT_FALSE(testing::has_array(m, "phase_equilibrium_pressure"));
}

// P_eq(n)/k_B at the density bin centres against brentq of the same Koyama & Inutsuka 2002 fit
// (physics/cooling_curve.cpp). Both solve to ~1e-15 relative; 1e-10 leaves room for their
// different iterations and for the steep warm branch.
TEST(DistributionsDiagnostic, EquilibriumCurveMatchesBrentq) {
  CoolingSettings cooling;
  cooling.enabled = true;
  const LogBins density{24, 1e-2, 1e4};
  const EquilibriumCurve curve = equilibrium_curve(cooling, density);
  std::vector<std::string> arguments{"equilibrium", "2e-26", "10", "1e9"};
  char text[32];
  for (const double n : curve.density) {
    std::snprintf(text, sizeof text, "%.17g", n);
    arguments.emplace_back(text);
  }
  const auto reference = brume::testing::run_python(
      brume::testing::source_script("tests/physics/distributions_reference.py"), arguments);
  ASSERT_EQ(reference.exit_code, 0) << reference.output;
  std::istringstream lines(reference.output);
  const std::vector<double> edges = density.edges();
  double largest = 0.0;
  for (std::size_t k = 0; k < curve.density.size(); ++k) {
    double expected = 0.0;
    ASSERT_TRUE(lines >> expected);
    EXPECT_EQ(curve.density[k], std::sqrt(edges[k] * edges[k + 1]));
    EXPECT_NEAR(curve.pressure[k] / expected, 1.0, 1e-10) << "n " << curve.density[k];
    largest = std::max(largest, std::fabs(curve.pressure[k] / expected - 1.0));
  }
  std::printf("[equilibrium curve] 24 densities, largest relative difference to brentq %.3g\n",
              largest);
  // Stored beside the diagram, as P/k_B with the factor k_B to erg cm^-3.
  DistributionsSettings s = small_bins();
  s.density = density;
  const RunContext c = testing::synthetic_context({2, 1, 1}, false);
  const CellQuantities q = testing::synthetic_cells({2, 1, 1}, {0, 0, 0}, {2, 1, 1},
                                                    [](long, long, long) { return CellValues{}; });
  const io::Measurement m = DistributionsDiagnostic(s, curve).measure(q, c);
  const auto& p = array_named(m, "phase_equilibrium_pressure");
  EXPECT_EQ(p.values, curve.pressure);
  EXPECT_EQ(p.to_cgs, cgs::boltzmann);
  EXPECT_EQ(testing::note_named(m, "equilibrium_curve"), "");
}

}  // namespace
}  // namespace brume::physics
