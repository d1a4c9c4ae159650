// XDMF sidecars and the time series, checked against the HDF5 files they describe by
// tests/io/check_xdmf.py: parsed with Python's xml.etree, every dataset path opened with Debian's
// h5py, with its dimensions and precision (XDMF model: Topology, Geometry, Attribute, DataItem).
#include "io/xdmf.hpp"

#include <gtest/gtest.h>
#include <mpi.h>

#include <vector>

#include "io/atomic_file.hpp"
#include "tests/io/known_fields.hpp"
#include "tests/support/run_python.hpp"

namespace fs = std::filesystem;
namespace testing_ = brume::testing;

namespace {

// Writes snapshot-000N.h5 for N < count, each with its sidecar, and the series after each one as
// a run does; returns the folder.
fs::path write_run(const std::string& stem, const std::array<int, 3>& cells, bool magnetic,
                   bool isothermal, bool single_precision, int count) {
  const fs::path folder = testing_::scratch_folder(stem);
  const auto box = testing_::whole_box(cells, {-1.0, 0.5, 2.0}, {3.0, 1.25, 0.5});
  auto info = testing_::known_info(box);
  info.single_precision = single_precision;
  auto state = testing_::known_state(box, magnetic, isothermal);
  std::vector<brume::io::XdmfSnapshot> series;
  for (int n = 0; n < count; ++n) {
    state.time = 0.125 * n;
    const std::string name = "snapshot-000" + std::to_string(n) + ".h5";
    brume::io::write_snapshot(folder / name, state, info, MPI_COMM_WORLD);
    series.push_back(brume::io::xdmf_snapshot(name, state, info));
    brume::io::write_file_atomically(brume::io::sidecar_path(folder / name),
                                     brume::io::snapshot_xdmf(series.back()));
    brume::io::write_file_atomically(folder / brume::io::time_series_file,
                                     brume::io::time_series_xdmf(series));
  }
  return folder;
}

void expect_xdmf_check_passes(const fs::path& folder) {
  const auto r =
      testing_::run_python(testing_::source_script("tests/io/check_xdmf.py"), {folder.string()});
  EXPECT_EQ(r.exit_code, 0) << r.output;
}

}  // namespace

TEST(Xdmf, SidecarPathSitsBesideTheSnapshot) {
  EXPECT_EQ(brume::io::sidecar_path("runs/a/snapshot-0003.h5"),
            fs::path("runs/a/snapshot-0003.xmf"));
}

TEST(Xdmf, MagnetizedDoublePrecisionBoxWithFaceGrids) {
  const fs::path folder = write_run("brume-xdmf-mhd", {6, 5, 4}, true, false, false, 3);
  expect_xdmf_check_passes(folder);
  fs::remove_all(folder);
}

TEST(Xdmf, IsothermalSinglePrecisionPlaneWithoutFaceGrids) {
  const fs::path folder = write_run("brume-xdmf-hydro", {6, 5, 1}, false, true, true, 2);
  expect_xdmf_check_passes(folder);
  fs::remove_all(folder);
}

TEST(Xdmf, MagnetizedPlaneStaggersOnlyTheActiveAxes) {
  const fs::path folder = write_run("brume-xdmf-plane", {6, 5, 1}, true, false, true, 1);
  expect_xdmf_check_passes(folder);
  fs::remove_all(folder);
}

TEST(Xdmf, TheSeriesOfNoSnapshotIsAnEmptyDomain) {
  const std::string xml = brume::io::time_series_xdmf({});
  EXPECT_NE(xml.find("<Xdmf Version=\"3.0\">"), std::string::npos);
  EXPECT_NE(xml.find("<Domain>\n  </Domain>"), std::string::npos) << xml;
}
