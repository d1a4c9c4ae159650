#include <mpi.h>

#include <cstdio>
#include <filesystem>
#include <functional>
#include <stdexcept>
#include <string>

#include "app/commands.hpp"
#include "app/exit_codes.hpp"
#include "app/run_loop.hpp"
#include "app/run_report.hpp"
#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/scheme_choice.hpp"
#include "app/snapshot_schedule.hpp"
#include "app/user_error.hpp"
#include "io/atomic_file.hpp"
#include "io/config/load.hpp"
#include "io/provenance.hpp"
#include "io/run_folder.hpp"
#include "solver/box_boundaries.hpp"
#include "solver/decomposition.hpp"
#include "solver/halo_exchange.hpp"
#include "solver/units/constants.hpp"

namespace brume::app {

namespace fs = std::filesystem;

namespace {

fs::path run_folder(const CommandLine& line, const config::ResolvedConfig& config) {
  if (line.out) return *line.out;
  if (!config.text("output.folder").empty()) return config.text("output.folder");
  return fs::path("runs") / fs::path(line.positional.front()).stem();
}

std::string resolved_configuration_file(const config::ResolvedConfig& config) {
  std::string text = "# Written by brume from " + config.file_name() + "\n";
  for (const auto& [name, value] : io::provenance())
    text += "#   " + name + ": " + value + "\n";
  return text + config.to_yaml(true);
}

// Runs `action` on rank 0 only; a user error there becomes the same user error on every rank,
// so that no rank waits for one that has given up.
void on_rank_zero(MPI_Comm comm, const std::function<void()>& action) {
  int rank = 0;
  MPI_Comm_rank(comm, &rank);
  std::string message;
  if (rank == 0) {
    try {
      action();
    } catch (const UserError& error) {
      message = error.what();
      if (message.empty()) message = "brume run: error on rank 0";
    }
  }
  int length = static_cast<int>(message.size());
  MPI_Bcast(&length, 1, MPI_INT, 0, comm);
  if (length == 0) return;
  message.resize(static_cast<std::size_t>(length));
  MPI_Bcast(message.data(), length, MPI_CHAR, 0, comm);
  throw UserError(message);
}

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

}  // namespace

int run_command(const CommandLine& line, const io::Log& log_in, const MpiSession& mpi) {
  if (line.positional.size() != 1) {
    throw UserError("command line: brume run takes one configuration file, found " +
                    std::to_string(line.positional.size()) + " (brume run CONFIG [--set ...])");
  }
  const config::ResolvedConfig config =
      config::load(brume_schema(), line.positional.front(), line.overrides);
  const RunSetup setup = make_run_setup(config);
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

  const fs::path folder = run_folder(line, config);
  on_rank_zero(decomposition->comm(), [&] {
    try {
      io::create_run_folder(folder);
    } catch (const io::RunFolderError& error) {
      throw UserError(std::string("brume run: ") + error.what());
    }
    io::write_file_atomically(folder / "config.yaml", resolved_configuration_file(config));
  });
  io::Log log = log_in;
  log.copy_to(folder / "run.log");  // rank 0 only: the others do not speak
  log.info("brume: run folder " + folder.string());
  log.info("brume: " + std::to_string(mpi.size()) + " rank" + (mpi.size() > 1 ? "s, " : ", ") +
           decomposition->describe());

  std::array<double, 3> upper{};
  for (int d = 0; d < 3; ++d)
    upper[d] = setup.lower[d] + setup.size[d];
  const solver::BlockGeometry whole_box = solver::whole_box_geometry(
      {static_cast<int>(setup.cells[0]), static_cast<int>(setup.cells[1]),
       static_cast<int>(setup.cells[2])},
      setup.lower, upper, ghost_layers);
  const solver::BlockGeometry geometry = decomposition->block(whole_box);
  solver::State state = solver::make_state(geometry, setup.magnetic, setup.isothermal);
  setup.problem->set_up(setup_context(config, setup), state);
  auto ghosts = std::make_shared<solver::HaloExchange>(*decomposition, boundaries, geometry,
                                                       setup.magnetic, setup.isothermal);
  ghosts->fill(state);

  std::unique_ptr<solver::Integrator> integrator;
  try {
    integrator = solver::make_integrator(options, geometry, ghosts);
  } catch (const std::invalid_argument& error) {
    throw UserError(config.file_name() + ": scheme: " + error.what());
  }

  RunLimits limits;
  limits.stop_time = config.real("clock.stop_time") / setup.code_units.time();
  limits.max_steps = config.integer("clock.max_steps");
  limits.wall_budget = config.real("clock.wall_budget");
  limits.floor_limit = config.real("scheme.floor_limit");
  limits.progress_interval = config.real("output.progress_interval");
  limits.time_unit = units::cgs::megayear / setup.code_units.time();
  const MPI_Comm comm = decomposition->comm();
  SnapshotSchedule snapshots(folder, snapshot_info(config, setup),
                             config.real("output.snapshot_interval") / setup.code_units.time(),
                             comm, log);
  snapshots.write(state, "initial");
  const RunHooks hooks{[&] { return snapshots.next_time(); },
                       [&](const solver::State& s) { snapshots.after_step(s); }};
  const RunTotals before = totals(state, comm);
  const RunSummary summary = run_loop(*integrator, state, limits, log, *decomposition, hooks);
  const bool failed = summary.end == RunEnd::numerical_failure ||
                      summary.end == RunEnd::floors_exhausted ||
                      summary.end == RunEnd::time_step_collapse;
  if (failed) {
    snapshots.write_failure(state);
  } else if (state.time > 0.0) {
    snapshots.write(state, "final");
  }
  const std::string report = run_report(summary, before, totals(state, comm), state, limits);
  log.info(report);
  on_rank_zero(comm, [&] { io::write_file_atomically(folder / "summary.txt", report + "\n"); });
  return failed ? exit_numerical_failure : exit_success;
}

}  // namespace brume::app
