// When a run writes its checkpoints: every output.checkpoint_interval of wall-clock time, and
// when it stops (stop time, step limit, wall budget, stop signal). A checkpoint is a float64
// snapshot with the run's own state in the group /run; the newest output.checkpoints_kept are
// kept.
#pragma once

#include <mpi.h>

#include <filesystem>

#include "io/log.hpp"
#include "io/run_record.hpp"
#include "io/snapshot.hpp"
#include "solver/state.hpp"

namespace brume::app {

class CheckpointSchedule {
 public:
  // `info`: what every snapshot of the run carries (precision and compression are overridden:
  // checkpoints are float64, uncompressed). interval: wall seconds between checkpoints, 0 for
  // none before the end. `next_number`: the number of the first checkpoint this run writes.
  CheckpointSchedule(std::filesystem::path folder, io::SnapshotInfo info, double interval, int kept,
                     int next_number, MPI_Comm comm, const io::Log& log);

  // True when the interval has passed since the last checkpoint (or the start). `wall_seconds`
  // must be the same on every rank (the run loop agrees on it).
  [[nodiscard]] bool due(double wall_seconds) const;
  // Writes checkpoint-NNNN.h5 with `record`, then removes the oldest beyond the kept number.
  // Collective. Returns the file written.
  std::filesystem::path write(const solver::State& state, io::RunRecord record,
                              double wall_seconds);

 private:
  std::filesystem::path folder_;
  io::SnapshotInfo info_;
  double interval_;
  int kept_;
  int number_;
  double last_wall_ = 0.0;
  MPI_Comm comm_;
  const io::Log& log_;
};

}  // namespace brume::app
