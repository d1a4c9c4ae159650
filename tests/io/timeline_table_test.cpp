// The time-series table and the statistics file: rows survive the text table exactly (17
// significant digits round-trip a double: IEEE 754-2008 §5.12.2), a restart keeps the rows up to
// its step, a damaged table is refused naming the line, and no statistics file is replaced.
// Common practice, no source, except where a check names one.
#include "io/timeline_table.hpp"

#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <sstream>
#include <stdexcept>

#include "io/statistics_file.hpp"
#include "tests/support/scratch_files.hpp"

namespace fs = std::filesystem;
using brume::io::MeasuredNumber;
using brume::io::read_timeline_text;
using brume::io::TimelineTable;

namespace {

std::string read(const fs::path& path) {
  return brume::testing::text_of(path);
}

fs::path scratch(const char* name) {
  return brume::testing::scratch_folder("timeline", name);
}

std::vector<MeasuredNumber> row(double step, double value) {
  return {{"step", step, "1", 1.0, "step"}, {"energy", value, "erg", 1.0, "an energy"}};
}

}  // namespace

TEST(TimelineTable, RowsRoundTripExactlyThroughTheText) {
  const fs::path folder = scratch("round-trip");
  TimelineTable table(folder);
  const double values[3] = {1.0 / 3.0, 6.02214076e23 * 0.1, -2.2250738585072014e-308};
  for (int r = 0; r < 3; ++r)
    table.append(row(10.0 * r, values[r]));
  const auto t = read_timeline_text(read(folder / "timeline.txt"), 1000);
  ASSERT_EQ(t.names, (std::vector<std::string>{"step", "energy"}));
  ASSERT_EQ(t.units, (std::vector<std::string>{"1", "erg"}));
  ASSERT_EQ(t.rows.size(), 3u);
  for (int r = 0; r < 3; ++r)
    EXPECT_EQ(t.rows[std::size_t(r)][1], values[r]);  // bitwise
  EXPECT_FALSE(t.dropped_rows);
}

TEST(TimelineTable, ResumeKeepsTheRowsUpToTheStepAndRewritesTheTable) {
  const fs::path folder = scratch("resume");
  {
    TimelineTable table(folder);
    for (int r = 0; r < 5; ++r)
      table.append(row(10.0 * r, r));
  }
  EXPECT_TRUE(read_timeline_text(read(folder / "timeline.txt"), 20).dropped_rows);
  TimelineTable resumed(folder);
  resumed.resume(20);
  EXPECT_EQ(resumed.rows(), 3u);
  resumed.append(row(30.0, 99.0));
  const auto t = read_timeline_text(read(folder / "timeline.txt"), 1000);
  ASSERT_EQ(t.rows.size(), 4u);
  EXPECT_EQ(t.rows[2][0], 20.0);
  EXPECT_EQ(t.rows[3][1], 99.0);
  resumed.append(row(40.0, 7.0));  // later rows are appended
  EXPECT_EQ(read_timeline_text(read(folder / "timeline.txt"), 1000).rows.size(), 5u);
}

TEST(TimelineTable, DamagedTablesAreRefusedNamingTheLine) {
  const std::string header = "# brume timeline\n# columns: step[1] energy[erg]\n";
  try {
    (void)read_timeline_text(header + "0 1\n10 2 3\n", 100);
    FAIL() << "three values for two columns were read";
  } catch (const std::runtime_error& error) {
    EXPECT_NE(std::string(error.what()).find("line 4"), std::string::npos) << error.what();
  }
  try {
    (void)read_timeline_text(header + "0 x1\n", 100);
    FAIL() << "a word was read as a number";
  } catch (const std::runtime_error& error) {
    EXPECT_NE(std::string(error.what()).find("line 3"), std::string::npos) << error.what();
  }
  EXPECT_THROW((void)read_timeline_text("# columns: step energy[erg]\n", 100), std::runtime_error);
}

TEST(TimelineTable, ColumnsMustNotChangeBetweenRows) {
  const fs::path folder = scratch("columns");
  TimelineTable table(folder);
  table.append(row(0.0, 1.0));
  std::vector<MeasuredNumber> other = row(10.0, 2.0);
  other[1].name = "power";
  EXPECT_THROW(table.append(other), std::runtime_error);
  other.pop_back();
  EXPECT_THROW(table.append(other), std::runtime_error);
}

TEST(StatisticsFile, NeverReplacesAFile) {
  const fs::path folder = scratch("statistics");
  const fs::path file = folder / "statistics-0000.h5";
  brume::io::Measurement m;
  m.name = "overview";
  m.numbers.push_back({"kinetic_energy", 1.0, "erg", 1.0, "test"});
  brume::io::add_array(m, "pdf", "1", 1.0, "test", {2, 3});
  brume::io::write_statistics(file, {}, {m});
  const std::string before = read(file);
  EXPECT_THROW(brume::io::write_statistics(file, {}, {m}), std::runtime_error);
  EXPECT_EQ(read(file), before);
  // A shape that does not match the values is an internal error, and leaves nothing behind.
  m.arrays.front().values.pop_back();
  EXPECT_THROW(brume::io::write_statistics(folder / "bad.h5", {}, {m}), std::runtime_error);
  for (const auto& entry : fs::directory_iterator(folder))
    EXPECT_EQ(entry.path().filename(), "statistics-0000.h5");
}
