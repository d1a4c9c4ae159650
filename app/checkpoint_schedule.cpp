#include "app/checkpoint_schedule.hpp"

#include <utility>

#include "app/checkpoint_files.hpp"

namespace brume::app {

CheckpointSchedule::CheckpointSchedule(std::filesystem::path folder, io::SnapshotInfo info,
                                       double interval, int kept, int next_number, MPI_Comm comm,
                                       const io::Log& log)
    : folder_(std::move(folder)),
      info_(std::move(info)),
      interval_(interval),
      kept_(kept),
      number_(next_number),
      comm_(comm),
      log_(log) {
  info_.single_precision = false;
  info_.deflate_level = 0;
  info_.reason = "checkpoint";
}

bool CheckpointSchedule::due(double wall_seconds) const {
  return interval_ > 0.0 && wall_seconds - last_wall_ >= interval_;
}

std::filesystem::path CheckpointSchedule::write(const solver::State& state, io::RunRecord record,
                                                double wall_seconds) {
  const std::filesystem::path file = folder_ / checkpoint_name(number_);
  record.set("checkpoint_number", static_cast<long long>(number_));
  info_.run_record = std::move(record);
  io::write_snapshot(file, state, info_, comm_);
  info_.run_record.reset();
  ++number_;
  last_wall_ = wall_seconds;
  int rank = 0;
  MPI_Comm_rank(comm_, &rank);
  if (rank == 0) prune_checkpoints(folder_, kept_);
  MPI_Barrier(comm_);  // no rank goes on while old checkpoints are being removed
  log_.info("brume: checkpoint " + file.string());
  return file;
}

}  // namespace brume::app
