#include "physics/steady_state.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <stdexcept>

namespace brume::physics {

const std::vector<WatchedColumn>& watched_columns() {
  constexpr double none = std::numeric_limits<double>::infinity();
  static const std::vector<WatchedColumn> columns = {
      {"velocity_rms_mass", none, 0.05},      {"sonic_mach_mass", none, 0.05},
      {"alfven_mach_mass", none, 0.05},       {"magnetic_energy_fluctuating", none, 0.10},
      {"cold_volume_fraction", 0.02, 0.10},   {"unstable_volume_fraction", 0.02, 0.10},
      {"warm_volume_fraction", 0.02, 0.10},   {"cold_mass_fraction", 0.02, 0.10},
      {"unstable_mass_fraction", 0.02, 0.10}, {"warm_mass_fraction", 0.02, 0.10},
  };
  return columns;
}

const char* trend_name(Trend trend) {
  switch (trend) {
    case Trend::steady:
      return "steady";
    case Trend::undecided:
      return "undecided";
    case Trend::drifting:
      return "DRIFTING";
  }
  return "?";
}

Trend ColumnTrend::trend() const {
  // A value that is not finite in the window (a field that starts at zero) cannot be judged.
  if (!std::isfinite(drift) || !std::isfinite(drift_error)) return Trend::undecided;
  if (!(std::fabs(drift) > allowed)) return Trend::steady;
  return std::fabs(drift) > 2.0 * drift_error ? Trend::drifting : Trend::undecided;
}

// Ordinary least squares about the means (common practice, no source).
LineFit fit_line(const std::vector<double>& t, const std::vector<double>& y) {
  const std::size_t n = t.size();
  if (n < 3 || y.size() != n) throw std::invalid_argument("a line needs three points or more");
  double t_mean = 0.0, y_mean = 0.0;
  for (std::size_t i = 0; i < n; ++i) {
    t_mean += t[i];
    y_mean += y[i];
  }
  t_mean /= double(n);
  y_mean /= double(n);
  double tt = 0.0, ty = 0.0;
  for (std::size_t i = 0; i < n; ++i) {
    tt += (t[i] - t_mean) * (t[i] - t_mean);
    ty += (t[i] - t_mean) * (y[i] - y_mean);
  }
  if (!(tt > 0.0)) throw std::invalid_argument("a line needs two distinct times");
  LineFit fit;
  fit.mean = y_mean;
  fit.slope = ty / tt;
  std::vector<double> r(n);
  double squares = 0.0;
  for (std::size_t i = 0; i < n; ++i) {
    r[i] = y[i] - y_mean - fit.slope * (t[i] - t_mean);
    squares += r[i] * r[i];
  }
  fit.scatter = std::sqrt(squares / double(n));
  // Autocorrelation of the residuals by row lag, summed while positive.
  if (squares > 0.0) {
    for (std::size_t lag = 1; lag < n; ++lag) {
      double c = 0.0;
      for (std::size_t i = 0; i + lag < n; ++i)
        c += r[i] * r[i + lag];
      if (!(c > 0.0)) break;
      fit.inflation += 2.0 * c / squares;
    }
  }
  fit.slope_error = std::sqrt(squares / double(n - 2) / tt * fit.inflation);
  return fit;
}

namespace {

bool all_steady(const std::vector<ColumnTrend>& columns) {
  return std::all_of(columns.begin(), columns.end(),
                     [](const ColumnTrend& c) { return c.steady(); });
}

bool any_is(const std::vector<ColumnTrend>& columns, Trend trend) {
  return std::any_of(columns.begin(), columns.end(),
                     [&](const ColumnTrend& c) { return c.trend() == trend; });
}

std::size_t column_of(const io::TimelineText& table, const std::string& name) {
  const auto at = std::find(table.names.begin(), table.names.end(), name);
  return at == table.names.end() ? table.names.size() : std::size_t(at - table.names.begin());
}

struct Watched {
  WatchedColumn rule;
  std::size_t column;
};

// The trends of the watched columns over the rows from `first` on.
std::vector<ColumnTrend> trends(const io::TimelineText& table, const std::vector<Watched>& watched,
                                std::size_t time_column, std::size_t first) {
  std::vector<double> t;
  for (std::size_t r = first; r < table.rows.size(); ++r)
    t.push_back(table.rows[r][time_column]);
  const double length = t.back() - t.front();
  std::vector<ColumnTrend> out;
  for (const Watched& w : watched) {
    std::vector<double> y;
    for (std::size_t r = first; r < table.rows.size(); ++r)
      y.push_back(table.rows[r][w.column]);
    const LineFit fit = fit_line(t, y);
    ColumnTrend c;
    c.name = w.rule.name;
    c.unit = table.units[w.column];
    c.mean = fit.mean;
    c.scatter = fit.scatter;
    c.drift = fit.slope * length;
    c.drift_error = fit.slope_error * length;
    c.allowed = std::fmin(w.rule.absolute, w.rule.relative * std::fabs(fit.mean));
    out.push_back(c);
  }
  return out;
}

}  // namespace

Trend SteadinessReport::trend() const {
  if (any_is(columns, Trend::drifting)) return Trend::drifting;
  return any_is(columns, Trend::undecided) ? Trend::undecided : Trend::steady;
}

SteadinessReport judge_steadiness(const io::TimelineText& table, std::optional<double> since,
                                  std::size_t least_rows) {
  const std::size_t time_column = column_of(table, "time");
  if (time_column == table.names.size()) {
    throw std::invalid_argument("the table has no column 'time'");
  }
  if (table.rows.empty()) throw std::invalid_argument("the table has no rows");
  SteadinessReport report;
  report.time_unit = table.units[time_column];
  const double start = table.rows.front()[time_column];
  const double end = table.rows.back()[time_column];
  const double from = since.value_or(0.5 * (start + end));
  std::size_t first = 0;
  while (first < table.rows.size() && table.rows[first][time_column] < from)
    ++first;
  report.rows = table.rows.size() - first;
  if (report.rows < least_rows) {
    throw std::invalid_argument("the window from " + std::to_string(from) + " " + report.time_unit +
                                " holds " + std::to_string(report.rows) + " rows; at least " +
                                std::to_string(least_rows) + " are needed");
  }
  report.window_start = table.rows[first][time_column];
  report.window_end = end;
  std::vector<Watched> watched;
  for (const WatchedColumn& rule : watched_columns()) {
    const std::size_t c = column_of(table, rule.name);
    bool usable = c < table.names.size();
    for (std::size_t r = first; usable && r < table.rows.size(); ++r)
      usable = std::isfinite(table.rows[r][c]);
    // A column that is zero throughout (no field, no cold gas ever) has no trend to judge.
    bool zero = usable;
    for (std::size_t r = first; zero && r < table.rows.size(); ++r)
      zero = table.rows[r][c] == 0.0;
    if (usable && !zero) {
      watched.push_back({rule, c});
    } else {
      report.skipped.emplace_back(rule.name);
    }
  }
  if (watched.empty()) throw std::invalid_argument("the table has none of the watched columns");
  report.columns = trends(table, watched, time_column, first);
  // The earliest steady start of each column and of all of them.
  for (std::size_t s = 0; s <= first; ++s) {
    if (table.rows.size() - s < least_rows) break;
    const double t_s = table.rows[s][time_column];
    if (t_s >= table.rows.back()[time_column]) break;
    const std::vector<ColumnTrend> from_s = trends(table, watched, time_column, s);
    bool all_found = true;
    for (std::size_t j = 0; j < from_s.size(); ++j) {
      if (!report.columns[j].steady_since && from_s[j].steady()) {
        report.columns[j].steady_since = t_s;
      }
      all_found = all_found && report.columns[j].steady_since.has_value();
    }
    if (!report.steady_since && all_steady(from_s)) report.steady_since = t_s;
    if (all_found && report.steady_since) break;
  }
  return report;
}

}  // namespace brume::physics
