// Whether a run's time series is statistically steady over a window of time, and since when.
//
// Each watched column y(t) of the window gets a least-squares line y = a + b t; its drift is
// b times the window's length. A column is steady when the drift stays within its allowance:
// for the phase fractions 0.02 or 10 % of the window's mean, whichever is smaller (a small
// fraction may not double unnoticed), 5 % of the window's mean for speeds and Mach numbers,
// 10 % for the fluctuating magnetic energy (common practice, no source). Beyond it, the drift
// counts as drifting only when it also exceeds twice its standard error, the error of the slope
// inflated by the residuals' autocorrelation, 1 + 2 Σ ρ_k summed up to the first ρ_k ≤ 0
// (common practice, no source); otherwise the fluctuations are too slow for the window to tell
// (undecided). The window runs from `since` to the last row; "steady since" is the earliest row
// time t_s ≤ since for which the window [t_s, end] is steady in every column.
#pragma once

#include <cmath>
#include <optional>
#include <string>
#include <vector>

#include "io/timeline_table.hpp"

namespace brume::physics {

struct WatchedColumn {
  const char* name;  // timeline column
  double absolute;   // largest |drift| in the column's unit (infinity: none)
  double relative;   // largest |drift| as a fraction of the window's mean
};

// The columns brume watches, in report order.
[[nodiscard]] const std::vector<WatchedColumn>& watched_columns();

enum class Trend { steady, undecided, drifting };
[[nodiscard]] const char* trend_name(Trend trend);

struct ColumnTrend {
  std::string name;
  std::string unit;
  double mean = 0.0;
  double scatter = 0.0;                // rms of the residuals about the line
  double drift = 0.0;                  // slope times the window's length
  double drift_error = 0.0;            // standard error of the drift, autocorrelation included
  double allowed = 0.0;                // the largest |drift| counted as steady
  std::optional<double> steady_since;  // earliest start t_s ≤ since with this column steady
  [[nodiscard]] Trend trend() const;
  [[nodiscard]] bool steady() const { return trend() == Trend::steady; }
};

// Mean, slope, rms scatter about the least-squares line and the slope's standard error
// (residual variance over N − 2, times the autocorrelation inflation) of y(t) over all given
// points (at least three distinct times; otherwise std::invalid_argument).
struct LineFit {
  double mean = 0.0;
  double slope = 0.0;
  double scatter = 0.0;
  double slope_error = 0.0;
  double inflation = 1.0;  // 1 + 2 Σ ρ_k of the residuals
};
[[nodiscard]] LineFit fit_line(const std::vector<double>& t, const std::vector<double>& y);

struct SteadinessReport {
  double window_start = 0.0;  // in the table's time unit
  double window_end = 0.0;
  std::string time_unit;
  std::size_t rows = 0;                // rows in the window
  std::vector<ColumnTrend> columns;    // watched columns present in the table
  std::vector<std::string> skipped;    // watched: absent, not finite or zero throughout
  std::optional<double> steady_since;  // earliest steady start, when there is one
  [[nodiscard]] Trend trend() const;   // drifting if a column drifts, else undecided if one is
  [[nodiscard]] bool steady() const { return trend() == Trend::steady; }
};

// Rows with time ≥ `since` form the window (default: the second half of the table's time span).
// Throws std::invalid_argument when the table lacks `time`, the window holds fewer than
// `least_rows` rows, or no watched column is present.
[[nodiscard]] SteadinessReport judge_steadiness(const io::TimelineText& table,
                                                std::optional<double> since,
                                                std::size_t least_rows = 10);

}  // namespace brume::physics
