// When and where a run writes its snapshots: the initial state, one every output.snapshot_interval
// of simulated time, the final state, and a diagnostic snapshot when the step fails. Each file has
// an XDMF sidecar, and the numbered snapshots form the run's XDMF time series (io/xdmf.hpp).
#pragma once

#include <mpi.h>

#include <filesystem>
#include <string>
#include <vector>

#include "io/log.hpp"
#include "io/snapshot.hpp"
#include "io/xdmf.hpp"
#include "solver/state.hpp"

namespace brume::app {

class SnapshotSchedule {
 public:
  // interval: simulated time between snapshots (code units), 0 for none between first and last.
  SnapshotSchedule(std::filesystem::path folder, io::SnapshotInfo info, double interval,
                   MPI_Comm comm, const io::Log& log);

  // Writes snapshot-NNNN.h5 (the next number) with the given reason, unless this step was written
  // already, its sidecar snapshot-NNNN.xmf and the time series snapshots.xmf. Collective.
  void write(const solver::State& state, const std::string& reason);
  // Writes failure-stepN.h5: the state as the failed step left it, and its sidecar (it is not
  // part of the time series). Collective.
  void write_failure(const solver::State& state);

  // Simulated time of the next scheduled snapshot (+inf when none is scheduled).
  [[nodiscard]] double next_time() const;
  // Writes the scheduled snapshot when `state` has reached its time. Collective.
  void after_step(const solver::State& state);

  // The schedule's state, for checkpoints: numbering, next time, the times of the series.
  void save(io::RunRecord& record) const;
  // Continues the schedule saved in `record`; `state` is the restarted state (for the series).
  void restore(const io::RunRecord& record, const solver::State& state);
  // The number the next snapshot file takes.
  [[nodiscard]] int next_number() const { return count_; }

 private:
  void write_file(const std::filesystem::path& file, const solver::State& state,
                  const std::string& reason, bool in_series);
  // Rank 0 writes the XDMF files; a failure there stops every rank.
  void write_xdmf(const std::filesystem::path& file, const io::XdmfSnapshot& snapshot,
                  bool in_series) const;

  std::filesystem::path folder_;
  io::SnapshotInfo info_;
  double interval_;
  double next_;
  int count_ = 0;
  long last_step_ = -1;
  std::vector<io::XdmfSnapshot> series_;
  MPI_Comm comm_;
  const io::Log& log_;
};

}  // namespace brume::app
