#include "app/run_session.hpp"

#include <algorithm>
#include <cstdio>
#include <stdexcept>
#include <string>
#include <utility>

#include "app/checkpoint_schedule.hpp"
#include "app/diagnostics.hpp"
#include "app/exit_codes.hpp"
#include "app/on_rank_zero.hpp"
#include "app/run_loop.hpp"
#include "app/run_report.hpp"
#include "app/scheme_choice.hpp"
#include "app/snapshot_schedule.hpp"
#include "app/source_terms.hpp"
#include "app/statistics_schedule.hpp"
#include "app/stop_signals.hpp"
#include "app/user_error.hpp"
#include "io/atomic_file.hpp"
#include "solver/box_boundaries.hpp"
#include "solver/units/constants.hpp"

namespace brume::app {

namespace {

// What every snapshot of this run carries besides the fields.
io::SnapshotInfo snapshot_info(const config::ResolvedConfig& config, const RunSetup& setup) {
  const units::CodeUnits& u = setup.code_units;
  io::SnapshotInfo info;
  info.global_cells = setup.cells;
  info.lower = setup.lower;
  info.size = setup.size;
  info.units = {u.length,     u.time(),          u.density, u.density * u.velocity,
                u.pressure(), u.magnetic_field()};
  info.configuration = config.to_yaml(false);
  info.single_precision = config.text("output.precision") == "float32";
  if (config.text("output.compression") == "deflate")
    info.deflate_level = static_cast<int>(config.integer("output.compression_level"));
  return info;
}

RunLimits run_limits(const config::ResolvedConfig& config, const RunSetup& setup) {
  RunLimits limits;
  limits.stop_time = config.real("clock.stop_time") / setup.code_units.time();
  limits.max_steps = config.integer("clock.max_steps");
  limits.wall_budget = config.real("clock.wall_budget");
  limits.floor_limit = config.real("scheme.floor_limit");
  limits.progress_interval = config.real("output.progress_interval");
  limits.time_unit = units::cgs::megayear / setup.code_units.time();
  return limits;
}

// The run's own state for a checkpoint: the snapshot schedule, the totals at the start of the
// run (the report's reference) and the counts of floors and fallbacks since then.
io::RunRecord run_record(const SnapshotSchedule& snapshots, const StatisticsSchedule& statistics,
                         const SplitIntegrator& integrator, const RunTotals& start,
                         const io::RunRecord& earlier, const RunSummary& summary) {
  io::RunRecord record;
  snapshots.save(record);
  statistics.save(record);
  for (const auto& term : integrator.terms())
    term->save(record);
  record.set("initial_mass", start.mass);
  record.set("initial_momentum", std::vector<double>(start.momentum.begin(), start.momentum.end()));
  record.set("initial_energy", start.energy);
  auto count = [&](const char* name, long long now) {
    long long before = 0;
    for (const auto& [n, value] : earlier.integers())
      before = n == name ? value : before;
    record.set(name, before + now);
  };
  count("density_floors", summary.density_floors);
  count("pressure_floors", summary.pressure_floors);
  count("fallback_cells", summary.fallback_cells);
  return record;
}

// The floors and fallbacks of the whole run: the earlier invocations' and this one's.
RunCounters run_counters(const io::RunRecord& earlier, const RunSummary& summary) {
  auto before = [&](const char* name) {
    for (const auto& [n, value] : earlier.integers())
      if (n == name) return value;
    return 0LL;
  };
  return {before("density_floors") + summary.density_floors,
          before("pressure_floors") + summary.pressure_floors,
          before("fallback_cells") + summary.fallback_cells};
}

std::string statistics_report(const StatisticsSchedule& statistics, double run_seconds,
                              MPI_Comm comm) {
  double seconds = statistics.wall_seconds();
  MPI_Allreduce(MPI_IN_PLACE, &seconds, 1, MPI_DOUBLE, MPI_MAX, comm);
  char line[200];
  std::snprintf(line, sizeof line,
                "statistics: %d files, time series and measurements took %.3g s (%.2g %% of the "
                "run's wall time)",
                statistics.next_number(), seconds,
                run_seconds > 0.0 ? 100.0 * seconds / run_seconds : 0.0);
  return line;
}

RunTotals recorded_totals(const io::RunRecord& record) {
  RunTotals t;
  t.mass = record.real("initial_mass");
  const std::vector<double> momentum = record.array("initial_momentum");
  for (std::size_t d = 0; d < 3 && d < momentum.size(); ++d)
    t.momentum[d] = momentum[d];
  t.energy = record.real("initial_energy");
  return t;
}

}  // namespace

BlockLayout block_layout(const config::ResolvedConfig& config, const RunSetup& setup,
                         int ghost_layers) {
  BlockLayout layout;
  layout.boundaries = box_boundaries(config);
  std::array<bool, 3> periodic{};
  for (int d = 0; d < 3; ++d)
    periodic[d] = layout.boundaries.lower[d] == solver::BoundaryKind::periodic;
  std::array<int, 3> requested_ranks{};
  const auto ranks_key = config.integers3("box.ranks");
  for (int d = 0; d < 3; ++d)
    requested_ranks[d] = static_cast<int>(ranks_key[d]);
  // Every rank finds the same decomposition error: all of them stop with it.
  try {
    layout.decomposition = std::make_unique<solver::Decomposition>(
        MPI_COMM_WORLD, setup.cells, requested_ranks, periodic, ghost_layers);
  } catch (const solver::DecompositionError& error) {
    throw UserError(config.file_name() + ": " + error.what());
  }
  std::array<double, 3> upper{};
  for (int d = 0; d < 3; ++d)
    upper[d] = setup.lower[d] + setup.size[d];
  const solver::BlockGeometry whole_box = solver::whole_box_geometry(
      {static_cast<int>(setup.cells[0]), static_cast<int>(setup.cells[1]),
       static_cast<int>(setup.cells[2])},
      setup.lower, upper, ghost_layers);
  layout.geometry = layout.decomposition->block(whole_box);
  return layout;
}

RunSession make_session(config::ResolvedConfig config) {
  RunSetup setup = make_run_setup(config);
  const solver::SchemeOptions options = scheme_options(config, setup);
  BlockLayout layout = block_layout(config, setup, solver::required_ghost_layers(options));
  const solver::BlockGeometry& geometry = layout.geometry;
  const solver::BoxBoundaries& boundaries = layout.boundaries;
  std::unique_ptr<solver::Decomposition> decomposition = std::move(layout.decomposition);
  solver::State state = solver::make_state(geometry, setup.magnetic, setup.isothermal);
  auto ghosts = std::make_shared<solver::HaloExchange>(*decomposition, boundaries, geometry,
                                                       setup.magnetic, setup.isothermal);
  std::unique_ptr<solver::Integrator> ideal;
  try {
    ideal = solver::make_integrator(options, geometry, ghosts);
  } catch (const std::invalid_argument& error) {
    throw UserError(config.file_name() + ": scheme: " + error.what());
  }
  auto integrator = std::make_unique<SplitIntegrator>(
      std::move(ideal),
      make_source_terms(config, run_context(setup, decomposition->comm(), ghosts)), ghosts);
  return {std::move(config),        setup,
          std::move(decomposition), std::move(state),
          std::move(ghosts),        std::move(integrator)};
}

void log_ranks(const io::Log& log, const MpiSession& mpi, const RunSession& session) {
  log.info("brume: " + std::to_string(mpi.size()) + " rank" + (mpi.size() > 1 ? "s, " : ", ") +
           session.decomposition->describe());
}

int drive_run(RunSession& session, const std::filesystem::path& folder, const io::Log& log,
              const std::optional<Resumption>& resumed) {
  const config::ResolvedConfig& config = session.config;
  const RunSetup& setup = session.setup;
  solver::State& state = session.state;
  const MPI_Comm comm = session.decomposition->comm();
  const RunLimits limits = run_limits(config, setup);
  const io::SnapshotInfo info = snapshot_info(config, setup);
  SnapshotSchedule snapshots(
      folder, info, config.real("output.snapshot_interval") / setup.code_units.time(), comm, log);
  CheckpointSchedule checkpoints(folder, info, config.real("output.checkpoint_interval"),
                                 static_cast<int>(config.integer("output.checkpoints_kept")),
                                 resumed ? resumed->next_checkpoint : 0, comm, log);
  io::StatisticsHeader statistics_header;
  statistics_header.time_to_cgs = setup.code_units.time();
  statistics_header.source = folder.string();
  statistics_header.configuration = info.configuration;
  const physics::RunContext context = run_context(setup, comm, session.ghosts);
  StatisticsSchedule statistics(folder, make_diagnostics(config, context), context,
                                statistics_header,
                                config.real("statistics.interval") / setup.code_units.time(),
                                config.integer("statistics.timeline_every"), limits.time_unit, log);
  const io::RunRecord earlier = resumed ? resumed->record : io::RunRecord{};
  RunTotals start;
  SplitIntegrator& integrator = *session.integrator;
  if (resumed) {
    snapshots.restore(resumed->record, state);
    statistics.restore(resumed->record, state);
    for (const auto& term : integrator.terms())
      term->restore(resumed->record);
    start = recorded_totals(resumed->record);
  } else {
    snapshots.write(state, "initial");
    start = totals(state, comm);
    statistics.timeline_row(state, 0.0, integrator, {});
    statistics.measure(state, true);
  }
  const StopSignals signals;
  RunHooks hooks;
  hooks.next_output = [&] { return std::min(snapshots.next_time(), statistics.next_time()); };
  double previous_time = state.time;
  hooks.after_step = [&](const solver::State& s, const RunSummary& so_far, double wall) {
    const int snapshots_before = snapshots.next_number();
    snapshots.after_step(s);
    if (statistics.follows_snapshots() && snapshots.next_number() != snapshots_before)
      statistics.measure(s, false);
    statistics.after_step(s, s.time - previous_time, integrator, run_counters(earlier, so_far));
    previous_time = s.time;
    if (checkpoints.due(wall)) {
      statistics.write_timeline_hdf5();
      checkpoints.write(s, run_record(snapshots, statistics, integrator, start, earlier, so_far),
                        wall);
    }
  };
  hooks.stop_request = [] { return StopSignals::received(); };
  const RunSummary summary =
      run_loop(integrator, state, limits, log, *session.decomposition, hooks);
  const bool failed = summary.end == RunEnd::numerical_failure ||
                      summary.end == RunEnd::floors_exhausted ||
                      summary.end == RunEnd::time_step_collapse;
  const bool early = summary.end == RunEnd::wall_budget || summary.end == RunEnd::stop_signal;
  if (failed) {
    snapshots.write_failure(state);
  } else {
    // A run that stopped early is not finished: it gets a checkpoint, not a final snapshot.
    if (!early && state.time > 0.0) {
      snapshots.write(state, "final");
      statistics.timeline_row(state, state.time - previous_time, integrator,
                              run_counters(earlier, summary));
      statistics.measure(state, true);
    }
    checkpoints.write(state, run_record(snapshots, statistics, integrator, start, earlier, summary),
                      summary.wall_seconds);
  }
  statistics.write_timeline_hdf5();
  std::string report = run_report(summary, start, totals(state, comm), state, limits);
  for (const auto& term : integrator.terms()) {
    if (const std::string line = term->report(); !line.empty()) report += "\n  " + line;
  }
  report += "\n  " + statistics_report(statistics, summary.wall_seconds, comm);
  log.info(report);
  on_rank_zero(comm, [&] { io::write_file_atomically(folder / "summary.txt", report + "\n"); });
  if (failed) return exit_numerical_failure;
  return early ? exit_stopped_early : exit_success;
}

}  // namespace brume::app
