// The spectra diagnostic on one rank, on synthetic fields whose spectra are known in closed form:
// single Fourier modes land in their shell with their amplitude, gradients are all compressive
// and curls all solenoidal, and every spectrum sums to half the real-space mean square.
#include <gtest/gtest.h>
#include <mpi.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <numbers>
#include <numeric>
#include <string>

#include "physics/spectra_diagnostic.hpp"
#include "tests/support/spectra_synthetic_cells.hpp"

namespace brume::physics {
namespace {

using testing::spectra_box;
using testing::spectra_context;
using testing::SpectraCell;

constexpr double two_pi = 2.0 * std::numbers::pi;

const io::MeasuredArray& array(const io::Measurement& m, const std::string& name) {
  for (const io::MeasuredArray& a : m.arrays)
    if (a.name == name) return a;
  throw std::runtime_error("no array " + name);
}

bool has_array(const io::Measurement& m, const std::string& name) {
  return std::any_of(m.arrays.begin(), m.arrays.end(),
                     [&](const io::MeasuredArray& a) { return a.name == name; });
}

double number(const io::Measurement& m, const std::string& name) {
  for (const io::MeasuredNumber& n : m.numbers)
    if (n.name == name) return n.value;
  throw std::runtime_error("no number " + name);
}

double total(const io::MeasuredArray& a) {
  return std::accumulate(a.values.begin(), a.values.end(), 0.0);
}

template <class F>
io::Measurement measured(const std::array<long, 3>& box, F cell,
                         const std::array<double, 3>& size = {1.0, 1.0, 1.0}) {
  const SpectraDiagnostic spectra(SpectraFields{});
  return spectra.measure(spectra_box(box, cell), spectra_context(box, MPI_COMM_SELF, size));
}

// Cell centres in a unit box: x = (i + 1/2) / N.
double centre(long i, long n) {
  return (double(i) + 0.5) / double(n);
}

// A cosine of amplitude A has mean square A²/2, split over the modes ±k: E = A²/4 in its shell
// (Parseval, common practice, no source). |(3, 4, 0)| = 5 exactly; |(1, 1, 1)| = √3 rounds to 2.
// Tolerance 1e-13 of the peak: round-off of a 16³ FFT (≈ 1e-16 × log N per coefficient).
TEST(Spectra, SingleModesLandInTheirShellWithTheirAmplitude) {
  const std::array<long, 3> box = {16, 16, 16};
  const double a = 0.7, b = 0.2, rho0 = 2.0;
  const io::Measurement m = measured(box, [&](long i, long j, long k) {
    SpectraCell c;
    const double x = centre(i, 16), y = centre(j, 16), z = centre(k, 16);
    c.velocity[0] = a * std::cos(two_pi * (3 * x + 4 * y));
    c.density = rho0 + b * std::cos(two_pi * (x + y + z) + 0.3);
    c.field[2] = a * std::sin(two_pi * 7 * x);
    return c;
  });
  const io::MeasuredArray& v = array(m, "velocity_power");
  const io::MeasuredArray& rho = array(m, "density_power");
  const io::MeasuredArray& bf = array(m, "magnetic_field_power");
  ASSERT_EQ(v.values.size(), 15u);  // shells 0 ... round(√(3 × 8²)) = 14
  const double peak = a * a / 4.0;
  for (std::size_t s = 0; s < v.values.size(); ++s) {
    EXPECT_NEAR(v.values[s], s == 5 ? peak : 0.0, 1e-13 * peak) << "shell " << s;
    EXPECT_NEAR(bf.values[s], s == 7 ? peak : 0.0, 1e-13 * peak) << "shell " << s;
    const double expected = s == 0 ? rho0 * rho0 / 2.0 : s == 2 ? b * b / 4.0 : 0.0;
    EXPECT_NEAR(rho.values[s], expected, 1e-13 * rho0 * rho0) << "shell " << s;
  }
  // Shell 0 holds k = 0 only, shell 1 the 6 modes |n| = 1 and the 12 of |n| = √2 (lattice
  // counting, common practice, no source); every mode is counted once.
  const io::MeasuredArray& count = array(m, "mode_count");
  EXPECT_EQ(count.values[0], 1.0);
  EXPECT_EQ(count.values[1], 18.0);
  EXPECT_EQ(total(count), 16.0 * 16.0 * 16.0);
  EXPECT_EQ(array(m, "wavenumber").values[5], 5.0);
}

// A gradient field v = ∇φ has curl zero: its solenoidal power vanishes to round-off, and a curl
// field v = ∇ × A likewise its compressive power (vector calculus, common practice, no source).
// Modes below Nyquist only, so that the discrete transform holds them exactly. Tolerance 1e-24
// of the total: the projection leaves only the FFT's round-off, ≈ (1e-16)² × N³ in power.
TEST(Spectra, GradientIsCompressiveAndCurlIsSolenoidal) {
  const std::array<long, 3> box = {16, 12, 8};
  const auto gradient = [](long i, long j, long k) {
    SpectraCell c;
    const double x = centre(i, 16), y = centre(j, 12), z = centre(k, 8);
    // φ = sin 2π(2x + y − z) + 0.5 cos 2π(x − 3y + 2z)
    const double s1 = two_pi * std::cos(two_pi * (2 * x + y - z));
    const double s2 = -0.5 * two_pi * std::sin(two_pi * (x - 3 * y + 2 * z));
    c.velocity = {2 * s1 + s2, s1 - 3 * s2, -s1 + 2 * s2};
    return c;
  };
  const auto curl = [](long i, long j, long k) {
    SpectraCell c;
    const double x = centre(i, 16), y = centre(j, 12), z = centre(k, 8);
    // A = (sin 2π(y + 2z), cos 2π(3x + z), sin 2π(x − y)), v = ∇ × A
    const double ax_y = two_pi * std::cos(two_pi * (y + 2 * z)), ax_z = 2 * ax_y;
    const double ay_x = -3 * two_pi * std::sin(two_pi * (3 * x + z)), ay_z = ay_x / 3;
    const double az_x = two_pi * std::cos(two_pi * (x - y)), az_y = -az_x;
    c.velocity = {az_y - ay_z, ax_z - az_x, ay_x - ax_y};
    return c;
  };
  const io::Measurement g = measured(box, gradient);
  const double g_total = total(array(g, "velocity_power"));
  ASSERT_GT(g_total, 1.0);
  EXPECT_LT(total(array(g, "velocity_solenoidal_power")), 1e-24 * g_total);
  EXPECT_NEAR(total(array(g, "velocity_compressive_power")), g_total, 1e-13 * g_total);
  EXPECT_NEAR(number(g, "velocity_compressive_ratio_total"), 1.0, 1e-13);

  const io::Measurement r = measured(box, curl);
  const double r_total = total(array(r, "velocity_power"));
  ASSERT_GT(r_total, 1.0);
  EXPECT_LT(total(array(r, "velocity_compressive_power")), 1e-24 * r_total);
  EXPECT_NEAR(total(array(r, "velocity_solenoidal_power")), r_total, 1e-13 * r_total);
  EXPECT_LT(number(r, "velocity_compressive_ratio_total"), 1e-24);
}

// Parseval: Σ_k E(k) = (1/2) ⟨|f|²⟩ for every field (Parseval's theorem for the DFT, common
// practice, no source), on white noise with Nyquist content on every axis (an odd and two even
// axes); the solenoidal and compressive parts add up to the power at k > 0, the k = 0 power is
// (1/2)|⟨v⟩|². Tolerance 1e-12 relative: round-off of sums over ~10⁴ terms.
TEST(Spectra, ParsevalHoldsForEveryField) {
  const std::array<long, 3> box = {12, 10, 9};
  const io::Measurement m = measured(box, testing::noisy_cell);
  const physics::CellQuantities q = spectra_box(box, testing::noisy_cell);
  const double n = double(q.size());
  double v2 = 0, kinetic = 0, cube = 0, b2 = 0, rho2 = 0, log2 = 0;
  std::array<double, 3> mean{};
  for (std::size_t c = 0; c < q.size(); ++c) {
    const double rho = q.density[c];
    for (std::size_t d = 0; d < 3; ++d) {
      const double v = q.velocity[d][c], b = q.field[d][c];
      v2 += v * v;
      kinetic += rho * v * v;
      cube += std::cbrt(rho * rho) * v * v;
      b2 += b * b;
      mean[d] += v / n;
    }
    rho2 += rho * rho;
    log2 += std::log(rho) * std::log(rho);
  }
  const auto expect_half_mean = [&](const std::string& name, double sum) {
    const double expected = 0.5 * sum / n;
    EXPECT_NEAR(total(array(m, name)), expected, 1e-12 * expected) << name;
  };
  expect_half_mean("velocity_power", v2);
  expect_half_mean("kinetic_energy_power", kinetic);
  expect_half_mean("cube_root_weighted_velocity_power", cube);
  expect_half_mean("magnetic_field_power", b2);
  expect_half_mean("density_power", rho2);
  expect_half_mean("log_density_power", log2);

  const double mean_flow = 0.5 * (mean[0] * mean[0] + mean[1] * mean[1] + mean[2] * mean[2]);
  EXPECT_NEAR(number(m, "velocity_mean_flow_power"), mean_flow, 1e-12 * mean_flow);
  const io::MeasuredArray& v = array(m, "velocity_power");
  const io::MeasuredArray& sol = array(m, "velocity_solenoidal_power");
  const io::MeasuredArray& comp = array(m, "velocity_compressive_power");
  for (std::size_t s = 1; s < v.values.size(); ++s)
    EXPECT_NEAR(sol.values[s] + comp.values[s], v.values[s], 1e-12 * v.values[s]) << s;
  EXPECT_NEAR(sol.values[0] + comp.values[0] + mean_flow, v.values[0], 1e-12 * v.values[0]);
  // White noise: a third of the power at k > 0 is compressive on average (one of three
  // directions; common practice, no source); 10⁴ random modes hold the ratio within a few %.
  EXPECT_NEAR(number(m, "velocity_compressive_ratio_total"), 1.0 / 3.0, 0.03);
  EXPECT_EQ(total(array(m, "mode_count")), n);
}

// In a box of edges (2, 1, 1) the unit is 2π/L with L = 2: one wavelength along y (k_y = 2π)
// is wavenumber 2, two along x also (k_x = 2 · 2π/2). Units: to_cgs of the wavenumber is
// 2π/(L · length unit) in cm^-1 (definition of the shells, docs/spectra.md).
TEST(Spectra, LongestEdgeSetsTheUnitOfAnElongatedBox) {
  const std::array<long, 3> box = {32, 16, 16};
  const io::Measurement m = measured(box,
                                     [](long i, long j, long) {
                                       SpectraCell c;
                                       c.velocity[1] = std::sin(two_pi * centre(j, 16));
                                       c.velocity[2] = std::sin(two_pi * 2 * centre(i, 32));
                                       return c;
                                     },
                                     {2.0, 1.0, 1.0});
  const io::MeasuredArray& v = array(m, "velocity_power");
  EXPECT_NEAR(v.values[2], 0.5, 1e-13);  // two unit sines, each E = 1/4
  EXPECT_NEAR(total(v), 0.5, 1e-13);
  EXPECT_NEAR(array(m, "wavenumber").to_cgs, two_pi / 2.0, 1e-15);
}

// Hydrodynamics has no field spectrum; a density that is not positive everywhere drops the
// density-weighted spectra with a warning instead of filling them with NaN.
TEST(Spectra, LeavesOutWhatCannotBeMeasured) {
  const std::array<long, 3> box = {8, 8, 8};
  const physics::CellQuantities q = spectra_box(box, [](long i, long, long) {
    SpectraCell c;
    c.density = i == 3 ? -1.0 : 1.0;
    return c;
  });
  physics::RunContext context = spectra_context(box, MPI_COMM_SELF);
  context.magnetic = false;
  const io::Measurement m = SpectraDiagnostic(SpectraFields{}).measure(q, context);
  EXPECT_FALSE(has_array(m, "magnetic_field_power"));
  EXPECT_FALSE(has_array(m, "kinetic_energy_power"));
  EXPECT_FALSE(has_array(m, "log_density_power"));
  EXPECT_TRUE(has_array(m, "density_power"));
  EXPECT_EQ(m.warnings.size(), 1u);
}

// At 64³ on one rank: Parseval for the velocity (as above; tolerance 1e-12 relative for sums of
// ~2.6e5 terms), and the wall time of the first measurement (plans made) and of the next ones
// (plans reused), printed, never asserted (DEVELOPERS.md: speed is measured, not tested).
TEST(Spectra, ParsevalAt64CubedAndTheCostOfAMeasurement) {
  const std::array<long, 3> box = {64, 64, 64};
  const physics::CellQuantities q = spectra_box(box, testing::noisy_cell);
  const physics::RunContext context = spectra_context(box, MPI_COMM_SELF);
  const SpectraDiagnostic spectra(SpectraFields{});
  const auto seconds = [&](io::Measurement& into) {
    const double start = MPI_Wtime();
    into = spectra.measure(q, context);
    return MPI_Wtime() - start;
  };
  io::Measurement m;
  const double first = seconds(m);
  double next = 1e300;
  for (int repeat = 0; repeat < 3; ++repeat)
    next = std::min(next, seconds(m));
  // The density alone: one transform and one shell sum, the unit of the cost.
  SpectraFields density_only{};
  density_only.velocity = density_only.kinetic = density_only.cube_root = false;
  density_only.magnetic = density_only.log_density = false;
  const SpectraDiagnostic one_field(density_only);
  io::Measurement scalar = one_field.measure(q, context);
  double single = 1e300;
  for (int repeat = 0; repeat < 3; ++repeat) {
    const double start = MPI_Wtime();
    scalar = one_field.measure(q, context);
    single = std::min(single, MPI_Wtime() - start);
  }
  std::printf(
      "spectra at 64^3 on one rank: first measurement %.1f ms, next %.1f ms (best of 3); "
      "density alone %.1f ms\n",
      1e3 * first, 1e3 * next, 1e3 * single);
  double v2 = 0.0;
  for (std::size_t d = 0; d < 3; ++d)
    for (const double v : q.velocity[d])
      v2 += v * v;
  const double expected = 0.5 * v2 / double(q.size());
  EXPECT_NEAR(total(array(m, "velocity_power")), expected, 1e-12 * expected);
}

}  // namespace
}  // namespace brume::physics
