// The run loop: advances the state from its time to the stop time (or a step or wall-time limit),
// reports progress, and stops on a numerical failure. On many ranks every rank runs it on its own
// block; the time step, the stop decisions and the step reports are agreed over all ranks, so that
// every rank takes the same steps and the summary is the same everywhere.
#pragma once

#include <functional>

#include "io/log.hpp"
#include "solver/decomposition.hpp"
#include "solver/integrator.hpp"
#include "solver/state.hpp"

namespace brume::app {

struct RunLimits {
  double stop_time = 0.0;        // code units
  long long max_steps = 0;       // 0: no limit
  double wall_budget = 0.0;      // seconds; 0: no limit
  double floor_limit = 1.0;      // largest fraction of the cells floored in one step
  double progress_interval = 5;  // wall seconds between progress lines
  double time_unit = 1.0;        // code time unit in the unit progress lines show (Myr)
  const char* time_unit_name = "Myr";
};

enum class RunEnd {
  stop_time,
  step_limit,
  wall_budget,
  numerical_failure,
  time_step_collapse,
  floors_exhausted,
  stop_signal  // SIGTERM, SIGINT or SIGUSR1 (RunSummary::signal)
};

struct RunSummary {
  RunEnd end = RunEnd::stop_time;
  long long steps = 0;
  double wall_seconds = 0.0;
  long long box_cells = 0;     // cells of the whole box
  long long cell_updates = 0;  // over the whole box
  long long density_floors = 0;
  long long pressure_floors = 0;
  long long fallback_cells = 0;
  solver::NumericalFailure failure;  // the non-finite cell, or the first floored cell
  long long floored_in_step = 0;     // cell-stages floored in the step that exhausted the floors
  int signal = 0;                    // the stop signal that ended the run
  double last_dt = 0.0;              // the offending time step when the step collapsed
};

// Collective over the decomposition's communicator; `state` is this rank's block.
// What the loop calls besides the integrator: outputs on their schedule.
struct RunHooks {
  // Simulated time of the next scheduled output (code units; none or +inf: no output): steps
  // land on it.
  std::function<double()> next_output;
  // Called on every rank after every successful step with the summary so far and the wall time
  // agreed at the start of the step (the same on every rank) (may be empty).
  std::function<void(const solver::State&, const RunSummary&, double)> after_step;
  // A stop request before each step: a signal number, 0 for none (may be empty).
  std::function<int()> stop_request;
};

[[nodiscard]] RunSummary run_loop(solver::Integrator& integrator, solver::State& state,
                                  const RunLimits& limits, const io::Log& log,
                                  const solver::Decomposition& decomposition,
                                  const RunHooks& hooks = {});

}  // namespace brume::app
