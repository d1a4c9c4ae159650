// The spectra end to end: `brume run` makes a small magnetized snapshot
// (tests/mpi/decaying_box.yaml, 16³, four steps), `brume analyze` measures it on one and on two
// ranks, and tests/cli/spectra_analyze.py recomputes every spectrum with numpy (numpy.fft.fftn,
// np.bincount; Debian's numpy and h5py) from the snapshot's datasets. Tolerance 1e-10 relative to
// each array's largest value: both sides are double-precision FFTs of the same doubles (round-off
// ≈ 1e-15); the margin covers the sums over shells taken in different orders.
#include <gtest/gtest.h>

#include <cstdio>
#include <filesystem>
#include <string>

#include "tests/cli/run_brume.hpp"
#include "tests/support/run_python.hpp"

namespace brume::testing {
namespace {

TEST(SpectraAnalyze, MatchesNumpyOnOneAndTwoRanks) {
  const std::string folder = fresh_folder("brume-spectra");
  const PythonResult r =
      run_python(source_script("tests/cli/spectra_analyze.py"),
                 {BRUME_BINARY, std::string(BRUME_SOURCE_DIR) + "/tests/mpi/decaying_box.yaml",
                  folder, "mpiexec"});
  std::printf("%s", r.output.c_str());
  EXPECT_EQ(r.exit_code, 0) << r.output;
  EXPECT_NE(r.output.find("all within tolerance"), std::string::npos) << r.output;
  std::filesystem::remove_all(folder);
}

}  // namespace
}  // namespace brume::testing
