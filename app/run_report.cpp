#include "app/run_report.hpp"

#include <cmath>
#include <cstdio>

#include "app/stop_signals.hpp"
#include "io/progress.hpp"
#include "solver/exact_sum.hpp"

namespace brume::app {

RunTotals totals(const solver::State& state, MPI_Comm comm) {
  const auto& g = state.geometry;
  const double volume = g.spacing[0] * g.spacing[1] * g.spacing[2];
  // mass, three momenta, energy
  std::array<solver::ExactSum, 5> sums;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i) {
        const auto c = g.index(i, j, k);
        sums[0].add(state.density[c] * volume);
        for (int d = 0; d < 3; ++d)
          sums[std::size_t(d) + 1].add(state.momentum[d][c] * volume);
        if (!state.isothermal) sums[4].add(state.energy[c] * volume);
      }
    }
  }
  for (auto& sum : sums)
    sum.combine(comm);
  RunTotals t;
  t.mass = sums[0].value();
  for (int d = 0; d < 3; ++d)
    t.momentum[d] = sums[std::size_t(d) + 1].value();
  t.energy = sums[4].value();
  return t;
}

namespace {

const char* end_text(RunEnd end) {
  switch (end) {
    case RunEnd::stop_time:
      return "reached the stop time";
    case RunEnd::step_limit:
      return "reached clock.max_steps";
    case RunEnd::wall_budget:
      return "used up clock.wall_budget";
    case RunEnd::numerical_failure:
      return "stopped on a numerical failure";
    case RunEnd::time_step_collapse:
      return "stopped: the time step collapsed";
    case RunEnd::floors_exhausted:
      return "stopped: the floors acted on too many cells";
    case RunEnd::stop_signal:
      return "stopped on a stop signal";
  }
  return "?";
}

// "at step S (stage s), t = …, cell (i, j, k): density …, momentum (…), energy …".
std::string cell_text(const solver::NumericalFailure& f, const solver::State& state,
                      const RunLimits& limits) {
  char text[512];
  std::snprintf(text, sizeof text,
                "at step %ld (stage %d), t = %.6g %s, cell (%ld, %ld, %ld): density %.6g, momentum "
                "(%.6g, %.6g, %.6g), energy %.6g",
                f.step, f.stage, state.time / limits.time_unit, limits.time_unit_name, f.cell[0],
                f.cell[1], f.cell[2], f.density, f.momentum[0], f.momentum[1], f.momentum[2],
                f.energy);
  return text;
}

double relative_change(double before, double after) {
  return before != 0.0 ? (after - before) / std::fabs(before) : after - before;
}

}  // namespace

std::string run_report(const RunSummary& s, const RunTotals& before, const RunTotals& after,
                       const solver::State& state, const RunLimits& limits) {
  char text[1024];
  std::string report;
  const double rate =
      s.wall_seconds > 0.0 ? static_cast<double>(s.cell_updates) / s.wall_seconds : 0.0;
  std::snprintf(text, sizeof text,
                "brume: run %s after %lld steps at t = %.6g %s, wall %s, %.3e cell-updates/s\n"
                "  floors applied: density %lld, pressure %lld; first-order fallback cells %lld\n"
                "  relative change of total mass %.3e, total energy %.3e",
                end_text(s.end), s.steps, state.time / limits.time_unit, limits.time_unit_name,
                io::format_duration(s.wall_seconds).c_str(), rate, s.density_floors,
                s.pressure_floors, s.fallback_cells, relative_change(before.mass, after.mass),
                state.isothermal ? 0.0 : relative_change(before.energy, after.energy));
  report = text;
  if (s.end == RunEnd::numerical_failure) {
    report += "\n  non-finite value " + cell_text(s.failure, state, limits);
  } else if (s.end == RunEnd::floors_exhausted) {
    std::snprintf(
        text, sizeof text,
        "\n  floors acted %lld times in one step, %.3g of the %lld cells (scheme.floor_limit"
        " = %.3g); first floored ",
        s.floored_in_step, double(s.floored_in_step) / double(s.box_cells), s.box_cells,
        limits.floor_limit);
    report += text + cell_text(s.failure, state, limits) + " (before the floor)";
  } else if (s.end == RunEnd::stop_signal) {
    report += std::string("\n  ") + signal_name(s.signal) +
              " received: stopped at the end of step " + std::to_string(state.step);
  } else if (s.end == RunEnd::time_step_collapse) {
    std::snprintf(text, sizeof text, "\n  time step %.6g at step %ld, t = %.6g %s", s.last_dt,
                  state.step, state.time / limits.time_unit, limits.time_unit_name);
    report += text;
  }
  return report;
}

}  // namespace brume::app
