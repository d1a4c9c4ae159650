#include "app/snapshot_schedule.hpp"

#include <cmath>
#include <cstdio>
#include <limits>
#include <stdexcept>
#include <utility>

#include "io/atomic_file.hpp"
#include "io/first_failure.hpp"

namespace brume::app {

SnapshotSchedule::SnapshotSchedule(std::filesystem::path folder, io::SnapshotInfo info,
                                   double interval, MPI_Comm comm, const io::Log& log)
    : folder_(std::move(folder)),
      info_(std::move(info)),
      interval_(interval),
      next_(interval > 0.0 ? interval : std::numeric_limits<double>::infinity()),
      comm_(comm),
      log_(log) {}

double SnapshotSchedule::next_time() const {
  return next_;
}

void SnapshotSchedule::write_file(const std::filesystem::path& file, const solver::State& state,
                                  const std::string& reason, bool in_series) {
  info_.reason = reason;
  io::write_snapshot(file, state, info_, comm_);
  const io::XdmfSnapshot snapshot = io::xdmf_snapshot(file.filename().string(), state, info_);
  if (in_series) series_.push_back(snapshot);
  write_xdmf(file, snapshot, in_series);
  log_.detail("brume: wrote " + file.string() + " and " + io::sidecar_path(file).string());
}

void SnapshotSchedule::write_xdmf(const std::filesystem::path& file,
                                  const io::XdmfSnapshot& snapshot, bool in_series) const {
  int rank = 0;
  MPI_Comm_rank(comm_, &rank);
  std::string failure;
  if (rank == 0) {
    try {
      io::write_file_atomically(io::sidecar_path(file), io::snapshot_xdmf(snapshot));
      if (in_series) {
        io::write_file_atomically(folder_ / io::time_series_file, io::time_series_xdmf(series_));
      }
    } catch (const std::runtime_error& error) {
      failure = error.what();
    }
  }
  const std::string agreed = io::first_failure(comm_, failure);
  if (!agreed.empty()) throw std::runtime_error(agreed);
}

void SnapshotSchedule::write(const solver::State& state, const std::string& reason) {
  if (state.step == last_step_) return;  // this state is written already
  last_step_ = state.step;
  char name[32];
  std::snprintf(name, sizeof name, "snapshot-%04d.h5", count_++);
  write_file(folder_ / name, state, reason, true);
}

void SnapshotSchedule::write_failure(const solver::State& state) {
  const auto file = folder_ / ("failure-step" + std::to_string(state.step) + ".h5");
  write_file(file, state, "numerical failure", false);
  log_.warning("diagnostic snapshot of the failed step: " + file.string());
}

void SnapshotSchedule::after_step(const solver::State& state) {
  // The run loop lands steps on next_ exactly up to round-off in t + (next_ − t).
  if (state.time < next_ - 1e-12 * interval_) return;
  write(state, "scheduled");
  while (next_ <= state.time + 1e-12 * interval_)
    next_ += interval_;
}

}  // namespace brume::app
