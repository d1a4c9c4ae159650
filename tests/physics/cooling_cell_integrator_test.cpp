// The per-cell heating and cooling integrator against scipy.integrate.solve_ivp (Radau) on the
// same ODE, dT/dt = −(γ − 1)/k_B (nΛ(T) − Γ), for the Koyama & Inutsuka 2002 fit.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <sstream>
#include <string>
#include <utility>
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

struct Case {
  double n;        // cm^-3
  double t0;       // K
  double periods;  // duration in cooling times at (n, t0)
};

std::string text(double v) {
  char s[40];
  std::snprintf(s, sizeof s, "%.17g", v);
  return s;
}

TEST(CoolingCellIntegrator, MatchesScipyRadau) {
  const NetCooling net{KoyamaInutsukaFit{}, KoyamaInutsukaFit::reference_heating};
  const std::vector<Case> cases = {
      {1.0, 8000.0, 0.3},  // warm gas cooling, short
      {1.0, 8000.0, 3.0},  // ... to near equilibrium (5006 K)
      {2.0, 1500.0, 2.0},  // near the unstable equilibrium (isochorically stable)
      {100.0, 1e4, 30.0},  // strong cooling to the cold phase (T_eq 41.8 K)
      {1e3, 1e6, 100.0},   // very strong cooling over 3 decades in T
      {0.1, 20.0, 5.0},    // strong heating of cold, dilute gas (T_eq 7490 K)
      {0.01, 100.0, 1e3},  // heating far past the cooling time
  };
  std::vector<std::string> arguments = {"evolve", text(gamma), text(net.heating), text(k_b)};
  std::vector<double> durations;
  for (const Case& c : cases) {
    durations.push_back(c.periods * cooling_time(net, c.n, c.t0, gamma));
    for (const double v : {c.n, c.t0, durations.back()})
      arguments.push_back(text(v));
  }
  const brume::testing::PythonResult reference = brume::testing::run_python(
      brume::testing::source_script("tests/physics/cooling_reference.py"), arguments);
  ASSERT_EQ(reference.exit_code, 0) << reference.output;
  std::istringstream lines(reference.output);
  std::vector<double> expected(cases.size());
  for (double& e : expected)
    ASSERT_TRUE(lines >> e) << reference.output;
  // Scipy's Radau at rtol 1e-12 is far more accurate than brume, so the difference is brume's
  // error. At the default sub-step tolerance 1e-6 it must stay within 1e-4 relative, the brief's
  // bound (measured: 1.1e-6); at 1e-4, as problems/demo.yaml sets it, within 2e-4 (measured:
  // 9.4e-5, with ten times fewer sub-steps).
  for (const auto& [tolerance, bound] : {std::pair{1e-6, 1e-4}, std::pair{1e-4, 2e-4}}) {
    CellCoolingLimits limits;
    limits.tolerance = tolerance;
    const CellCooler<KoyamaInutsukaFit> cooler(fit, net.heating, (gamma - 1.0) / k_b, limits);
    double worst = 0.0;
    for (std::size_t i = 0; i < cases.size(); ++i) {
      const CellCoolingResult r = cooler.advance(cases[i].n, cases[i].t0, durations[i]);
      const double error = std::fabs(r.temperature - expected[i]) / expected[i];
      worst = std::fmax(worst, error);
      std::printf(
          "[cooling vs Radau] tolerance %g, n %g T0 %g t/t_cool %g: T %.10g, scipy %.10g, rel. "
          "error %.2e, %ld sub-steps\n",
          tolerance, cases[i].n, cases[i].t0, cases[i].periods, r.temperature, expected[i], error,
          r.substeps);
      EXPECT_LT(error, bound) << "tolerance " << tolerance << ", case " << i;
    }
    std::printf("[cooling vs Radau] tolerance %g: largest relative error %.2e\n", tolerance, worst);
  }
}

// A cooling time 1e-6 of the step: the implicit sub-steps must neither go below zero (or the
// floor) nor produce NaN, nor overshoot the equilibrium.
TEST(CoolingCellIntegrator, StiffStepsStayPositiveAndFinite) {
  const NetCooling net{KoyamaInutsukaFit{}, KoyamaInutsukaFit::reference_heating};
  const CellCoolingLimits limits{10.0, 1e9, 1e-6, 1000000};
  const CellCooler<KoyamaInutsukaFit> cooler(fit, net.heating, (gamma - 1.0) / k_b, limits);
  for (const double n : {0.1, 1.0, 10.0, 1e3, 1e5}) {
    for (const double t0 : {10.0, 300.0, 8000.0, 1e6, 1e8}) {
      const double dt = 1e6 * cooling_time(net, n, t0, gamma);
      const CellCoolingResult r = cooler.advance(n, t0, dt);
      ASSERT_TRUE(std::isfinite(r.temperature)) << n << " " << t0;
      EXPECT_GE(r.temperature, limits.floor);
      const double t_eq = equilibrium_temperature(net, n, {limits.floor, limits.ceiling});
      // The exact solution moves monotonically from T0 towards T_eq (a scalar autonomous ODE,
      // isochorically stable for this fit since nΛ rises with T): no overshoot beyond T_eq and
      // no move away from it, to the sub-step tolerance 1e-6.
      EXPECT_LE(r.temperature, std::fmax(t0, t_eq) * (1 + 1e-6)) << "n " << n << " T0 " << t0;
      EXPECT_GE(r.temperature, std::fmin(t0, t_eq) * (1 - 1e-6)) << "n " << n << " T0 " << t0;
      // Far more sub-steps would mean the step control failed to grow the steps (second-order
      // sub-steps at tolerance 1e-6 need ~1e3 per decade of temperature crossed; measured ≤ 9132).
      EXPECT_LT(r.substeps, 20000) << "n " << n << " T0 " << t0;
    }
  }
}

// Without heating, gas cools to the floor and stays there, positive.
TEST(CoolingCellIntegrator, PureCoolingStopsAtTheFloor) {
  const CellCoolingLimits limits{50.0, 1e9, 1e-6, 1000000};
  const CellCooler<KoyamaInutsukaFit> cooler(fit, 0.0, (gamma - 1.0) / k_b, limits);
  const CellCoolingResult r = cooler.advance(1e4, 1e4, 1e16);
  EXPECT_EQ(r.temperature, 50.0);
  EXPECT_TRUE(r.limited);
}

}  // namespace
}  // namespace brume::physics
