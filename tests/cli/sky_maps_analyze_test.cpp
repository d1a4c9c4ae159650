// The sky maps end to end: `brume run` makes a small magnetized snapshot
// (tests/mpi/decaying_box.yaml, 16³, six steps), `brume analyze` measures it on one and on two
// ranks, and tests/cli/sky_maps_reference.py recomputes every map, spectrum, slope and ratio with
// numpy (np.sum along the axes, numpy.fft for E/B) from the snapshot read with h5py. Tolerance
// 1e-10 relative (the script states why); the maps of 1 and 2 ranks must be bitwise identical.
#include <gtest/gtest.h>

#include <cstdio>
#include <filesystem>
#include <string>

#include "tests/cli/run_brume.hpp"
#include "tests/support/run_python.hpp"

namespace brume::testing {
namespace {

TEST(SkyMapsAnalyze, MatchesNumpyOnOneAndTwoRanks) {
  const std::string folder = fresh_folder("brume-sky");
  const PythonResult r =
      run_python(source_script("tests/cli/sky_maps_reference.py"),
                 {BRUME_BINARY, std::string(BRUME_SOURCE_DIR) + "/tests/mpi/decaying_box.yaml",
                  folder, "mpiexec"});
  std::printf("%s", r.output.c_str());
  EXPECT_EQ(r.exit_code, 0) << r.output;
  EXPECT_NE(r.output.find("bitwise identical"), std::string::npos) << r.output;
  std::filesystem::remove_all(folder);
}

}  // namespace
}  // namespace brume::testing
