#include "app/run_session.hpp"

#include <stdexcept>
#include <string>
#include <utility>

#include "app/checkpoint_schedule.hpp"
#include "app/exit_codes.hpp"
#include "app/on_rank_zero.hpp"
#include "app/run_loop.hpp"
#include "app/run_report.hpp"
#include "app/scheme_choice.hpp"
#include "app/snapshot_schedule.hpp"
#include "app/source_terms.hpp"
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
io::RunRecord run_record(const SnapshotSchedule& snapshots, const SplitIntegrator& integrator,
                         const RunTotals& start, const io::RunRecord& earlier,
                         const RunSummary& summary) {
  io::RunRecord record;
  snapshots.save(record);
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

RunSession make_session(config::ResolvedConfig config) {
  RunSetup setup = make_run_setup(config);
  const solver::SchemeOptions options = scheme_options(config, setup);
  const solver::BoxBoundaries boundaries = box_boundaries(config);
  std::array<bool, 3> periodic{};
  for (int d = 0; d < 3; ++d)
    periodic[d] = boundaries.lower[d] == solver::BoundaryKind::periodic;
  const int ghost_layers = solver::required_ghost_layers(options);
  std::array<int, 3> requested_ranks{};
  const auto ranks_key = config.integers3("box.ranks");
  for (int d = 0; d < 3; ++d)
    requested_ranks[d] = static_cast<int>(ranks_key[d]);
  // Every rank finds the same decomposition error: all of them stop with it.
  std::unique_ptr<solver::Decomposition> decomposition;
  try {
    decomposition = std::make_unique<solver::Decomposition>(
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
  const solver::BlockGeometry geometry = decomposition->block(whole_box);
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
      make_source_terms(config, source_context(setup, decomposition->comm(), ghosts)), ghosts);
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
  const io::RunRecord earlier = resumed ? resumed->record : io::RunRecord{};
  RunTotals start;
  SplitIntegrator& integrator = *session.integrator;
  if (resumed) {
    snapshots.restore(resumed->record, state);
    for (const auto& term : integrator.terms())
      term->restore(resumed->record);
    start = recorded_totals(resumed->record);
  } else {
    snapshots.write(state, "initial");
    start = totals(state, comm);
  }
  const StopSignals signals;
  RunHooks hooks;
  hooks.next_output = [&] { return snapshots.next_time(); };
  hooks.after_step = [&](const solver::State& s, const RunSummary& so_far, double wall) {
    snapshots.after_step(s);
    if (checkpoints.due(wall))
      checkpoints.write(s, run_record(snapshots, integrator, start, earlier, so_far), wall);
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
    if (!early && state.time > 0.0) snapshots.write(state, "final");
    checkpoints.write(state, run_record(snapshots, integrator, start, earlier, summary),
                      summary.wall_seconds);
  }
  std::string report = run_report(summary, start, totals(state, comm), state, limits);
  for (const auto& term : integrator.terms()) {
    if (const std::string line = term->report(); !line.empty()) report += "\n  " + line;
  }
  log.info(report);
  on_rank_zero(comm, [&] { io::write_file_atomically(folder / "summary.txt", report + "\n"); });
  if (failed) return exit_numerical_failure;
  return early ? exit_stopped_early : exit_success;
}

}  // namespace brume::app
