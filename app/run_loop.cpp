#include "app/run_loop.hpp"

#include <algorithm>
#include <chrono>
#include <cmath>

#include "io/progress.hpp"
#include "solver/global_reductions.hpp"

namespace brume::app {

RunSummary run_loop(solver::Integrator& integrator, solver::State& state, const RunLimits& limits,
                    const io::Log& log, const solver::Decomposition& decomposition,
                    const RunHooks& hooks) {
  using Clock = std::chrono::steady_clock;
  const auto start = Clock::now();
  const MPI_Comm comm = decomposition.comm();
  const auto& box_cells = decomposition.box_cells();
  io::Progress progress(log, limits.progress_interval, limits.time_unit_name, state.step,
                        state.time / limits.time_unit);
  const long long cells = (long long)box_cells[0] * box_cells[1] * box_cells[2];
  RunSummary summary;
  summary.box_cells = cells;
  io::ProgressSample sample;
  sample.cells = cells;
  sample.stop_time = limits.stop_time / limits.time_unit;
  auto wall = [&] { return std::chrono::duration<double>(Clock::now() - start).count(); };
  // Every rank holds the same time and step count (the time step is agreed), so the loop
  // condition and the step limit agree by themselves.
  while (state.time < limits.stop_time) {
    if (limits.max_steps > 0 && state.step >= limits.max_steps) {
      summary.end = RunEnd::step_limit;
      break;
    }
    const solver::StepAgreement agreed =
        solver::agree_on_step(integrator.stable_time_step(state), wall(), comm,
                              hooks.stop_request ? hooks.stop_request() : 0);
    if (agreed.stop_signal != 0) {
      summary.end = RunEnd::stop_signal;
      summary.signal = agreed.stop_signal;
      break;
    }
    if (limits.wall_budget > 0.0 && agreed.wall_seconds >= limits.wall_budget) {
      summary.end = RunEnd::wall_budget;
      break;
    }
    // The last step lands on the stop time exactly, and steps land on scheduled outputs.
    const double next_output =
        hooks.next_output ? std::min(hooks.next_output(), limits.stop_time) : limits.stop_time;
    const bool lands = agreed.time_step >= next_output - state.time;
    const double dt = lands ? next_output - state.time : agreed.time_step;
    if (!(dt > 0.0) || !std::isfinite(dt)) {
      summary.end = RunEnd::time_step_collapse;
      summary.last_dt = dt;
      break;
    }
    const solver::StepReport report =
        solver::combine_step_reports(integrator.advance(state, dt), box_cells, comm);
    // t + (t_out − t) can round to one ulp short of t_out, which would cost a step of 1e-16.
    if (lands) state.time = next_output;
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
    const long long floored = report.density_floors + report.pressure_floors;
    if (double(floored) > limits.floor_limit * double(cells)) {
      summary.end = RunEnd::floors_exhausted;
      summary.failure = report.first_floored;
      summary.floored_in_step = floored;
      break;
    }
    if (hooks.after_step) hooks.after_step(state, summary, agreed.wall_seconds);
    sample.step = state.step;
    sample.time = state.time / limits.time_unit;
    sample.dt = dt / limits.time_unit;
    progress.update(sample, state.time >= limits.stop_time);
  }
  // The slowest rank's wall time is the run's.
  summary.wall_seconds = solver::agree_on_step(0.0, wall(), comm).wall_seconds;
  return summary;
}

}  // namespace brume::app
