// brume analyze SNAPSHOT: the diagnostics of a run, measured on a saved snapshot with the same code
// the run uses inline, on any number of ranks; the results go to a statistics file of their own.
#include <mpi.h>

#include <cstdio>
#include <filesystem>
#include <stdexcept>
#include <string>
#include <vector>

#include "app/commands.hpp"
#include "app/diagnostics.hpp"
#include "app/exit_codes.hpp"
#include "app/on_rank_zero.hpp"
#include "app/run_session.hpp"
#include "app/schema.hpp"
#include "app/source_terms.hpp"
#include "app/user_error.hpp"
#include "io/config/load.hpp"
#include "io/snapshot_reader.hpp"
#include "io/statistics_file.hpp"
#include "physics/cell_quantities.hpp"

namespace brume::app {

namespace fs = std::filesystem;

namespace {

// The snapshot's gas and box are what they are: only what is measured, and how, may change.
void check_overrides(const std::vector<std::string>& overrides) {
  for (const std::string& o : overrides) {
    for (const char* fixed : {"box.", "gas.", "units.", "problem."}) {
      if (o.rfind(fixed, 0) == 0) {
        throw UserError("--set " + o + ": brume analyze measures the snapshot as it is; " +
                        std::string(fixed, std::string(fixed).size() - 1) +
                        ".* keys cannot change (set the diagnostics' sections instead)");
      }
    }
  }
}

// snapshot-0003.h5 -> snapshot-0003-statistics.h5 beside it.
fs::path default_output(const fs::path& snapshot) {
  fs::path out = snapshot;
  out.replace_filename(snapshot.stem().string() + "-statistics.h5");
  return out;
}

}  // namespace

int analyze_command(const CommandLine& line, const io::Log& log) {
  if (line.positional.size() != 1) {
    throw UserError("command line: brume analyze takes one snapshot file, found " +
                    std::to_string(line.positional.size()) +
                    " (brume analyze SNAPSHOT [--out FILE] [--set SECTION.KEY=VALUE]...)");
  }
  check_overrides(line.overrides);
  const fs::path file = line.positional.front();
  const fs::path out = line.out ? fs::path(*line.out) : default_output(file);
  if (fs::exists(out)) {
    throw UserError(out.string() +
                    ": exists; brume analyze never replaces a file (choose another with --out)");
  }
  std::optional<io::SnapshotReader> reader;
  try {
    reader.emplace(file, MPI_COMM_WORLD);
  } catch (const io::SnapshotFileError& error) {
    throw UserError(error.what());
  }
  const io::SnapshotHeader& header = reader->header();
  const config::ResolvedConfig config =
      config::load_text(brume_schema(), header.configuration,
                        file.string() + " (stored configuration)", line.overrides);
  const RunSetup setup = make_run_setup(config);
  BlockLayout layout = block_layout(config, setup, 1);
  solver::State state = solver::make_state(layout.geometry, setup.magnetic, setup.isothermal);
  if (state.magnetic != reader->magnetic() || state.isothermal != reader->isothermal()) {
    throw UserError(file.string() +
                    ": its fields do not match the gas its configuration describes");
  }
  try {
    reader->read_block(state);
  } catch (const io::SnapshotFileError& error) {
    throw UserError(error.what());
  }
  state.time = header.time;
  state.step = static_cast<long>(header.step);
  const MPI_Comm comm = layout.decomposition->comm();
  const physics::RunContext context = run_context(setup, comm, nullptr);
  const std::vector<ScheduledDiagnostic> diagnostics = make_diagnostics(config, context);
  if (diagnostics.empty()) {
    throw UserError(file.string() +
                    ": no diagnostic is enabled in its configuration or by --set (see brume "
                    "keys statistics and docs/statistics.md)");
  }
  const physics::CellQuantities cells = physics::cell_quantities(state, context);
  std::vector<io::Measurement> results;
  for (const ScheduledDiagnostic& d : diagnostics)
    results.push_back(d.diagnostic->measure(cells, context));
  io::StatisticsHeader info;
  info.time = header.time;
  info.time_to_cgs = header.time_to_cgs;
  info.step = state.step;
  info.source = file.string();
  info.configuration = config.to_yaml(false);
  on_rank_zero(comm, [&] {
    try {
      io::write_statistics(out, info, results);
    } catch (const std::runtime_error& error) {
      throw UserError(error.what());
    }
  });
  for (const io::Measurement& m : results) {
    for (const std::string& w : m.warnings)
      log.warning(m.name + ": " + w);
  }
  log.info("brume: " + std::to_string(results.size()) + " measurement" +
           (results.size() == 1 ? "" : "s") + " of " + file.string() + " written to " +
           out.string());
  return exit_success;
}

}  // namespace brume::app
