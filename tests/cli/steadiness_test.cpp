// `brume steadiness RUN_FOLDER` end to end on time series written here (demo data, no source): a
// settled series is called steady with the earliest steady start, a drifting one is not; the
// window is compared with the run's time scales from its config.yaml (here the demo's: stirring
// correlation time 1 Myr, a 20 pc box); bad input gives exit code 2 with a message naming the
// folder, file, line or option (docs/command-line.md; common practice, no source).
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <string>

#include "tests/cli/run_brume.hpp"

namespace brume::testing {
namespace {

namespace fs = std::filesystem;

// A timeline.txt of `rows` rows over 0–6 Myr: v_rms and the warm volume fraction settle by 2 Myr
// and then wiggle; `trend` adds a rise of the warm fraction per Myr throughout.
void write_timeline(const fs::path& folder, int rows, double trend) {
  std::ofstream out(folder / "timeline.txt");
  out << "# brume timeline\n"
         "# columns: step[1] time[Myr] velocity_rms_mass[km/s] warm_volume_fraction[1]\n";
  for (int r = 0; r < rows; ++r) {
    const double t = 6.0 * r / (rows - 1);
    const double settle = std::exp(-2.0 * t);
    const double wiggle = std::sin(5.1 * t) + 0.5 * std::sin(13.7 * t + 1.0);
    char line[160];
    std::snprintf(line, sizeof line, "%d %.17g %.17g %.17g\n", 10 * r, t,
                  3.5 + 1.5 * settle + 0.05 * wiggle,
                  0.5 - 0.4 * settle + 0.003 * wiggle + trend * t);
    out << line;
  }
}

fs::path run_folder(const std::string& stem, double trend) {
  const fs::path folder = fresh_folder(stem);
  write_timeline(folder, 301, trend);
  fs::copy_file(fs::path(BRUME_SOURCE_DIR) / "problems/demo.yaml", folder / "config.yaml");
  return folder;
}

TEST(Steadiness, ASettledSeriesIsSteadySinceItsRelaxation) {
  const fs::path folder = run_folder("brume-steady", 0.0);
  const CommandResult r = run_brume("steadiness '" + folder.string() + "'");
  ASSERT_EQ(r.exit_code, 0) << r.out << r.err;
  std::printf("%s", r.out.c_str());
  EXPECT_NE(r.out.find("window 3 to 6 Myr"), std::string::npos) << r.out;
  EXPECT_NE(r.out.find("steady over the window: yes"), std::string::npos) << r.out;
  EXPECT_EQ(r.out.find("DRIFTING"), std::string::npos) << r.out;
  EXPECT_NE(r.out.find("steady since: "), std::string::npos) << r.out;
  EXPECT_EQ(r.out.find("steady since: no start"), std::string::npos) << r.out;
  // Columns the table lacks are named, not judged.
  EXPECT_NE(r.out.find("cold_mass_fraction"), std::string::npos) << r.out;
  // 20 pc / 3.5 km/s = 5.59 Myr is longer than the 3 Myr window: said as a note.
  EXPECT_NE(r.out.find("shorter than one crossing time of the box L / v_rms (5.5"),
            std::string::npos)
      << r.out;
  EXPECT_EQ(r.out.find("correlation times"), std::string::npos) << r.out;
  fs::remove_all(folder);
}

TEST(Steadiness, ADriftingSeriesIsNotSteadyAndAShortWindowIsWarnedOf) {
  const fs::path folder = run_folder("brume-drifting", 0.02);
  const CommandResult r = run_brume("steadiness '" + folder.string() + "'");
  ASSERT_EQ(r.exit_code, 0) << r.out << r.err;
  // +0.02 per Myr over 3 Myr: a drift of 0.06 against the allowance of 0.02.
  EXPECT_NE(r.out.find("DRIFTING"), std::string::npos) << r.out;
  EXPECT_NE(r.out.find("steady over the window: no"), std::string::npos) << r.out;
  const CommandResult late = run_brume("steadiness '" + folder.string() + "' --since 5.2Myr");
  ASSERT_EQ(late.exit_code, 0) << late.out << late.err;
  EXPECT_NE(late.out.find("window 5.2 to 6 Myr"), std::string::npos) << late.out;
  // 0.8 Myr is less than two correlation times (1 Myr) of the demo's stirring.
  EXPECT_NE(late.out.find("fewer than two correlation times of the stirring (1 Myr)"),
            std::string::npos)
      << late.out;
  fs::remove_all(folder);
}

TEST(Steadiness, BadInputIsRefusedWithItsName) {
  const fs::path folder = fresh_folder("brume-steady-bad");
  const CommandResult missing = run_brume("steadiness '" + folder.string() + "/nothing'");
  EXPECT_EQ(missing.exit_code, 2);
  EXPECT_NE(missing.err.find("nothing: no such run folder"), std::string::npos) << missing.err;
  const CommandResult no_table = run_brume("steadiness '" + folder.string() + "'");
  EXPECT_EQ(no_table.exit_code, 2);
  EXPECT_NE(no_table.err.find("timeline.txt: cannot be read"), std::string::npos) << no_table.err;
  write_timeline(folder, 40, 0.0);
  std::ofstream(folder / "timeline.txt", std::ios::app) << "400 x 3 0.5\n";
  const CommandResult bad_row = run_brume("steadiness '" + folder.string() + "'");
  EXPECT_EQ(bad_row.exit_code, 2);
  EXPECT_NE(bad_row.err.find("timeline.txt: line 43"), std::string::npos) << bad_row.err;
  write_timeline(folder, 40, 0.0);
  for (const char* since : {"abc", "3pc"}) {
    const CommandResult r =
        run_brume("steadiness '" + folder.string() + "' --since " + std::string(since));
    EXPECT_EQ(r.exit_code, 2) << since;
    EXPECT_NE(r.err.find(std::string("--since ") + since), std::string::npos) << r.err;
  }
  const CommandResult short_window =
      run_brume("steadiness '" + folder.string() + "' --since 5.9Myr");
  EXPECT_EQ(short_window.exit_code, 2);
  EXPECT_NE(short_window.err.find("at least 10 are needed"), std::string::npos) << short_window.err;
  fs::remove_all(folder);
}

}  // namespace
}  // namespace brume::testing
