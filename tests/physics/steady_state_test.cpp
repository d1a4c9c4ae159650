// The steadiness judgement of a time series (physics/steady_state.hpp): the least-squares line
// against numpy.polyfit, the earliest steady start against a scan with numpy.polyfit
// (tests/physics/steady_state_reference.py), and the columns it judges or skips.
#include "physics/steady_state.hpp"

#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <limits>
#include <sstream>
#include <stdexcept>
#include <string>
#include <vector>

#include "tests/support/run_python.hpp"

namespace brume::physics {
namespace {

std::string text(double v) {
  char s[40];
  std::snprintf(s, sizeof s, "%.17g", v);
  return s;
}

// A deterministic wiggle in [-1, 1] (demo data, no source): the sum of two incommensurate sines.
double wiggle(double t) {
  return 0.6 * std::sin(7.3 * t + 0.4) + 0.4 * std::sin(19.1 * t + 1.3);
}

// Unevenly spaced times, as a time series with a varying step has.
std::vector<double> times(int rows, double end) {
  std::vector<double> t;
  for (int r = 0; r < rows; ++r) {
    const double u = double(r) / double(rows - 1);
    t.push_back(end * (u + 0.05 * std::sin(3.0 * u) * u * (1.0 - u)));
  }
  return t;
}

std::vector<std::string> pairs(const std::vector<double>& t, const std::vector<double>& y) {
  std::vector<std::string> words;
  for (std::size_t i = 0; i < t.size(); ++i) {
    words.push_back(text(t[i]));
    words.push_back(text(y[i]));
  }
  return words;
}

// A two-column table of time (Myr) and one watched column.
io::TimelineText table(const std::string& column, const std::vector<double>& t,
                       const std::vector<double>& y) {
  io::TimelineText table;
  table.names = {"step", "time", column};
  table.units = {"1", "Myr", "1"};
  for (std::size_t i = 0; i < t.size(); ++i)
    table.rows.push_back({double(10 * i), t[i], y[i]});
  return table;
}

TEST(SteadyState, LineFitMatchesNumpyPolyfit) {
  const std::vector<double> t = times(57, 6.0);
  std::vector<double> y;
  for (const double s : t)
    y.push_back(3.5 - 0.04 * s + 0.1 * wiggle(s));
  std::vector<std::string> arguments = {"fit"};
  for (const std::string& w : pairs(t, y))
    arguments.push_back(w);
  const testing::PythonResult reference = testing::run_python(
      testing::source_script("tests/physics/steady_state_reference.py"), arguments);
  ASSERT_EQ(reference.exit_code, 0) << reference.output;
  std::istringstream lines(reference.output);
  double mean = 0.0, slope = 0.0, scatter = 0.0, slope_error = 0.0;
  ASSERT_TRUE(lines >> mean >> slope >> scatter >> slope_error) << reference.output;
  const LineFit fit = fit_line(t, y);
  std::printf(
      "[steadiness vs numpy.polyfit] mean %.17g (%.17g), slope %.17g (%.17g), scatter "
      "%.17g (%.17g)\n",
      fit.mean, mean, fit.slope, slope, fit.scatter, scatter);
  EXPECT_NEAR(fit.mean, mean, 1e-14 * std::fabs(mean));
  EXPECT_NEAR(fit.slope, slope, 1e-11 * std::fabs(slope));
  EXPECT_NEAR(fit.scatter, scatter, 1e-10 * scatter);
  std::printf("[steadiness vs numpy.correlate] slope error %.17g (%.17g), inflation %.6g\n",
              fit.slope_error, slope_error, fit.inflation);
  EXPECT_NEAR(fit.slope_error, slope_error, 1e-10 * slope_error);
  // The wiggle is smooth on the rows' spacing: its residuals are correlated over many rows.
  EXPECT_GT(fit.inflation, 1.5);
}

TEST(SteadyState, EarliestSteadyStartMatchesANumpyScan) {
  // A phase fraction that rises by 0.3 over the first 2 Myr, then wiggles by ±0.005 about 0.5.
  const std::vector<double> t = times(121, 6.0);
  std::vector<double> y;
  for (const double s : t)
    y.push_back(0.5 - 0.3 * std::fmax(0.0, 1.0 - s / 2.0) + 0.005 * wiggle(s));
  std::vector<std::string> arguments = {"since", "0.02", "3"};
  for (const std::string& w : pairs(t, y))
    arguments.push_back(w);
  const testing::PythonResult reference = testing::run_python(
      testing::source_script("tests/physics/steady_state_reference.py"), arguments);
  ASSERT_EQ(reference.exit_code, 0) << reference.output;
  double expected = 0.0;
  std::istringstream(reference.output) >> expected;
  const SteadinessReport r = judge_steadiness(table("warm_volume_fraction", t, y), 3.0);
  ASSERT_TRUE(r.steady_since.has_value());
  std::printf("[steadiness vs numpy scan] steady since %.6g Myr (numpy %.6g Myr)\n",
              *r.steady_since, expected);
  EXPECT_EQ(*r.steady_since, expected);
  ASSERT_TRUE(r.columns.front().steady_since.has_value());
  EXPECT_EQ(*r.columns.front().steady_since, expected);  // one column: its own start is the same
  // The ramp ends at 2 Myr: the earliest steady start lies past its middle, and before 3 Myr.
  EXPECT_GT(*r.steady_since, 1.0);
  EXPECT_LT(*r.steady_since, 3.0);
  EXPECT_TRUE(r.steady());
  ASSERT_EQ(r.columns.size(), 1u);
  EXPECT_EQ(r.columns[0].name, "warm_volume_fraction");
  EXPECT_EQ(r.columns[0].allowed, 0.02);  // 0.02 for a phase fraction of 0.5 (10 % would be 0.05)
}

TEST(SteadyState, ATrendBeyondTheAllowanceDrifts) {
  // v_rms growing by 8 % of its mean over the window [3, 6] Myr: beyond the 5 % allowance.
  const std::vector<double> t = times(61, 6.0);
  std::vector<double> y;
  for (const double s : t)
    y.push_back(3.0 * (1.0 + 0.08 * (s - 4.5) / 3.0) + 0.01 * wiggle(s));
  const SteadinessReport r = judge_steadiness(table("velocity_rms_mass", t, y), std::nullopt);
  EXPECT_NEAR(r.window_start, 3.0, 0.1);  // the default window: the second half
  ASSERT_EQ(r.columns.size(), 1u);
  EXPECT_NEAR(r.columns[0].drift / r.columns[0].mean, 0.08, 0.01);
  EXPECT_NEAR(r.columns[0].allowed, 0.05 * r.columns[0].mean, 1e-12);
  EXPECT_FALSE(r.columns[0].steady());
  EXPECT_EQ(r.trend(), Trend::drifting);
  EXPECT_FALSE(r.steady_since.has_value());
}

TEST(SteadyState, EachColumnHasItsOwnEarliestSteadyStart) {
  // A fraction that settles by 1 Myr and a speed that settles only by 3 Myr: the fraction is
  // steady from before 2 Myr, the speed from after it, and the whole table from the later one.
  const std::vector<double> t = times(121, 8.0);
  io::TimelineText tab = table("cold_mass_fraction", t, std::vector<double>(t.size()));
  tab.names.push_back("velocity_rms_mass");
  tab.units.push_back("km/s");
  for (std::size_t i = 0; i < t.size(); ++i) {
    tab.rows[i][2] = 0.4 - 0.3 * std::fmax(0.0, 1.0 - t[i]) + 0.002 * wiggle(t[i]);
    tab.rows[i].push_back(3.0 + 2.0 * std::fmax(0.0, 1.0 - t[i] / 3.0) + 0.01 * wiggle(t[i]));
  }
  const SteadinessReport r = judge_steadiness(tab, 4.0);
  ASSERT_EQ(r.columns.size(), 2u);
  const ColumnTrend& speed = r.columns[0];  // watched_columns() order: speeds first
  const ColumnTrend& cold = r.columns[1];
  ASSERT_EQ(speed.name, "velocity_rms_mass");
  ASSERT_TRUE(speed.steady_since && cold.steady_since && r.steady_since);
  std::printf("[steadiness] steady since: fraction %.4g, speed %.4g, all %.4g Myr\n",
              *cold.steady_since, *speed.steady_since, *r.steady_since);
  EXPECT_LT(*cold.steady_since, 2.0);
  EXPECT_GT(*speed.steady_since, 2.0);
  EXPECT_EQ(*r.steady_since, std::fmax(*cold.steady_since, *speed.steady_since));
}

TEST(SteadyState, ASmallFractionHasATenthOfItsMeanAsAllowance) {
  // A cold volume fraction that grows from 0.03 to 0.05 over the window: within 0.02, but not
  // within 10 % of its mean (0.004).
  const std::vector<double> t = times(61, 6.0);
  std::vector<double> y;
  for (const double s : t)
    y.push_back(0.03 + 0.02 * std::fmax(0.0, s - 3.0) / 3.0);
  const SteadinessReport r = judge_steadiness(table("cold_volume_fraction", t, y), 3.0);
  ASSERT_EQ(r.columns.size(), 1u);
  EXPECT_NEAR(r.columns[0].allowed, 0.1 * r.columns[0].mean, 1e-15);
  EXPECT_EQ(r.columns[0].trend(), Trend::drifting);
}

TEST(SteadyState, ANonFiniteValueIsNotJudgedSteady) {
  // A Mach number that is infinite in the first rows (no field yet): a window that holds them
  // is undecided, so the earliest steady start lies after them.
  const std::vector<double> t = times(61, 6.0);
  std::vector<double> y(t.size(), 2.0);
  for (std::size_t i = 0; i < 5; ++i)
    y[i] = std::numeric_limits<double>::infinity();
  const SteadinessReport r = judge_steadiness(table("alfven_mach_mass", t, y), 3.0);
  ASSERT_TRUE(r.steady_since.has_value());
  EXPECT_EQ(*r.steady_since, t[5]);
}

TEST(SteadyState, FluctuationsTooSlowForTheWindowLeaveItUndecided) {
  // v_rms swinging by ±10 % with a period of 3 Myr about a constant mean, judged over 3 Myr:
  // the line through it tilts beyond 5 %, but the residuals are correlated over the window.
  const std::vector<double> t = times(61, 6.0);
  std::vector<double> y;
  for (const double s : t)
    y.push_back(3.0 * (1.0 + 0.1 * std::sin(2.0 * 3.14159265358979 * s / 3.0 + 2.0)));
  const SteadinessReport r = judge_steadiness(table("velocity_rms_mass", t, y), std::nullopt);
  ASSERT_EQ(r.columns.size(), 1u);
  const ColumnTrend& c = r.columns[0];
  std::printf("[steadiness] slow swing: drift %.4g +- %.4g, allowed %.4g\n", c.drift, c.drift_error,
              c.allowed);
  EXPECT_GT(std::fabs(c.drift), c.allowed);
  EXPECT_LT(std::fabs(c.drift), 2.0 * c.drift_error);
  EXPECT_EQ(r.trend(), Trend::undecided);
}

TEST(SteadyState, SkipsAbsentAndZeroColumnsAndRefusesTooShortAWindow) {
  const std::vector<double> t = times(30, 6.0);
  io::TimelineText t2 = table("cold_mass_fraction", t, std::vector<double>(t.size(), 0.0));
  t2.names.push_back("sonic_mach_mass");
  t2.units.push_back("1");
  for (auto& row : t2.rows)
    row.push_back(2.0);
  const SteadinessReport r = judge_steadiness(t2, 2.0);
  ASSERT_EQ(r.columns.size(), 1u);
  EXPECT_EQ(r.columns[0].name, "sonic_mach_mass");
  EXPECT_EQ(r.columns[0].drift, 0.0);
  // Every other watched column is named as skipped, the zero one too.
  EXPECT_EQ(r.skipped.size(), watched_columns().size() - 1);
  // Fewer than 10 rows from 5.5 Myr on.
  EXPECT_THROW((void)judge_steadiness(t2, 5.5), std::invalid_argument);
  io::TimelineText no_time = t2;
  no_time.names[1] = "clock";
  EXPECT_THROW((void)judge_steadiness(no_time, std::nullopt), std::invalid_argument);
}

}  // namespace
}  // namespace brume::physics
