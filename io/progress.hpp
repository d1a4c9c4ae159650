// The rate-limited progress line of a run: step, simulated time, time step, cell-updates per second
// and the estimated wall time to the end, printed at most once per interval of wall-clock time.
#pragma once

#include <chrono>
#include <string>

#include "io/log.hpp"

namespace brume::io {

struct ProgressSample {
  long long step = 0;
  double time = 0.0;       // simulated time, in the unit named by time_unit
  double dt = 0.0;         // last time step, same unit
  double stop_time = 0.0;  // same unit
  long long cells = 0;     // cells in the whole box
};

class Progress {
 public:
  // first_step, first_time: where this process's run begins (a restart begins past zero); the
  // rate and the time to go count from there.
  Progress(const Log& log, double interval_seconds, std::string time_unit, long long first_step = 0,
           double first_time = 0.0);

  // Called after every step; prints the first time, then when the interval has passed since the
  // last line, or always when `force`. Returns whether it printed.
  bool update(const ProgressSample& sample, bool force = false);

  // The line itself, for a given sample and elapsed wall time (seconds); exposed for tests.
  [[nodiscard]] std::string format(const ProgressSample& sample, double wall_seconds,
                                   double updates_per_second) const;

 private:
  using Clock = std::chrono::steady_clock;
  const Log& log_;
  double interval_;
  std::string time_unit_;
  Clock::time_point start_;
  Clock::time_point last_print_;
  long long last_step_ = 0;
  double first_time_ = 0.0;
  bool printed_once_ = false;
};

// Wall time in seconds written as "42 s", "3 min 20 s", "2 h 05 min".
[[nodiscard]] std::string format_duration(double seconds);

}  // namespace brume::io
