// Constrained transport keeps div B at round-off; the finite-volume update conserves mass,
// momentum and energy to round-off in a periodic box (common practice, no source).
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <random>

#include "solver/constrained_transport.hpp"
#include "tests/solver/solver_test_support.hpp"

namespace brume::solver {
namespace {

using namespace testing;

// A smooth random state: a few random Fourier modes in the vector potential and the velocity.
State random_turbulent_state(std::array<int, 3> cells, bool isothermal, double gamma,
                             unsigned seed) {
  State s = make_box_state(cells, true, isothermal);
  std::mt19937 rng(seed);
  std::uniform_real_distribution<double> u(-1.0, 1.0);
  struct Mode {
    double kx, ky, kz, phase;
    Vector amp;
  };
  std::vector<Mode> modes;
  for (int m = 0; m < 6; ++m) {
    modes.push_back({std::round(2 * u(rng)), std::round(2 * u(rng)), std::round(2 * u(rng)),
                     kPi * u(rng), Vector{u(rng), u(rng), u(rng)}});
  }
  auto field = [&](double x, double y, double z, double scale) {
    Vector a{0, 0, 0};
    for (const Mode& m : modes) {
      const double arg = 2 * kPi * (m.kx * x + m.ky * y + m.kz * z) + m.phase;
      for (std::size_t d = 0; d < 3; ++d)
        a[d] += scale * m.amp[d] * std::sin(arg);
    }
    return a;
  };
  set_field_from_potential(s, [&](double x, double y, double z) { return field(x, y, z, 0.05); });
  add_uniform_field(s, {0.2, 0.1, -0.3});
  set_primitive(
      s,
      [&](double x, double y, double z) {
        const Vector v = field(x + 0.3, y, z - 0.2, 0.3);
        const double rho = 1.0 + 0.3 * std::sin(2 * kPi * (x + 2 * y)) * std::cos(2 * kPi * z);
        return Primitive{rho, v[0], v[1], v[2], 1.0 + 0.2 * std::cos(2 * kPi * (y - z))};
      },
      gamma);
  return s;
}

TEST(ConstrainedTransport, DivergenceStaysAtRoundOffIn3D) {
  SchemeOptions o;
  o.reconstruction = Reconstruction::plm;
  o.riemann = RiemannSolver::hlle;
  o.gamma = 5.0 / 3.0;
  State s = random_turbulent_state({16, 16, 16}, false, o.gamma, 7u);
  // The initial field is the discrete curl of an edge potential: div B is round-off already.
  ASSERT_LT(relative_divergence(s), 1e-13);
  auto integrator = make_integrator(o, s.geometry, periodic_box());
  double worst = 0.0;
  for (int n = 0; n < 60; ++n) {
    const StepReport r = integrator->advance(s, integrator->stable_time_step(s));
    ASSERT_TRUE(r.ok());
    worst = std::fmax(worst, relative_divergence(s));
  }
  // Brief: max |div B| / (|B|/Δx) ≤ 1e-12 after many steps (round-off of O(1) face sums).
  EXPECT_LE(worst, 1e-12);
  std::printf("max relative div B over 60 steps: %.3g\n", worst);
  // The field must actually have changed, or the test proves nothing.
  const State initial = random_turbulent_state({16, 16, 16}, false, o.gamma, 7u);
  double change = 0.0;
  for (std::size_t c = 0; c < s.face_field[0].size(); ++c) {
    change = std::fmax(change, std::fabs(s.face_field[1][c] - initial.face_field[1][c]));
  }
  EXPECT_GT(change, 1e-3);
}

class Conservation : public ::testing::TestWithParam<bool> {};

TEST_P(Conservation, PeriodicBoxConservesMassMomentumEnergy) {
  const bool isothermal = GetParam();
  SchemeOptions o;
  o.reconstruction = Reconstruction::ppm;
  o.riemann = RiemannSolver::hlle;
  o.eos = isothermal ? GasModel::isothermal : GasModel::ideal_gas;
  o.gamma = 1.4;
  State s = random_turbulent_state({12, 10, 8}, isothermal, o.gamma, 11u);
  auto sums = [](const State& st) {
    std::array<double, 5> q{};
    q[0] = interior_sum(st, [&](std::ptrdiff_t c) { return st.density[c]; });
    for (int d = 0; d < 3; ++d) {
      q[std::size_t(d + 1)] = interior_sum(st, [&](std::ptrdiff_t c) { return st.momentum[d][c]; });
    }
    if (!st.isothermal) q[4] = interior_sum(st, [&](std::ptrdiff_t c) { return st.energy[c]; });
    return q;
  };
  const auto before = sums(s);
  auto integrator = make_integrator(o, s.geometry, periodic_box());
  for (int n = 0; n < 40; ++n)
    ASSERT_TRUE(integrator->advance(s, integrator->stable_time_step(s)).ok());
  const auto after = sums(s);
  // Round-off: ~1e-16 per cell update, summed over 960 cells × 80 stages; O(1) totals ≈ 960.
  for (std::size_t q = 0; q < 5; ++q) {
    EXPECT_NEAR(after[q], before[q], 1e-10) << "component " << q;
    std::printf("component %zu: change %.3g of %.3g\n", q, after[q] - before[q], before[q]);
  }
  EXPECT_GT(std::fabs(s.momentum[0][s.geometry.index(3, 3, 3)] -
                      random_turbulent_state({12, 10, 8}, isothermal, o.gamma, 11u)
                          .momentum[0][s.geometry.index(3, 3, 3)]),
            1e-4);  // the flow evolved
}

INSTANTIATE_TEST_SUITE_P(Eos, Conservation, ::testing::Values(false, true));

}  // namespace
}  // namespace brume::solver
