#include "io/snapshot.hpp"

#include <gtest/gtest.h>
#include <mpi.h>
#include <unistd.h>

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <string>

namespace fs = std::filesystem;

namespace {

brume::solver::State known_state(int nx, int ny, int nz) {
  const auto g = brume::solver::whole_box_geometry({nx, ny, nz}, {0, 0, 0}, {1, 1, 1}, 2);
  auto s = brume::solver::make_state(g, true, false);
  for (auto& v : s.density)
    v = -1.0;  // ghosts hold garbage that must not be written
  for (int k = 0; k < nz; ++k) {
    for (int j = 0; j < ny; ++j) {
      for (int i = 0; i < nx; ++i)
        s.density[g.index(i, j, k)] = 1.0 + i + 10.0 * j + 100.0 * k;
      for (int i = 0; i <= nx; ++i)
        s.face_field[0][g.index(i, j, k)] = 0.5 * i - j + 3.0 * k;
    }
  }
  s.time = 0.25;
  s.step = 7;
  return s;
}

// Writes the known state of a 6 × 5 × 4 box and checks it with h5py (Debian python3-h5py, the
// reference reader); `deflate_level` 0 writes contiguous datasets.
void write_and_check(int deflate_level) {
  const int nx = 6, ny = 5, nz = 4;
  const auto state = known_state(nx, ny, nz);
  brume::io::SnapshotInfo info;
  info.global_cells = {nx, ny, nz};
  info.size = {1, 1, 1};
  info.units.density = 2.0e-24;
  info.configuration = "box:\n  cells: [6, 5, 4]\n";
  info.reason = "test";
  // One folder per process: ctest runs the tests of this file in parallel.
  const fs::path folder =
      fs::temp_directory_path() / ("brume-snapshot-test-" + std::to_string(::getpid()));
  fs::remove_all(folder);
  fs::create_directories(folder);
  const fs::path file = folder / "fields.h5";
  info.deflate_level = deflate_level;
  brume::io::write_snapshot(file, state, info, MPI_COMM_WORLD);
  ASSERT_TRUE(fs::exists(file));
  EXPECT_EQ(std::distance(fs::directory_iterator(folder), fs::directory_iterator{}), 1)
      << "no temporary file is left behind";
  const std::string command =
      std::string(BRUME_PYTHON) + " '" + BRUME_SOURCE_DIR + "/tests/io/check_snapshot.py' '" +
      file.string() + "' " + std::to_string(nx) + " " + std::to_string(ny) + " " +
      std::to_string(nz) + (deflate_level > 0 ? " " + std::to_string(deflate_level) : "") + " > '" +
      (folder / "check.txt").string() + "' 2>&1";
  const int status = std::system(command.c_str());
  std::ifstream report(folder / "check.txt");
  const std::string text((std::istreambuf_iterator<char>(report)), {});
  EXPECT_EQ(status, 0) << text;
  fs::remove_all(folder);
}

}  // namespace

TEST(Snapshot, ReadBackWithH5pyHasShapesValuesAndUnits) {
  write_and_check(0);
}

TEST(Snapshot, DeflateOnRequestIsLosslessChunkedAndChecksummed) {
  write_and_check(3);
}

TEST(Snapshot, FailureToCreateIsReportedAndLeavesNoFile) {
  const fs::path folder = fs::temp_directory_path() / "brume-snapshot-fail";
  fs::remove_all(folder);
  fs::create_directories(folder);
  brume::io::SnapshotInfo info;
  info.global_cells = {4, 4, 1};
  const auto state = known_state(4, 4, 1);
  EXPECT_THROW(
      brume::io::write_snapshot(folder / "absent" / "fields.h5", state, info, MPI_COMM_WORLD),
      std::runtime_error);
  fs::remove_all(folder);
}
