// `brume run` end to end on a tiny box: the run folder holds the resolved configuration, the log,
// the summary and the snapshots on their schedule; the snapshots read back with h5py, and their
// XDMF sidecars and time series describe them (tests/io/check_xdmf.py).
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <sstream>

#include "tests/cli/run_brume.hpp"
#include "tests/support/run_python.hpp"

namespace fs = std::filesystem;
using brume::testing::fresh_folder;
using brume::testing::run_brume;

TEST(Run, WritesConfigurationLogSummaryAndScheduledSnapshots) {
  const fs::path folder = fresh_folder("brume-run");
  const fs::path out = folder / "box";
  const auto r = run_brume("run '" + std::string(BRUME_SOURCE_DIR) +
                           "/problems/demo.yaml' --set box.cells=8 --set clock.stop_time=0.3Myr "
                           "--set output.snapshot_interval=0.1Myr -q --out '" +
                           out.string() + "'");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  for (const char* name : {"config.yaml", "run.log", "summary.txt", "snapshot-0000.h5",
                           "snapshot-0001.h5", "snapshot-0002.h5", "snapshot-0003.h5"}) {
    EXPECT_TRUE(fs::exists(out / name)) << name;
  }
  EXPECT_FALSE(fs::exists(out / "snapshot-0004.h5")) << "the final state is the t = 0.3 Myr one";
  std::ifstream summary(out / "summary.txt");
  std::stringstream text;
  text << summary.rdbuf();
  EXPECT_NE(text.str().find("reached the stop time"), std::string::npos) << text.str();
  // The snapshot times, read with h5py (Debian python3-h5py, the reference reader), are the
  // scheduled ones: 0, 0.1, 0.2 and 0.3 Myr (1 Myr = 1.022712165 code times with the default
  // units 1 pc / 1 km/s — derived from the IAU parsec and the Julian year, docs/units.md).
  const std::string script =
      "import h5py,sys\n"
      "t=[h5py.File(sys.argv[1]+'/snapshot-%04d.h5'%i,'r').attrs['time'] for i in range(4)]\n"
      "u=3.15576e13/3.0856775814913673e13\n"
      "ok=all(abs(t[i]-0.1*i*u)<1e-9 for i in range(4))\n"
      "print(t); sys.exit(0 if ok else 1)\n";
  std::ofstream(folder / "times.py") << script;
  const std::string command = std::string(BRUME_PYTHON) + " '" + (folder / "times.py").string() +
                              "' '" + out.string() + "' > '" + (folder / "times.txt").string() +
                              "' 2>&1";
  const int status = std::system(command.c_str());
  std::ifstream times(folder / "times.txt");
  std::stringstream printed;
  printed << times.rdbuf();
  EXPECT_EQ(status, 0) << printed.str();
  fs::remove_all(folder);
}

// A run whose floors act on more cells than scheme.floor_limit allows stops as failed: exit code 3
// (docs/command-line.md), a one-line reason with the step, the time, the cell and its values, and a
// diagnostic snapshot of the failed step beside the earlier snapshots. The β = 0.02 blast wave
// floors the pressure in a few cells within its first steps (docs/validation.md); a limit of 1e-9
// of the cells is exceeded by the first floored cell. Common practice, no source.
TEST(Run, ExhaustedFloorsStopTheRunWithExitCodeThreeAndADiagnosticSnapshot) {
  const fs::path folder = fresh_folder("brume-floors");
  const fs::path out = folder / "blast";
  const auto r = run_brume("run '" + std::string(BRUME_SOURCE_DIR) +
                           "/problems/blast_wave.yaml' --set scheme.floor_limit=1e-9 --out '" +
                           out.string() + "'");
  EXPECT_EQ(r.exit_code, 3) << r.err;
  std::ifstream summary(out / "summary.txt");
  std::stringstream text;
  text << summary.rdbuf();
  EXPECT_NE(text.str().find("floors acted on too many cells"), std::string::npos) << text.str();
  EXPECT_NE(text.str().find("scheme.floor_limit = 1e-09"), std::string::npos) << text.str();
  EXPECT_NE(text.str().find("first floored at step"), std::string::npos) << text.str();
  EXPECT_NE(text.str().find("cell ("), std::string::npos) << text.str();
  EXPECT_TRUE(fs::exists(out / "snapshot-0000.h5"));
  bool failure_snapshot = false;
  for (const auto& entry : fs::directory_iterator(out))
    failure_snapshot |= entry.path().filename().string().rfind("failure-step", 0) == 0;
  EXPECT_TRUE(failure_snapshot);
  EXPECT_NE(r.err.find("diagnostic snapshot"), std::string::npos) << r.err;
  fs::remove_all(folder);
}

TEST(Run, SnapshotsHaveXdmfSidecarsAndATimeSeries) {
  const fs::path folder = fresh_folder("brume-run-xdmf");
  const fs::path out = folder / "box";
  const auto r = run_brume("run '" + std::string(BRUME_SOURCE_DIR) +
                           "/problems/demo.yaml' --set box.cells=8 --set clock.stop_time=0.2Myr "
                           "--set output.snapshot_interval=0.1Myr --set output.compression=deflate "
                           "-q --out '" +
                           out.string() + "'");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  for (const char* name :
       {"snapshot-0000.xmf", "snapshot-0001.xmf", "snapshot-0002.xmf", "snapshots.xmf"}) {
    EXPECT_TRUE(fs::exists(out / name)) << name;
  }
  // Parsed with xml.etree; every dataset path opened with h5py with its dimensions and precision.
  const auto check = brume::testing::run_python(
      brume::testing::source_script("tests/io/check_xdmf.py"), {out.string()});
  EXPECT_EQ(check.exit_code, 0) << check.output;
  fs::remove_all(folder);
}
