#include "io/progress.hpp"

#include <cmath>
#include <cstdio>
#include <utility>

namespace brume::io {

Progress::Progress(const Log& log, double interval_seconds, std::string time_unit,
                   long long first_step, double first_time)
    : log_(log),
      interval_(interval_seconds),
      time_unit_(std::move(time_unit)),
      start_(Clock::now()),
      last_print_(start_),
      last_step_(first_step),
      first_time_(first_time) {}

bool Progress::update(const ProgressSample& sample, bool force) {
  const auto now = Clock::now();
  const double since_last = std::chrono::duration<double>(now - last_print_).count();
  if (!force && printed_once_ && since_last < interval_) return false;
  const double steps = static_cast<double>(sample.step - last_step_);
  const double rate =
      since_last > 0.0 ? steps * static_cast<double>(sample.cells) / since_last : 0.0;
  const double wall = std::chrono::duration<double>(now - start_).count();
  log_.info(format(sample, wall, rate));
  last_print_ = now;
  last_step_ = sample.step;
  printed_once_ = true;
  return true;
}

std::string Progress::format(const ProgressSample& s, double wall_seconds,
                             double updates_per_second) const {
  std::string eta = "?";
  const double done = s.time - first_time_;
  if (done > 0.0 && s.stop_time > s.time && wall_seconds > 0.0) {
    eta = format_duration(wall_seconds * (s.stop_time - s.time) / done);
  } else if (s.time >= s.stop_time) {
    eta = "0 s";
  }
  char line[256];
  std::snprintf(line, sizeof line,
                "step %8lld  t = %.6e %s  dt = %.3e %s  %.3e cell-updates/s  wall %s  to go %s",
                s.step, s.time, time_unit_.c_str(), s.dt, time_unit_.c_str(), updates_per_second,
                format_duration(wall_seconds).c_str(), eta.c_str());
  return line;
}

std::string format_duration(double seconds) {
  char text[64];
  if (!std::isfinite(seconds) || seconds < 0.0) return "?";
  if (seconds < 60.0) {
    std::snprintf(text, sizeof text, "%.0f s", seconds);
  } else if (seconds < 3600.0) {
    const int minutes = static_cast<int>(seconds / 60.0);
    std::snprintf(text, sizeof text, "%d min %02d s", minutes,
                  static_cast<int>(seconds - 60.0 * minutes));
  } else {
    const int hours = static_cast<int>(seconds / 3600.0);
    std::snprintf(text, sizeof text, "%d h %02d min", hours,
                  static_cast<int>((seconds - 3600.0 * hours) / 60.0));
  }
  return text;
}

}  // namespace brume::io
