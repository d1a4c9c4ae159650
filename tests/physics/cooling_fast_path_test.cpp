// The fast path of the per-cell cooling integrator (ROS2 steps over the whole dt): taken for
// cells near thermal equilibrium with a step small against the relaxation time 1/|f'(T)|, as in a
// driven multiphase run, and then as accurate as a second-order step should be against
// scipy.integrate.solve_ivp (Radau); stiff cells and cells that reach a limit take the robust path.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <sstream>
#include <string>
#include <vector>

#include "physics/cooling_cell_integrator.hpp"
#include "physics/cooling_equilibrium.hpp"
#include "solver/units/constants.hpp"
#include "tests/support/run_python.hpp"

namespace brume::physics {
namespace {

constexpr double gamma = 5.0 / 3.0;
constexpr double k_b = units::cgs::boltzmann;
const KoyamaInutsukaFit fit;

std::string text(double v) {
  char s[40];
  std::snprintf(s, sizeof s, "%.17g", v);
  return s;
}

struct MildCase {
  double n;            // cm^-3
  double offset;       // T0 / T_eq
  double relaxations;  // dt · |f'(T0)|
  long steps;  // ROS2 steps expected: 1, or ⌈1.1 √q⌉ for an estimate q times the tolerance
};

TEST(CoolingFastPath, TakenNearEquilibriumAndSecondOrderAccurate) {
  const NetCooling net{KoyamaInutsukaFit{}, KoyamaInutsukaFit::reference_heating};
  const double factor = (gamma - 1.0) / k_b;
  // Cells as in the 32³ driven run: within 1 % of T_eq, dt 0.5–2 % of the relaxation time.
  // The last: estimate ≈ 1.2 z × 2e-4 ≈ 4.8 times the tolerance, so three steps of dt/3.
  const std::vector<MildCase> cases = {{0.5, 1.01, 0.005, 1},
                                       {1.0, 1.001, 0.02, 1},
                                       {2.0, 0.999, 0.02, 1},
                                       {10.0, 0.99, 0.005, 1},
                                       {1.0, 1.01, 0.02, 3}};
  std::vector<std::string> arguments = {"evolve", text(gamma), text(net.heating), text(k_b)};
  std::vector<double> t0s;
  std::vector<double> durations;
  for (const MildCase& c : cases) {
    t0s.push_back(c.offset * equilibrium_temperature(net, c.n, {10.0, 1e9}));
    durations.push_back(c.relaxations / (factor * c.n * fit(t0s.back()).slope));
    for (const double v : {c.n, t0s.back(), durations.back()})
      arguments.push_back(text(v));
  }
  const brume::testing::PythonResult reference = brume::testing::run_python(
      brume::testing::source_script("tests/physics/cooling_reference.py"), arguments);
  ASSERT_EQ(reference.exit_code, 0) << reference.output;
  std::istringstream lines(reference.output);
  const CellCooler<KoyamaInutsukaFit> cooler(fit, net.heating, factor, CellCoolingLimits{});
  for (std::size_t i = 0; i < cases.size(); ++i) {
    double expected = 0.0;
    ASSERT_TRUE(lines >> expected) << reference.output;
    const CellCoolingResult r = cooler.advance(cases[i].n, t0s[i], durations[i]);
    const double change = std::fabs(expected - t0s[i]) / t0s[i];
    const double error = std::fabs(r.temperature - expected) / expected;
    std::printf(
        "[fast path vs Radau] n %g T0 %.6g dt|f'| %g: T %.12g, scipy %.12g, relative change "
        "%.2e, relative error %.2e, fast %d, %ld steps\n",
        cases[i].n, t0s[i], cases[i].relaxations, r.temperature, expected, change, error,
        int(r.fast_path), r.substeps);
    EXPECT_TRUE(r.fast_path) << "case " << i;
    EXPECT_EQ(r.substeps, cases[i].steps) << "case " << i;
    EXPECT_FALSE(r.limited) << "case " << i;
    // ROS2 is second order. On the linearized equation dT/dt = J (T − T_eq), z = dt J, its
    // stability function R(z) = (1 + (1 − 2γ) z + (γ² − 2γ + 1/2) z²)/(1 − γz)² differs from
    // e^z by (γ − γ² − 1/6) z³ ≈ −1.374 z³ (derived here), so the error is ≈ 1.374 z² times the
    // relative change; the bound is twice that (nonlinearity of Λ over a change below 2e-4 is
    // small). Euler (explicit or implicit) would be off by ≈ z/2 times the change, 9–36 times
    // this bound for z = 0.02 and 0.005. N equal steps: z → z/N in the ratio.
    const double z = cases[i].relaxations / double(cases[i].steps);
    EXPECT_LT(error, 2.0 * 1.374 * z * z * change) << "case " << i;
    EXPECT_GT(change, 1e-5) << "case " << i;  // the step moves T well beyond Radau's rtol 1e-12
    // The temperature moves towards T_eq (a scalar autonomous ODE relaxes monotonically).
    EXPECT_LT(std::fabs(r.temperature / t0s[i] * cases[i].offset - 1.0),
              std::fabs(cases[i].offset - 1.0))
        << "case " << i;
  }
}

// Cooling time far below dt: the Rosenbrock estimate fails and the robust path takes over, still
// ending at T_eq (the exact solution's limit, within the sub-step tolerance 1e-6 times the few
// relaxation times the relaxation is resolved over; 1e-5 allows for that).
TEST(CoolingFastPath, StiffCellsFallBackToTheRobustPath) {
  const NetCooling net{KoyamaInutsukaFit{}, KoyamaInutsukaFit::reference_heating};
  const CellCooler<KoyamaInutsukaFit> cooler(fit, net.heating, (gamma - 1.0) / k_b,
                                             CellCoolingLimits{});
  for (const double n : {0.1, 10.0, 1e3}) {
    for (const double t0 : {30.0, 8000.0, 1e6}) {
      const double dt = 1e6 * cooling_time(net, n, t0, gamma);
      const CellCoolingResult r = cooler.advance(n, t0, dt);
      const double t_eq = equilibrium_temperature(net, n, {10.0, 1e9});
      EXPECT_FALSE(r.fast_path) << "n " << n << " T0 " << t0;
      EXPECT_GT(r.substeps, 1) << "n " << n << " T0 " << t0;
      EXPECT_NEAR(r.temperature / t_eq, 1.0, 1e-5) << "n " << n << " T0 " << t0;
    }
  }
}

// A step that would end below the floor is never kept by the fast path: pure cooling ends exactly
// at the floor through the bracketed robust path.
TEST(CoolingFastPath, LimitsAreLeftToTheRobustPath) {
  const CellCoolingLimits limits{50.0, 1e9, 1e-6, 1000000};
  const CellCooler<KoyamaInutsukaFit> cooler(fit, 0.0, (gamma - 1.0) / k_b, limits);
  const CellCoolingResult r = cooler.advance(1e4, 1e4, 1e16);
  EXPECT_FALSE(r.fast_path);
  EXPECT_EQ(r.temperature, 50.0);
  EXPECT_TRUE(r.limited);
}

}  // namespace
}  // namespace brume::physics
