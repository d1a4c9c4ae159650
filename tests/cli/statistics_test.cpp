// The run's own measurements end to end: the time series and the statistics files of a run, and
// `brume analyze` of its last snapshot on 1 and 2 ranks, against numpy on the snapshot
// (tests/cli/overview_reference.py: energies, rms velocity, Mach numbers, phase fractions with
// the phase boundaries from a scipy root-find of the Koyama & Inutsuka 2002 fit, extremes; to
// 1e-10 relative); a restart continues the time series as an uninterrupted run writes it; bad
// input to `brume analyze` is refused with exit code 2 and nothing changes. Exit codes:
// docs/command-line.md (common practice, no source).
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <initializer_list>
#include <sstream>
#include <string>
#include <vector>

#include "tests/cli/run_brume.hpp"
#include "tests/support/run_python.hpp"

namespace fs = std::filesystem;
using brume::testing::file_bytes;
using brume::testing::fresh_folder;
using brume::testing::run_brume;
using brume::testing::run_python;
using brume::testing::source_script;

namespace {

// The rows of a timeline.txt, each a list of its words.
std::vector<std::vector<std::string>> rows_of(const fs::path& file, std::string& columns) {
  std::vector<std::vector<std::string>> rows;
  std::istringstream lines(file_bytes(file));
  std::string line;
  while (std::getline(lines, line)) {
    if (line.rfind("# columns:", 0) == 0) columns = line;
    if (line.empty() || line[0] == '#') continue;
    std::istringstream words(line);
    std::vector<std::string> row;
    for (std::string w; words >> w;)
      row.push_back(w);
    rows.push_back(row);
  }
  return rows;
}

// Shell words joined by spaces (appended piecewise: g++ 12 warns falsely on "literal" +
// std::string under -Werror=restrict).
std::string words(std::initializer_list<std::string> parts) {
  std::string line;
  for (const std::string& part : parts) {
    if (!line.empty()) line += ' ';
    line += part;
  }
  return line;
}

std::string quoted(const fs::path& path) {
  std::string text(1, '\'');
  text += path.string();
  text += '\'';
  return text;
}

std::string box() {
  return quoted(source_script("tests/cli/distributions_box.yaml"));
}

}  // namespace

TEST(Statistics, TimelineStatisticsFilesAndAnalyzeAgreeWithNumpy) {
  const std::string folder = fresh_folder("brume-statistics");
  const auto r =
      run_python(source_script("tests/cli/overview_reference.py"),
                 {"--run", BRUME_BINARY, source_script("tests/cli/distributions_box.yaml"), folder,
                  "--set", "cooling.enabled=true", "--set", "output.snapshot_interval=0.2Myr",
                  "--set", "statistics.timeline_every=3"});
  EXPECT_EQ(r.exit_code, 0) << r.output;
  if (r.exit_code == 0) fs::remove_all(folder);
}

// 12 steps in one run, and 6 + a restart to 12: the same rows, bit for bit in every column that
// the state determines; the running energy totals (held once per rank across the restart) to
// 1e-12 relative (their sum is rounded once at the checkpoint).
TEST(Statistics, ARestartContinuesTheTimeSeries) {
  const fs::path folder = fresh_folder("brume-statistics-restart");
  const std::string common =
      words({box(), "--set cooling.enabled=true --set statistics.timeline_every=2 -q"});
  ASSERT_EQ(run_brume(words({"run", common, "--out", quoted(folder / "full")})).exit_code, 0);
  ASSERT_EQ(
      run_brume(words({"run", common, "--set clock.max_steps=6 --out", quoted(folder / "split")}))
          .exit_code,
      0);
  const auto resumed =
      run_brume(words({"run --restart", quoted(folder / "split"), "--set clock.max_steps=12 -q"}));
  ASSERT_EQ(resumed.exit_code, 0) << resumed.err;
  std::string full_columns, split_columns;
  const auto full = rows_of(folder / "full" / "timeline.txt", full_columns);
  const auto split = rows_of(folder / "split" / "timeline.txt", split_columns);
  EXPECT_EQ(full_columns, split_columns);
  ASSERT_EQ(full.size(), 7u);  // steps 0, 2, ..., 12
  ASSERT_EQ(split.size(), full.size());
  std::istringstream names(full_columns.substr(10));
  std::vector<std::string> columns;
  for (std::string w; names >> w;)
    columns.push_back(w.substr(0, w.find('[')));
  for (std::size_t r = 0; r < full.size(); ++r) {
    for (std::size_t c = 0; c < columns.size(); ++c) {
      const bool total = columns[c] == "stirring_work" || columns[c] == "radiated_energy" ||
                         columns[c] == "dissipated_energy";
      if (!total) {
        EXPECT_EQ(full[r][c], split[r][c]) << columns[c] << " in row " << r;
      } else {
        const double a = std::stod(full[r][c]), b = std::stod(split[r][c]);
        EXPECT_NEAR(a, b, 1e-12 * std::abs(a)) << columns[c] << " in row " << r;
      }
    }
  }
  // The statistics files go on numbering: one with the checkpoint's final snapshot, one more at
  // the end of the restart.
  EXPECT_TRUE(fs::exists(folder / "split" / "statistics-0001.h5"));
  EXPECT_TRUE(fs::exists(folder / "split" / "statistics-0002.h5"));
  fs::remove_all(folder);
}

TEST(Analyze, BadInputIsRefusedWithExitCodeTwoAndNothingChanges) {
  const fs::path folder = fresh_folder("brume-analyze-bad");
  ASSERT_EQ(
      run_brume(words({"run", box(), "--set clock.max_steps=2 -q --out", quoted(folder / "run")}))
          .exit_code,
      0);
  const std::string snapshot = quoted(folder / "run" / "snapshot-0001.h5");
  const auto none = run_brume("analyze");
  EXPECT_EQ(none.exit_code, 2);
  EXPECT_NE(none.err.find("one snapshot file"), std::string::npos) << none.err;
  const auto missing = run_brume(words({"analyze", quoted(folder / "nothing.h5")}));
  EXPECT_EQ(missing.exit_code, 2);
  EXPECT_NE(missing.err.find("nothing.h5"), std::string::npos) << missing.err;
  const auto gas = run_brume(words({"analyze", snapshot, "--set gas.adiabatic_index=1.4"}));
  EXPECT_EQ(gas.exit_code, 2);
  EXPECT_NE(gas.err.find("gas.adiabatic_index"), std::string::npos) << gas.err;
  const auto unknown = run_brume(words({"analyze", snapshot, "--set phases.cold_belo=100K"}));
  EXPECT_EQ(unknown.exit_code, 2);
  EXPECT_NE(unknown.err.find("cold_belo"), std::string::npos) << unknown.err;
  // An existing output is never replaced.
  const fs::path out = folder / "taken.h5";
  std::ofstream(out) << "earlier results";
  const auto taken = run_brume(words({"analyze", snapshot, "--out", quoted(out)}));
  EXPECT_EQ(taken.exit_code, 2);
  EXPECT_NE(taken.err.find("taken.h5"), std::string::npos) << taken.err;
  EXPECT_EQ(file_bytes(out), "earlier results");
  // The default output sits beside the snapshot.
  const auto ok = run_brume(words({"analyze", snapshot, "-q"}));
  EXPECT_EQ(ok.exit_code, 0) << ok.err;
  EXPECT_TRUE(fs::exists(folder / "run" / "snapshot-0001-statistics.h5"));
  fs::remove_all(folder);
}
