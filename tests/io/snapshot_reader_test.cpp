// The snapshot reader: what brume writes reads back exactly, into the whole box or any block,
// and every kind of bad file is refused with a message that names the file and the fault. The
// damaged files are made with h5py (Debian's python3-h5py). Common practice, no source.
#include "io/snapshot_reader.hpp"

#include <gtest/gtest.h>
#include <mpi.h>

#include <fstream>
#include <random>

#include "io/snapshot.hpp"
#include "io/snapshot_layout.hpp"
#include "tests/io/known_fields.hpp"
#include "tests/support/run_python.hpp"

namespace fs = std::filesystem;
using brume::io::SnapshotFileError;
using brume::io::SnapshotReader;
namespace testing_ = brume::testing;

namespace {

constexpr double sentinel = 99.0;  // ghosts hold it before a read and must still hold it after

// Writes the known state of the whole box `cells` to `file`.
void write_known(const fs::path& file, const std::array<int, 3>& cells, bool magnetic,
                 bool isothermal, bool single_precision = false, int deflate_level = 0) {
  const auto box = testing_::whole_box(cells, {-0.5, 0.0, 2.0}, {1.5, 1.0, 0.5});
  auto info = testing_::known_info(box);
  info.single_precision = single_precision;
  info.deflate_level = deflate_level;
  brume::io::write_snapshot(file, testing_::known_state(box, magnetic, isothermal), info,
                            MPI_COMM_WORLD);
}

// Counts the cells and faces of `state` (of a block of the box) that differ from the known
// values, and the ghost slots that a read changed.
struct Mismatches {
  long values = 0;
  long ghosts = 0;
};

Mismatches compare(const brume::solver::State& s, const SnapshotReader& reader) {
  Mismatches m;
  const auto& g = s.geometry;
  const auto& all = brume::io::all_snapshot_fields();
  for (const auto& field : reader.fields()) {
    std::size_t q = 0;
    while (all[q].name != field.name)
      ++q;
    const std::vector<double>& values = brume::io::field_storage(s, field);
    const int normal = field.staggered_axis();
    std::array<int, 3> n = g.cells;
    if (normal >= 0 && g.active(normal)) n[normal] += 1;
    for (int k = 0; k < n[2]; ++k)
      for (int j = 0; j < n[1]; ++j)
        for (int i = 0; i < n[0]; ++i) {
          const double want =
              testing_::known_value(q, g.offset[0] + i, g.offset[1] + j, g.offset[2] + k);
          m.values += values[g.index(i, j, k)] != want ? 1 : 0;
        }
    if (g.active(0)) m.ghosts += values[g.index(-1, 0, 0)] != sentinel ? 1 : 0;
  }
  return m;
}

brume::solver::State empty_state(const brume::solver::BlockGeometry& g, bool magnetic,
                                 bool isothermal) {
  auto s = brume::solver::make_state(g, magnetic, isothermal);
  for (auto* a : brume::solver::cell_arrays(s))
    a->assign(a->size(), sentinel);
  for (auto& b : s.face_field)
    b.assign(b.size(), sentinel);
  return s;
}

// Block [offset, offset + cells) of the box `box_cells`, with `ghosts` ghost layers.
brume::solver::BlockGeometry block(const std::array<int, 3>& box_cells,
                                   const std::array<int, 3>& cells,
                                   const std::array<long, 3>& offset, int ghosts) {
  auto g = brume::solver::whole_box_geometry(box_cells, {0, 0, 0}, {1, 1, 1}, ghosts);
  g.cells = cells;
  g.offset = offset;
  return g;
}

}  // namespace

TEST(SnapshotReader, HeaderAndDatasetsAreWhatWasWritten) {
  const fs::path folder = testing_::scratch_folder("brume-reader-header");
  write_known(folder / "s.h5", {6, 5, 4}, true, false);
  const SnapshotReader reader(folder / "s.h5", MPI_COMM_WORLD);
  const auto& h = reader.header();
  const auto info =
      testing_::known_info(testing_::whole_box({6, 5, 4}, {-0.5, 0, 2}, {1.5, 1, 0.5}));
  EXPECT_EQ(h.format, "brume snapshot 1");
  EXPECT_EQ(h.time, 0.375);
  EXPECT_EQ(h.step, 12);
  EXPECT_EQ(h.reason, "test");
  EXPECT_EQ(h.cells, (std::array<long, 3>{6, 5, 4}));
  EXPECT_EQ(h.lower, info.lower);
  EXPECT_EQ(h.size, info.size);
  EXPECT_EQ(h.time_to_cgs, info.units.time);
  EXPECT_EQ(h.length_to_cgs, info.units.length);
  EXPECT_EQ(h.configuration, info.configuration);
  ASSERT_FALSE(h.build.empty());
  EXPECT_EQ(h.build.front().first, "version");
  EXPECT_TRUE(reader.magnetic());
  EXPECT_FALSE(reader.isothermal());
  const auto& d = reader.datasets();
  ASSERT_EQ(d.size(), 8u);
  EXPECT_EQ(d[0].name, "density");
  EXPECT_EQ(d[0].shape, (std::vector<hsize_t>{4, 5, 6}));
  EXPECT_EQ(d[0].type, "float64");
  EXPECT_EQ(d[0].unit, "g cm^-3");
  EXPECT_EQ(d[0].to_cgs, info.units.density);
  EXPECT_EQ(d[0].storage, "contiguous");
  EXPECT_EQ(d[4].name, "total_energy");
  EXPECT_EQ(d[4].to_cgs, info.units.energy_density);
  EXPECT_EQ(d[5].name, "face_field_x");
  EXPECT_EQ(d[5].shape, (std::vector<hsize_t>{4, 5, 7}));
  EXPECT_EQ(d[7].shape, (std::vector<hsize_t>{5, 5, 6}));
  EXPECT_EQ(d[7].unit, "G");
  fs::remove_all(folder);
}

TEST(SnapshotReader, TheWholeBoxAndEveryBlockReadBackExactly) {
  const fs::path folder = testing_::scratch_folder("brume-reader-blocks");
  const std::array<int, 3> box{6, 5, 4};
  write_known(folder / "s.h5", box, true, false);
  const SnapshotReader reader(folder / "s.h5", MPI_COMM_WORLD);
  // Another ghost depth than the writer's, then four blocks of 3 × 5 × 2 cells.
  auto whole = empty_state(block(box, box, {0, 0, 0}, 3), true, false);
  reader.read_block(whole);
  const Mismatches m = compare(whole, reader);
  EXPECT_EQ(m.values, 0);
  EXPECT_EQ(m.ghosts, 0);
  for (const long x : {0L, 3L}) {
    for (const long z : {0L, 2L}) {
      auto part = empty_state(block(box, {3, 5, 2}, {x, 0, z}, 2), true, false);
      reader.read_block(part);
      const Mismatches p = compare(part, reader);
      EXPECT_EQ(p.values, 0) << "block at x " << x << ", z " << z;
      EXPECT_EQ(p.ghosts, 0) << "block at x " << x << ", z " << z;
    }
  }
  fs::remove_all(folder);
}

TEST(SnapshotReader, SinglePrecisionIsothermalHydrodynamicsIn2DReadsBack) {
  const fs::path folder = testing_::scratch_folder("brume-reader-f32");
  const std::array<int, 3> box{6, 5, 1};
  write_known(folder / "s.h5", box, false, true, true);
  const SnapshotReader reader(folder / "s.h5", MPI_COMM_WORLD);
  EXPECT_FALSE(reader.magnetic());
  EXPECT_TRUE(reader.isothermal());
  ASSERT_EQ(reader.datasets().size(), 4u);
  EXPECT_EQ(reader.datasets()[0].type, "float32");
  auto whole = empty_state(block(box, box, {0, 0, 0}, 2), false, true);
  reader.read_block(whole);
  EXPECT_EQ(compare(whole, reader).values, 0);  // the known values are exact in float32
  fs::remove_all(folder);
}

TEST(SnapshotReader, CompressedDatasetsReadBackExactly) {
  const fs::path folder = testing_::scratch_folder("brume-reader-deflate");
  const std::array<int, 3> box{6, 5, 4};
  write_known(folder / "s.h5", box, true, false, false, 6);
  const SnapshotReader reader(folder / "s.h5", MPI_COMM_WORLD);
  EXPECT_EQ(reader.datasets()[0].storage, "chunked, shuffle + deflate 6 + fletcher32");
  auto whole = empty_state(block(box, box, {0, 0, 0}, 2), true, false);
  reader.read_block(whole);
  EXPECT_EQ(compare(whole, reader).values, 0);
  fs::remove_all(folder);
}

TEST(SnapshotReader, AStateOfAnotherKindIsRefused) {
  const fs::path folder = testing_::scratch_folder("brume-reader-kind");
  write_known(folder / "s.h5", {6, 5, 4}, true, false);
  const SnapshotReader reader(folder / "s.h5", MPI_COMM_WORLD);
  auto hydro = empty_state(block({6, 5, 4}, {6, 5, 4}, {0, 0, 0}, 2), false, false);
  try {
    reader.read_block(hydro);
    FAIL() << "expected SnapshotFileError";
  } catch (const SnapshotFileError& error) {
    EXPECT_NE(std::string(error.what())
                  .find("holds magnetized adiabatic gas, but the state to "
                        "fill is hydrodynamic adiabatic gas"),
              std::string::npos)
        << error.what();
  }
  fs::remove_all(folder);
}

namespace {

struct BadFile {
  std::string name;
  std::string damage;                 // a kind of tests/io/damage_snapshot.py, or one made here
  std::vector<std::string> expected;  // each in the message, beside the file's path
};

void PrintTo(const BadFile& c, std::ostream* out) {
  *out << c.name;
}

// Makes the bad file `target` from a good snapshot `good`.
void make_bad_file(const BadFile& c, const fs::path& good, const fs::path& target) {
  if (c.damage == "missing") return;
  if (c.damage == "random_bytes") {
    std::mt19937 random(7);
    std::ofstream out(target, std::ios::binary);
    for (int n = 0; n < 4096; ++n)
      out.put(static_cast<char>(random() & 0xff));
  } else if (c.damage == "truncated") {
    fs::copy_file(good, target);
    fs::resize_file(target, fs::file_size(good) / 2);
  } else if (c.damage == "foreign") {
    const hid_t file = H5Fcreate(target.c_str(), H5F_ACC_TRUNC, H5P_DEFAULT, H5P_DEFAULT);
    H5Fclose(file);
  } else {
    const auto r = testing_::run_python(testing_::source_script("tests/io/damage_snapshot.py"),
                                        {good.string(), target.string(), c.damage});
    ASSERT_EQ(r.exit_code, 0) << r.output;
  }
}

class BadSnapshot : public ::testing::TestWithParam<BadFile> {};

TEST_P(BadSnapshot, IsRefusedWithAMessageNamingTheFileAndTheFault) {
  const BadFile& c = GetParam();
  const fs::path folder = testing_::scratch_folder("brume-reader-bad");
  write_known(folder / "good.h5", {6, 5, 4}, true, false);
  const fs::path target = folder / (c.name + ".h5");
  make_bad_file(c, folder / "good.h5", target);
  try {
    const SnapshotReader reader(target, MPI_COMM_WORLD);
    auto state = empty_state(block({6, 5, 4}, {6, 5, 4}, {0, 0, 0}, 2), true, false);
    reader.read_block(state);
    FAIL() << "expected SnapshotFileError";
  } catch (const SnapshotFileError& error) {
    const std::string message = error.what();
    EXPECT_EQ(message.rfind(target.string() + ": ", 0), 0u) << message;
    for (const std::string& word : c.expected)
      EXPECT_NE(message.find(word), std::string::npos) << "'" << word << "' in " << message;
  }
  fs::remove_all(folder);
}

const BadFile bad_files[] = {
    {"missing", "missing", {"no such file"}},
    {"random_bytes", "random_bytes", {"not an HDF5 file"}},
    {"truncated", "truncated", {"truncated HDF5 file", "eof"}},
    {"foreign", "foreign", {"not a brume snapshot", "no root attribute 'format'"}},
    {"other_format", "format", {"'brume checkpoint 9', expected 'brume snapshot 1'"}},
    {"no_time", "drop_time", {"root attribute 'time' is missing"}},
    {"no_momentum_y", "drop_momentum_y", {"dataset /fields/momentum_y is missing"}},
    {"density_shape",
     "reshape_density",
     {"dataset /fields/density has shape [4, 5, 7], expected [4, 5, 6]", "6 × 5 × 4 cells"}},
    {"integer_density", "integer_density", {"/fields/density holds int32 values"}},
    {"no_unit", "drop_unit", {"dataset /fields/total_energy: attribute 'unit' is missing"}},
};

INSTANTIATE_TEST_SUITE_P(Files, BadSnapshot, ::testing::ValuesIn(bad_files),
                         [](const auto& test) { return test.param.name; });

}  // namespace
