// When a run measures itself: a row of the time series (timeline.txt, timeline.h5) every
// statistics.timeline_every steps, and a statistics file (statistics-NNNN.h5) with the due
// diagnostics every statistics.interval of simulated time, or with every snapshot when the
// interval is 0; both at the start and at the end. The wall time it takes is counted and reported.
#pragma once

#include <mpi.h>

#include <filesystem>
#include <optional>
#include <set>
#include <string>
#include <vector>

#include "app/diagnostics.hpp"
#include "app/split_integrator.hpp"
#include "io/log.hpp"
#include "io/run_record.hpp"
#include "io/statistics_file.hpp"
#include "io/timeline_table.hpp"
#include "physics/cell_quantities.hpp"
#include "solver/state.hpp"

namespace brume::app {

// Counts of the run so far that the time series shows beside the measurements.
struct RunCounters {
  long long density_floors = 0;
  long long pressure_floors = 0;
  long long fallback_cells = 0;
};

class StatisticsSchedule {
 public:
  // interval: simulated time between statistics files (code units; 0: with the snapshots);
  // time_unit: code time per Myr (for the table).
  StatisticsSchedule(std::filesystem::path folder, std::vector<ScheduledDiagnostic> diagnostics,
                     physics::RunContext context, io::StatisticsHeader header, double interval,
                     long long timeline_every, double time_unit, const io::Log& log);

  // Simulated time of the next statistics file (+inf when they follow the snapshots).
  [[nodiscard]] double next_time() const { return next_; }
  [[nodiscard]] bool follows_snapshots() const { return interval_ <= 0.0; }

  // Writes statistics-NNNN.h5 with every diagnostic due at this count (all of them when
  // `everything`). Collective.
  void measure(const solver::State& state, bool everything);
  // Appends a row to the time series. Collective.
  void timeline_row(const solver::State& state, double dt, const SplitIntegrator& integrator,
                    const RunCounters& counters);
  // After a step: the row and the file when they are due. Collective.
  void after_step(const solver::State& state, double dt, const SplitIntegrator& integrator,
                  const RunCounters& counters);
  // Writes timeline.h5 (at checkpoints and at the end). Collective.
  void write_timeline_hdf5() const;

  void save(io::RunRecord& record) const;
  // Continues the schedule saved in `record`, and the time series up to `state.step`.
  void restore(const io::RunRecord& record, const solver::State& state);
  [[nodiscard]] int next_number() const { return count_; }
  // Wall time spent measuring so far (this rank), s.
  [[nodiscard]] double wall_seconds() const { return wall_; }

 private:
  void refresh_cells(const solver::State& state);

  std::filesystem::path folder_;
  std::vector<ScheduledDiagnostic> diagnostics_;
  physics::RunContext context_;
  io::StatisticsHeader header_;
  double interval_;
  double next_;
  long long timeline_every_;
  double time_unit_;
  const io::Log& log_;
  int count_ = 0;
  long last_step_ = -1;
  long last_row_step_ = -1;
  std::optional<double> initial_mechanical_;   // kinetic + magnetic energy at the start, erg
  std::optional<io::TimelineTable> timeline_;  // rank 0
  physics::CellQuantities cells_;  // reused storage, holding the state of step cells_step_
  long cells_step_ = -1;
  double wall_ = 0.0;
  std::set<std::string> printed_warnings_;  // warnings the log has shown (rank 0 prints)
  bool said_repeats_ = false;
};

}  // namespace brume::app
