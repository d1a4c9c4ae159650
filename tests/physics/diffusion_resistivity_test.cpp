// Ohmic resistivity alone (no ideal-MHD step): a sinusoidal field in a gas at rest obeys
// ∂B/∂t = η ∇²B and decays as exp(−η k² t) (Jackson 1999, Classical Electrodynamics, 3rd ed.,
// §5.18, from memory); the edge EMFs keep div B at round-off; the energy the field loses heats the
// gas, the total kept by the Poynting flux.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>

#include "solver/constrained_transport.hpp"
#include "tests/physics/diffusion_test_support.hpp"

namespace brume::physics::testing {
namespace {

constexpr double kEta = 0.01;
constexpr double kField = 0.1;

DiffusionCoefficients resistivity() {
  DiffusionCoefficients k;
  k.resistivity = kEta;
  k.gamma = kGamma;
  return k;
}

// A field from the potential A_z = (B/|k|) cos(k·x) with k = 2π (1, 1 if 2D else 0, 0): the
// in-plane field B sin(k·x) (−k_y, k_x)/|k|, perpendicular to k and divergence-free.
solver::State field_state(int n, int active, bool isothermal) {
  const std::array<int, 3> cells{n, active > 1 ? n : 1, 1};
  solver::State s = solver::testing::make_box_state(cells, true, isothermal);
  const double ky = active > 1 ? 2.0 * kPi : 0.0;
  const double kx = 2.0 * kPi, k = std::hypot(kx, ky);
  solver::testing::set_field_from_potential(s, [&](double x, double y, double) {
    return solver::testing::Vector{0.0, 0.0, kField / k * std::cos(kx * x + ky * y)};
  });
  solver::testing::set_primitive(
      s,
      [](double, double, double) {
        return solver::testing::Primitive{1.0, 0, 0, 0, 1.0};
      },
      kGamma);
  return s;
}

// Amplitude of the in-plane field along the mode: 2/N Σ B·ê sin(k·x) with ê ⟂ k, from the
// cell-centred field.
double mode_amplitude(const solver::State& s, int active) {
  const solver::BlockGeometry& g = s.geometry;
  const double ky = active > 1 ? 2.0 * kPi : 0.0;
  const double kx = 2.0 * kPi, k = std::hypot(kx, ky);
  // B = ∇ × (A_z ẑ) = (∂_y A_z, −∂_x A_z) = B sin(k·x) (−k_y, k_x)/|k|.
  const double ex = -ky / k, ey = kx / k;
  const double sum = interior_sum(s, [&](std::ptrdiff_t c) {
    const auto p = g.position(c);
    const double phase = kx * g.centre(0, p[0]) + ky * g.centre(1, p[1]);
    return (ex * solver::cell_field(s, 0, c) + ey * solver::cell_field(s, 1, c)) * std::sin(phase);
  });
  return 2.0 * sum / double(g.interior_cells());
}

// The measured decay rate −ln(A(t)/A(0))/t against η k², within 1 %: the three-point Laplacian has
// k_eff² = k² (sin(kΔx/2)/(kΔx/2))², 0.08 % below k² at 64 cells per wavelength (common practice,
// no source), and the second-order step at η k² dt = 1/8 adds a rate error of order
// (η k² dt)²/6 ≈ 0.3 % (common practice, no source): 1 % leaves no room for a wrong rate.
void expect_decay_rate(int active, bool isothermal) {
  const int n = 64;
  solver::State s = field_state(n, active, isothermal);
  const double a0 = mode_amplitude(s, active);
  const double k2 = 4.0 * kPi * kPi * active;
  const double t = 1.0 / (kEta * k2);  // one e-folding
  DiffusionTerm term = make_box_term(resistivity());
  const int stages = advance_in_steps(term, s, t, 8);
  const double rate = -std::log(mode_amplitude(s, active) / a0) / t;
  const double expected = kEta * k2;
  std::printf(
      "[resistivity %dD%s] rate %.6e, exact %.6e, relative error %.3e, %d stages of "
      "explicit limit %.3e\n",
      active, isothermal ? " isothermal" : "", rate, expected, std::fabs(rate / expected - 1.0),
      stages, term.last_call().explicit_step);
  EXPECT_NEAR(rate, expected, 0.01 * expected);
  // div B at round-off: the face update is the discrete curl of edge EMFs (Evans & Hawley 1988,
  // ApJ 332, 659). Tolerance 1e-12 of |B|/Δx, a few thousand ulps.
  EXPECT_LT(solver::relative_divergence(s), 1e-12);
}

TEST(DiffusionResistivity, SinusoidalFieldDecaysAtTheOhmicRateIn1D) {
  expect_decay_rate(1, false);
}

TEST(DiffusionResistivity, DiagonalFieldDecaysAtTheOhmicRateIn2DWithDivergenceAtRoundOff) {
  expect_decay_rate(2, false);
}

TEST(DiffusionResistivity, IsothermalFieldDecaysAtTheOhmicRate) {
  expect_decay_rate(2, true);
}

// A 3D field with all three components and div B = 0 from a potential: after several long steps
// div B is still at round-off (tolerance as above).
TEST(DiffusionResistivity, DivergenceStaysAtRoundOffIn3D) {
  solver::State s = solver::testing::make_box_state({16, 16, 16}, true, false);
  solver::testing::set_field_from_potential(s, [](double x, double y, double z) {
    const double t = 2.0 * kPi;
    return solver::testing::Vector{0.1 * std::sin(t * y + 0.3) * std::cos(t * z),
                                   0.2 * std::cos(t * (x + z)), 0.15 * std::sin(t * (x - y))};
  });
  solver::testing::add_uniform_field(s, {0.05, -0.02, 0.03});
  solver::testing::set_primitive(
      s,
      [](double, double, double) {
        return solver::testing::Primitive{1.0, 0, 0, 0, 1.0};
      },
      kGamma);
  const double before = solver::relative_divergence(s);
  DiffusionTerm term = make_box_term(resistivity());
  advance_in_steps(term, s, 2.0, 4);
  std::printf("[resistivity 3D] relative div B %.3e before, %.3e after %d-stage steps\n", before,
              solver::relative_divergence(s), term.last_call().stages);
  EXPECT_LT(solver::relative_divergence(s), 1e-12);
}

// The field's lost energy goes into heat: the total energy is conserved to round-off (tolerance
// 1e-13 relative, as for conduction), so the thermal energy gains what the field loses; the
// magnetic energy falls by e^{−2} over one e-folding of the amplitude (1 % as above).
TEST(DiffusionResistivity, OhmicHeatingConservesTotalEnergy) {
  solver::State s = field_state(64, 2, false);
  auto total = [&] { return interior_sum(s, [&](std::ptrdiff_t c) { return s.energy[c]; }); };
  auto magnetic = [&] {
    return interior_sum(s, [&](std::ptrdiff_t c) {
      double b2 = 0.0;
      for (int d = 0; d < 3; ++d)
        b2 += solver::cell_field(s, d, c) * solver::cell_field(s, d, c);
      return 0.5 * b2;
    });
  };
  const double e0 = total(), m0 = magnetic();
  DiffusionTerm term = make_box_term(resistivity());
  advance_in_steps(term, s, 1.0 / (kEta * 8.0 * kPi * kPi), 8);
  const double m1 = magnetic();
  EXPECT_NEAR(total(), e0, 1e-13 * e0);
  EXPECT_NEAR(m1 / m0, std::exp(-2.0), 0.01 * std::exp(-2.0));
}

}  // namespace
}  // namespace brume::physics::testing
