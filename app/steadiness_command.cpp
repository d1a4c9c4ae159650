// brume steadiness RUN_FOLDER [--since TIME]: whether the run's time series (timeline.txt) is
// statistically steady over a window, and since when (physics/steady_state.hpp,
// docs/statistics.md).
#include <algorithm>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <limits>
#include <optional>
#include <stdexcept>
#include <string>

#include "app/commands.hpp"
#include "app/exit_codes.hpp"
#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/user_error.hpp"
#include "io/config/error.hpp"
#include "io/config/load.hpp"
#include "io/config/number_text.hpp"
#include "physics/steady_state.hpp"
#include "physics/stirring_settings.hpp"
#include "solver/units/dimension.hpp"
#include "solver/units/unit_table.hpp"

namespace brume::app {

namespace {

namespace fs = std::filesystem;

constexpr const char* usage = "(brume steadiness RUN_FOLDER [--since TIME])";

// --since as a number in the table's time unit, or a time with its own unit.
double since_in(const std::string& text, const std::string& time_unit) {
  const units::QuantityParse q = units::parse_quantity(text);
  if (!q.ok) throw UserError("command line: --since " + text + ": " + q.error + " " + usage);
  if (!q.has_unit) return q.number;
  const auto given = units::factor_to(q.unit, units::dim::time);
  const units::UnitParse table = units::parse_unit(time_unit);
  const auto wanted = table.ok ? units::factor_to(table.unit, units::dim::time) : std::nullopt;
  if (!given || !wanted) {
    throw UserError("command line: --since " + text + ": expected a time, e.g. 3Myr " + usage);
  }
  return q.number * *given / *wanted;
}

// The time scales of the run that a window should span: the stirring's correlation time and the
// crossing time L / v_rms of the largest side; in the table's time unit, when config.yaml is
// there to say (nothing otherwise).
struct RunScales {
  std::optional<double> correlation_time;
  std::optional<double> box_length;  // longest side, code length
  double length_unit = 0.0;          // cm of one code length
  double time_unit = 0.0;            // s of one table time unit
};

RunScales run_scales(const fs::path& folder, const std::string& time_unit) {
  RunScales s;
  const fs::path file = folder / "config.yaml";
  if (!fs::exists(file)) return s;
  const config::ResolvedConfig config = config::load(brume_schema(), file.string(), {});
  const RunSetup setup = make_run_setup(config);
  const units::UnitParse table = units::parse_unit(time_unit);
  const auto seconds = table.ok ? units::factor_to(table.unit, units::dim::time) : std::nullopt;
  if (!seconds) return s;
  s.time_unit = *seconds;
  s.length_unit = setup.code_units.length;
  s.box_length = std::max({setup.size[0], setup.size[1], setup.size[2]});
  if (physics::stirring_enabled(config)) {
    const physics::StirringSettings stirring = physics::stirring_settings(config, setup.code_units);
    const physics::StirringScales scales = physics::stirring_scales(stirring, setup.size);
    s.correlation_time = scales.correlation_time * setup.code_units.time() / *seconds;
  }
  return s;
}

std::string number(double v) {
  return config::format_digits(v, 4);
}

void print_report(const fs::path& table_file, const physics::SteadinessReport& r,
                  const RunScales& scales) {
  const std::string& u = r.time_unit;
  std::printf("brume steadiness: %s, window %s to %s %s (%zu rows)\n", table_file.c_str(),
              number(r.window_start).c_str(), number(r.window_end).c_str(), u.c_str(), r.rows);
  std::printf("  %-40s %12s %11s %11s %11s %11s  %-9s  %s\n", "column [unit]", "mean", "scatter",
              "drift", "+-error", "allowed", "verdict", "steady since");
  for (const physics::ColumnTrend& c : r.columns) {
    const std::string label = c.name + " [" + c.unit + "]";
    const std::string since = c.steady_since ? number(*c.steady_since) + " " + u : "-";
    std::printf("  %-40s %12.5g %11.4g %+11.4g %11.4g %11.4g  %-9s  %s\n", label.c_str(), c.mean,
                c.scatter, c.drift, c.drift_error, c.allowed, physics::trend_name(c.trend()),
                since.c_str());
  }
  for (const std::string& name : r.skipped)
    std::printf("  %-40s (absent, not finite or zero throughout: not judged)\n", name.c_str());
  const physics::Trend trend = r.trend();
  std::printf("steady over the window: %s\n",
              trend == physics::Trend::steady ? "yes, every column within its allowance"
              : trend == physics::Trend::drifting
                  ? "no, a column drifts beyond its allowance and twice its error"
                  : "undecided, a column is beyond its allowance but within twice its error: "
                    "its fluctuations are too slow for this window; a longer one can tell");
  if (r.steady_since) {
    std::printf("steady since: %s %s (the earliest start with every column steady to the end)\n",
                number(*r.steady_since).c_str(), u.c_str());
  } else {
    std::printf("steady since: no start up to %s %s gives a steady window\n",
                number(r.window_start).c_str(), u.c_str());
  }
  const double window = r.window_end - r.window_start;
  if (scales.correlation_time && window < 2.0 * *scales.correlation_time) {
    std::printf(
        "warning: the window (%s %s) spans fewer than two correlation times of the stirring "
        "(%s %s): the random forcing is not sampled, and its fluctuations may pass for "
        "steadiness\n",
        number(window).c_str(), u.c_str(), number(*scales.correlation_time).c_str(), u.c_str());
  }
  for (const physics::ColumnTrend& c : r.columns) {
    if (c.name != "velocity_rms_mass" || !scales.box_length) continue;
    const units::UnitParse speed = units::parse_unit(c.unit);
    const auto cm_per_s =
        speed.ok ? units::factor_to(speed.unit, units::dim::velocity) : std::nullopt;
    if (!cm_per_s) continue;
    const double crossing =
        *scales.box_length * scales.length_unit / (c.mean * *cm_per_s) / scales.time_unit;
    if (window < crossing) {
      std::printf(
          "note: the window (%s %s) is shorter than one crossing time of the box L / v_rms "
          "(%s %s): trends slower than that are not excluded\n",
          number(window).c_str(), u.c_str(), number(crossing).c_str(), u.c_str());
    }
  }
}

}  // namespace

int steadiness_command(const CommandLine& line) {
  if (line.positional.size() != 1) {
    throw UserError("command line: brume steadiness takes one run folder, found " +
                    std::to_string(line.positional.size()) + " " + usage);
  }
  if (!line.overrides.empty() || line.out) {
    throw UserError(std::string("command line: brume steadiness takes no --set or --out ") + usage);
  }
  const fs::path folder = line.positional.front();
  if (!fs::is_directory(folder)) throw UserError(folder.string() + ": no such run folder");
  const fs::path table_file = folder / "timeline.txt";
  std::optional<io::TimelineText> read;
  try {
    read = io::read_timeline_file(table_file, std::numeric_limits<long>::max());
  } catch (const std::runtime_error& e) {
    throw UserError(e.what());
  }
  if (!read) {
    throw UserError(table_file.string() + ": cannot be read (is this a brume run folder?)");
  }
  const io::TimelineText& table = *read;
  std::optional<double> since;
  const auto time = std::find(table.names.begin(), table.names.end(), "time");
  if (time == table.names.end()) {
    throw UserError(table_file.string() + ": the header has no column 'time'");
  }
  const std::string time_unit = table.units[std::size_t(time - table.names.begin())];
  if (line.since) since = since_in(*line.since, time_unit);
  physics::SteadinessReport report;
  try {
    report = physics::judge_steadiness(table, since);
  } catch (const std::invalid_argument& e) {
    throw UserError(table_file.string() + ": " + e.what());
  }
  RunScales scales;
  try {
    scales = run_scales(folder, time_unit);
  } catch (const config::Error& e) {
    std::printf(
        "note: %s/config.yaml cannot be read (%s): the window is not compared with "
        "the run's time scales\n",
        folder.c_str(), e.what());
  }
  print_report(table_file, report, scales);
  return exit_success;
}

}  // namespace brume::app
