// Runs one of brume's YAML inputs in-process for the multidimensional MHD verification tests: the
// input is loaded through the full schema (as `brume run` does), the registered problem sets up
// the state, and the integrator advances it while floors, fallbacks and the largest relative
// div B are tallied.
#pragma once

#include <cmath>
#include <cstdio>
#include <functional>
#include <memory>
#include <string>
#include <vector>

#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/scheme_choice.hpp"
#include "io/config/load.hpp"
#include "solver/box_boundaries.hpp"
#include "solver/constrained_transport.hpp"
#include "solver/integrator.hpp"
#include "solver/state.hpp"

namespace brume::verification {

struct ProblemRun {
  config::ResolvedConfig config;
  app::RunSetup setup;
  solver::SchemeOptions options;
  solver::State state;
  std::unique_ptr<solver::Integrator> integrator;
  long steps = 0;
  long density_floors = 0;
  long pressure_floors = 0;
  long fallback_cells = 0;
  bool failed = false;
  double largest_divergence = 0.0;  // max over the checked steps of relative_divergence
  int divergence_checks = 0;
};

// problems/<file> with the command-line style overrides ("box.cells=[64,32,1]").
inline ProblemRun start_problem(const std::string& file,
                                const std::vector<std::string>& overrides) {
  ProblemRun run{config::load(app::brume_schema(),
                              std::string(BRUME_SOURCE_DIR) + "/problems/" + file, overrides),
                 {},
                 {},
                 {},
                 nullptr};
  run.setup = app::make_run_setup(run.config);
  run.options = app::scheme_options(run.config, run.setup);
  std::array<double, 3> upper{};
  std::array<int, 3> cells{};
  for (int d = 0; d < 3; ++d) {
    upper[d] = run.setup.lower[d] + run.setup.size[d];
    cells[d] = static_cast<int>(run.setup.cells[d]);
  }
  const solver::BlockGeometry geometry = solver::whole_box_geometry(
      cells, run.setup.lower, upper, solver::required_ghost_layers(run.options));
  run.state = solver::make_state(geometry, run.setup.magnetic, run.setup.isothermal);
  run.setup.problem->set_up(app::setup_context(run.config, run.setup), run.state);
  auto ghosts = std::make_shared<solver::BoxGhostFiller>(app::box_boundaries(run.config));
  ghosts->fill(run.state);
  run.integrator = solver::make_integrator(run.options, geometry, ghosts);
  return run;
}

// The input's stop time in code units.
inline double stop_time(const ProblemRun& run) {
  return run.config.real("clock.stop_time") / run.setup.code_units.time();
}

inline void check_divergence(ProblemRun& run) {
  run.largest_divergence =
      std::fmax(run.largest_divergence, solver::relative_divergence(run.state));
  ++run.divergence_checks;
}

// Advances to t_end (the last step shortened), checking div B every `divergence_every` steps and
// at the end; `after_step` (optional) sees the state after every step. False on a failure.
inline bool advance_to(ProblemRun& run, double t_end, int divergence_every = 10,
                       const std::function<void(const solver::State&)>& after_step = {}) {
  while (run.state.time < t_end * (1.0 - 1e-14)) {
    const double dt =
        std::fmin(run.integrator->stable_time_step(run.state), t_end - run.state.time);
    const solver::StepReport report = run.integrator->advance(run.state, dt);
    run.density_floors += report.density_floors;
    run.pressure_floors += report.pressure_floors;
    run.fallback_cells += report.fallback_cells;
    ++run.steps;
    if (!report.ok()) {
      run.failed = true;
      return false;
    }
    if (run.state.magnetic && run.steps % divergence_every == 0) check_divergence(run);
    if (after_step) after_step(run.state);
  }
  if (run.state.magnetic) check_divergence(run);
  return true;
}

// Sum over interior cells of q(linear index), in k, j, i order.
inline double interior_sum(const solver::State& s, const std::function<double(std::ptrdiff_t)>& q) {
  const solver::BlockGeometry& g = s.geometry;
  double sum = 0.0;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i)
        sum += q(g.index(i, j, k));
    }
  }
  return sum;
}

// Magnetic energy Σ B²/2 ΔV of the cell-centred field.
inline double magnetic_energy(const solver::State& s) {
  const auto& h = s.geometry.spacing;
  return 0.5 * h[0] * h[1] * h[2] * interior_sum(s, [&](std::ptrdiff_t c) {
           double b2 = 0.0;
           for (int d = 0; d < 3; ++d)
             b2 += solver::cell_field(s, d, c) * solver::cell_field(s, d, c);
           return b2;
         });
}

// One line of figures in the test output (ctest --output-on-failure, or the test log).
inline void report_counts(const char* what, const ProblemRun& run) {
  std::printf(
      "[%s] steps %ld, density floors %ld, pressure floors %ld, fallback cells %ld, "
      "largest |div B| dx/|B| %.3e over %d checks\n",
      what, run.steps, run.density_floors, run.pressure_floors, run.fallback_cells,
      run.largest_divergence, run.divergence_checks);
}

}  // namespace brume::verification
