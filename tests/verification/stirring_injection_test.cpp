// The stirring injects energy at the rate it is set to. problems/driven_turbulence.yaml, run
// through the real setup (schema, problem, source terms, split step) on a 16³ box of
// isothermal hydrodynamic gas at rest, with the injection rate ε prescribed and a correlation
// time T = t/20.
//
// Expected: for gas that does not react within T (here the rms speed stays below 0.1 c_s, so the
// flow barely moves over the run), a force of correlation ⟨a(t)·a(s)⟩ = ⟨|a|²⟩ e^{−|t−s|/T}
// does the work per unit mass ⟨|a|²⟩ ∫₀^t ∫₀^{t'} e^{−(t'−s)/T} ds dt' = ε [t − T (1 − e^{−t/T})]
// from rest, with ε = ⟨|a|²⟩ T (Eswaran & Pope 1988, Comput. Fluids 16, 257, §2 — from memory;
// the integral by hand). Over t = 20 T the time-averaged rate is ε (1 − 0.05).
//
// Tolerance 5 % (the brief's): one run's work is a quadratic form of ~244 Gaussian degrees of
// freedom (61 modes × 4 with ζ = 1, flat profile), relative spread sqrt(2/244) ≈ 9 %; the mean
// over 30 seeds has a standard error of ≈ 1.7 %, so 5 % is 3 standard errors. The kicks of
// h = dt/2 ≈ T/4 bias the discrete sum by about (h/T)²/12 ≈ 0.5 % (the sum of the discrete
// correlation by hand); the numerical damping of |n| ≤ 3 over 44 steps of nearly still gas is
// smaller still. A wrong normalization (e.g. a factor 2 in ⟨|a|²⟩) fails by 100 %.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <string>
#include <vector>

#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/scheme_choice.hpp"
#include "app/source_terms.hpp"
#include "app/split_integrator.hpp"
#include "io/config/load.hpp"
#include "physics/stirring_term.hpp"
#include "solver/box_boundaries.hpp"
#include "solver/integrator.hpp"

namespace brume::verification {
namespace {

struct InjectionRun {
  double work = 0.0;      // code units
  double expected = 0.0;  // ε M [t − T (1 − e^{−t/T})]
  double time = 0.0;
  double target_rate = 0.0;  // ε M
  double largest_speed = 0.0;
};

InjectionRun run_seed(int seed) {
  const std::vector<std::string> overrides{"box.cells=[16, 16, 16]",
                                           "gas.sound_speed=1 km/s",
                                           "gas.magnetized=false",
                                           "scheme.riemann_solver=hllc",
                                           "problem.driven_turbulence.mean_field=0 uG",
                                           "stirring.profile=flat",
                                           "stirring.amplitude_mode=injection_rate",
                                           "stirring.injection_rate=0.0125 km^2 s^-2 Myr^-1",
                                           "stirring.correlation_time=0.04 Myr",
                                           "clock.stop_time=0.8 Myr",
                                           "stirring.seed=" + std::to_string(seed)};
  const config::ResolvedConfig config =
      config::load(app::brume_schema(),
                   std::string(BRUME_SOURCE_DIR) + "/problems/driven_turbulence.yaml", overrides);
  const app::RunSetup setup = app::make_run_setup(config);
  const solver::SchemeOptions options = app::scheme_options(config, setup);
  std::array<double, 3> upper{};
  std::array<int, 3> cells{};
  for (int d = 0; d < 3; ++d) {
    upper[d] = setup.lower[d] + setup.size[d];
    cells[d] = static_cast<int>(setup.cells[d]);
  }
  const solver::BlockGeometry geometry =
      solver::whole_box_geometry(cells, setup.lower, upper, solver::required_ghost_layers(options));
  solver::State state = solver::make_state(geometry, setup.magnetic, setup.isothermal);
  setup.problem->set_up(app::setup_context(config, setup), state);
  auto ghosts = std::make_shared<solver::BoxGhostFiller>(app::box_boundaries(config));
  ghosts->fill(state);
  auto terms = app::make_source_terms(config, app::run_context(setup, MPI_COMM_SELF, ghosts));
  EXPECT_EQ(terms.size(), 1u);
  const auto* stirring = dynamic_cast<const physics::StirringTerm*>(terms.at(0).get());
  EXPECT_NE(stirring, nullptr);
  app::SplitIntegrator integrator(solver::make_integrator(options, geometry, ghosts),
                                  std::move(terms), ghosts);
  const double t_end = config.real("clock.stop_time") / setup.code_units.time();
  while (state.time < t_end * (1.0 - 1e-14)) {
    const double dt = std::fmin(integrator.stable_time_step(state), t_end - state.time);
    const solver::StepReport report = integrator.advance(state, dt);
    EXPECT_TRUE(report.ok());
    if (!report.ok()) break;
  }
  InjectionRun r;
  double mass = 0.0;
  const auto& g = state.geometry;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i) {
        const auto c = std::size_t(g.index(i, j, k));
        mass += state.density[c];
        double v2 = 0.0;
        for (std::size_t d = 0; d < 3; ++d)
          v2 += std::pow(state.momentum[d][c] / state.density[c], 2);
        r.largest_speed = std::fmax(r.largest_speed, std::sqrt(v2));
      }
    }
  }
  mass *= g.spacing[0] * g.spacing[1] * g.spacing[2];
  const double T = stirring->scales().correlation_time;
  r.time = stirring->stirred_time();
  r.target_rate = stirring->scales().injection_rate * mass;
  r.expected = r.target_rate * (r.time - T * (1.0 - std::exp(-r.time / T)));
  r.work = stirring->work();
  return r;
}

TEST(StirringInjection, TimeAveragedRateIsTheTarget) {
  const int seeds = 30;
  double sum = 0.0, squares = 0.0, rate = 0.0, fastest = 0.0;
  for (int seed = 1; seed <= seeds; ++seed) {
    const InjectionRun r = run_seed(seed);
    const double ratio = r.work / r.expected;
    sum += ratio;
    squares += ratio * ratio;
    rate += r.work / r.time / r.target_rate / seeds;
    fastest = std::fmax(fastest, r.largest_speed);
  }
  const double mean = sum / seeds;
  const double spread = std::sqrt((squares / seeds - mean * mean) / (seeds - 1));
  std::printf(
      "[stirring injection] %d seeds: work / expected = %.4f ± %.4f (standard error); "
      "time-averaged rate / target = %.4f (start-up deficit T/t = 0.05 expected); "
      "largest speed %.3f c_s\n",
      seeds, mean, spread, rate, fastest);
  EXPECT_NEAR(mean, 1.0, 0.05);
  EXPECT_NEAR(rate, 0.95, 0.05);
  EXPECT_LT(fastest, 0.5);  // the premise: gas that barely reacts (sound speed 1 code unit)
}

}  // namespace
}  // namespace brume::verification
