// End to end: `brume analyze` on 1 and 2 ranks against an independent numpy computation from the
// snapshot's fields (tests/structure/structure_reference.py; the reference is numpy's np.roll
// shifts and scipy.stats.linregress, Debian numpy/scipy/h5py through /usr/bin/python3).
// Tolerance 1e-10 relative, justified in the script; the two rank counts must agree bit for bit.
#include <gtest/gtest.h>
#include <unistd.h>

#include <filesystem>
#include <string>

#include "tests/support/run_python.hpp"

namespace brume::testing {
namespace {

TEST(StructureReference, AnalyzeOnOneAndTwoRanksMatchesNumpy) {
  const std::filesystem::path work =
      std::filesystem::temp_directory_path() /
      ("brume-structure-" + std::to_string(static_cast<long>(::getpid())));
  std::filesystem::remove_all(work);
  const PythonResult r =
      run_python(source_script("tests/structure/structure_reference.py"),
                 {BRUME_BINARY, BRUME_MPIEXEC,
                  std::string(BRUME_SOURCE_DIR) + "/tests/mpi/decaying_box.yaml", work.string()});
  EXPECT_EQ(r.exit_code, 0) << r.output;
  EXPECT_NE(r.output.find("\nok\n"), std::string::npos) << r.output;
  std::filesystem::remove_all(work);
}

}  // namespace
}  // namespace brume::testing
