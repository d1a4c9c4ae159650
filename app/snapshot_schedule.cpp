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

namespace {

std::string snapshot_name(int number) {
  char name[32];
  std::snprintf(name, sizeof name, "snapshot-%04d.h5", number);
  return name;
}

}  // namespace

void SnapshotSchedule::write(const solver::State& state, const std::string& reason) {
  if (state.step == last_step_) return;  // this state is written already
  last_step_ = state.step;
  write_file(folder_ / snapshot_name(count_++), state, reason, true);
}

void SnapshotSchedule::save(io::RunRecord& record) const {
  record.set("snapshot_count", static_cast<long long>(count_));
  record.set("snapshot_next_time", next_);
  record.set("snapshot_last_step", static_cast<long long>(last_step_));
  std::vector<double> times;
  for (const io::XdmfSnapshot& s : series_)
    times.push_back(s.time);
  record.set("snapshot_times", std::move(times));
}

void SnapshotSchedule::restore(const io::RunRecord& record, const solver::State& state) {
  count_ = static_cast<int>(record.integer("snapshot_count"));
  next_ = record.real("snapshot_next_time");
  last_step_ = static_cast<long>(record.integer("snapshot_last_step"));
  series_.clear();
  const std::vector<double> times = record.array("snapshot_times");
  for (std::size_t n = 0; n < times.size(); ++n) {
    io::XdmfSnapshot s = io::xdmf_snapshot(snapshot_name(int(n)), state, info_);
    s.time = times[n];
    series_.push_back(s);
  }
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
