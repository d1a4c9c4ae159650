#include "app/run_restart.hpp"

#include <filesystem>
#include <string>
#include <system_error>
#include <vector>

#include "app/checkpoint_files.hpp"
#include "app/on_rank_zero.hpp"
#include "app/run_session.hpp"
#include "app/schema.hpp"
#include "app/user_error.hpp"
#include "io/config/load.hpp"
#include "io/snapshot_reader.hpp"
#include "io/timeline_table.hpp"

namespace brume::app {

namespace fs = std::filesystem;

namespace {

// A restart continues the same physics: only when and what it writes may change.
void check_overrides(const std::vector<std::string>& overrides) {
  for (const std::string& o : overrides) {
    if (o.rfind("clock.", 0) != 0 && o.rfind("output.", 0) != 0) {
      throw UserError("--set " + o +
                      ": with --restart only clock.* and output.* keys may change (the run "
                      "continues the physics of its checkpoint)");
    }
  }
}

// Outputs of the earlier run beyond the checkpoint (a later snapshot or checkpoint: the run went
// on after it, or an older checkpoint is resumed) are moved into a folder of their own, never
// overwritten. Rank 0.
void set_aside_later_outputs(const fs::path& folder, const io::RunRecord& record,
                             int resumed_checkpoint, long step, const io::Log& log) {
  const long long snapshot_count = record.integer("snapshot_count");
  const long long statistics_count = record.integer("statistics_count");
  std::vector<fs::path> later;
  std::error_code error;
  for (const auto& entry : fs::directory_iterator(folder, error)) {
    if (const auto number = output_number(entry.path(), "snapshot");
        number && *number >= snapshot_count) {
      later.push_back(entry.path());
      later.push_back(fs::path(entry.path()).replace_extension(".xmf"));
    } else if (const auto n = checkpoint_number(entry.path()); n && *n > resumed_checkpoint) {
      later.push_back(entry.path());
    } else if (const auto s = output_number(entry.path(), "statistics");
               s && *s >= statistics_count) {
      later.push_back(entry.path());
    }
  }
  // The time series goes on from the checkpoint's row: when the earlier run wrote rows after it,
  // a copy of its table goes aside too (the run then rewrites the table with the rows it keeps).
  const fs::path timeline = folder / "timeline.txt";
  bool copy_timeline = false;
  try {
    if (const auto table = io::read_timeline_file(timeline, step)) {
      copy_timeline = table->dropped_rows;
    }
  } catch (const std::runtime_error& bad) {
    throw UserError(std::string("--restart: ") + bad.what());
  }
  if (later.empty() && !copy_timeline) return;
  const fs::path aside = folder / ("superseded-at-step" + std::to_string(step));
  fs::create_directories(aside, error);
  if (error) throw UserError("--restart: cannot create " + aside.string() + ": " + error.message());
  for (const fs::path& file : later) {
    if (!fs::exists(file)) continue;
    fs::rename(file, aside / file.filename(), error);
    if (error) {
      throw UserError("--restart: cannot move " + file.string() + " into " + aside.string() + ": " +
                      error.message());
    }
  }
  if (copy_timeline) {
    fs::copy_file(timeline, aside / "timeline.txt", error);
    if (error) {
      throw UserError("--restart: cannot copy " + timeline.string() + " into " + aside.string() +
                      ": " + error.message());
    }
    log.warning("the time series of the earlier run went on after the checkpoint: a copy is in " +
                aside.string());
  }
  if (later.empty()) return;
  log.warning(std::to_string(later.size()) +
              " files written after the checkpoint by the earlier run moved into " +
              aside.string());
}

}  // namespace

int restart_run(const CommandLine& line, const io::Log& log_in, const MpiSession& mpi) {
  if (!line.positional.empty()) {
    throw UserError("command line: brume run --restart takes no configuration file (found " +
                    line.positional.front() + "): the checkpoint holds the configuration");
  }
  if (line.out) {
    throw UserError(
        "command line: brume run --restart continues in the checkpoint's run folder; "
        "--out is not allowed with it");
  }
  check_overrides(line.overrides);
  const fs::path file = restart_file(*line.restart);
  std::optional<io::SnapshotReader> reader;
  try {
    reader.emplace(file, MPI_COMM_WORLD);
  } catch (const io::SnapshotFileError& error) {
    throw UserError(std::string("--restart: ") + error.what());
  }
  if (!reader->run_record()) {
    throw UserError("--restart: " + file.string() +
                    ": a snapshot, not a checkpoint (no group /run); restart from a "
                    "checkpoint-NNNN.h5 file");
  }
  for (const io::StoredDataset& d : reader->datasets()) {
    if (d.known && d.type != "float64") {
      throw UserError("--restart: " + file.string() + ": dataset " + d.name + " is " + d.type +
                      ", a checkpoint holds float64");
    }
  }
  const io::SnapshotHeader& header = reader->header();
  RunSession session =
      make_session(config::load_text(brume_schema(), header.configuration,
                                     file.string() + " (stored configuration)", line.overrides));
  solver::State& state = session.state;
  if (state.magnetic != reader->magnetic() || state.isothermal != reader->isothermal()) {
    throw UserError("--restart: " + file.string() +
                    ": its fields do not match the gas its configuration describes");
  }
  try {
    reader->read_block(state);
  } catch (const io::SnapshotFileError& error) {
    throw UserError(std::string("--restart: ") + error.what());
  }
  state.time = header.time;
  state.step = static_cast<long>(header.step);
  session.ghosts->fill(state);
  Resumption resumed;
  resumed.record = *reader->run_record();
  reader.reset();
  const int number = static_cast<int>(resumed.record.integer("checkpoint_number"));
  resumed.next_checkpoint = number + 1;
  const fs::path folder = file.parent_path().empty() ? fs::path(".") : file.parent_path();
  io::Log log = log_in;
  log.copy_to(folder / "run.log");
  on_rank_zero(session.decomposition->comm(),
               [&] { set_aside_later_outputs(folder, resumed.record, number, state.step, log); });
  log.info("brume: restart from " + file.string() + " at step " + std::to_string(state.step));
  for (const std::string& o : line.overrides)
    log.info("brume: changed on restart: " + o);
  log_ranks(log, mpi, session);
  return drive_run(session, folder, log, resumed);
}

}  // namespace brume::app
