#include "app/run_loop.hpp"

#include <algorithm>
#include <chrono>
#include <cmath>

#include "io/progress.hpp"

namespace brume::app {

RunSummary run_loop(solver::Integrator& integrator, solver::State& state, const RunLimits& limits,
                    const io::Log& log) {
  using Clock = std::chrono::steady_clock;
  const auto start = Clock::now();
  io::Progress progress(log, limits.progress_interval, limits.time_unit_name);
  const long long cells = state.geometry.interior_cells();
  RunSummary summary;
  io::ProgressSample sample;
  sample.cells = cells;
  sample.stop_time = limits.stop_time / limits.time_unit;
  auto wall = [&] { return std::chrono::duration<double>(Clock::now() - start).count(); };
  while (state.time < limits.stop_time) {
    if (limits.max_steps > 0 && summary.steps >= limits.max_steps) {
      summary.end = RunEnd::step_limit;
      break;
    }
    if (limits.wall_budget > 0.0 && wall() >= limits.wall_budget) {
      summary.end = RunEnd::wall_budget;
      break;
    }
    // The last step lands on the stop time exactly.
    const double dt = std::min(integrator.stable_time_step(state), limits.stop_time - state.time);
    if (!(dt > 0.0) || !std::isfinite(dt)) {
      summary.end = RunEnd::time_step_collapse;
      summary.last_dt = dt;
      break;
    }
    const solver::StepReport report = integrator.advance(state, dt);
    summary.density_floors += report.density_floors;
    summary.pressure_floors += report.pressure_floors;
    summary.fallback_cells += report.fallback_cells;
    ++summary.steps;
    summary.cell_updates += cells;
    if (!report.ok()) {
      summary.end = RunEnd::numerical_failure;
      summary.failure = report.failure;
      break;
    }
    sample.step = state.step;
    sample.time = state.time / limits.time_unit;
    sample.dt = dt / limits.time_unit;
    progress.update(sample, state.time >= limits.stop_time);
  }
  summary.wall_seconds = wall();
  return summary;
}

}  // namespace brume::app
