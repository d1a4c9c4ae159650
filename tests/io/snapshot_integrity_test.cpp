// The integrity check of `brume inspect`: value counts, non-finite values, extremes and the
// divergence of the face field, against numpy's computation from the same file
// (tests/io/integrity_reference.py, Debian's numpy and h5py), whatever the slabs it reads.
#include "io/snapshot_integrity.hpp"

#include <gtest/gtest.h>
#include <mpi.h>

#include <cmath>
#include <map>
#include <sstream>

#include "io/snapshot.hpp"
#include "tests/io/known_fields.hpp"
#include "tests/support/run_python.hpp"

namespace fs = std::filesystem;
namespace testing_ = brume::testing;
using brume::io::check_integrity;
using brume::io::SnapshotIntegrity;
using brume::io::SnapshotReader;

namespace {

const std::array<int, 3> box{6, 5, 4};

// A smooth vector potential on the cell edges; the face field is its discrete curl, whose
// discrete divergence vanishes identically (Evans & Hawley 1988, ApJ 332, 659: the constrained
// transport identity), so only round-off remains.
double potential(int c, int i, int j, int k) {
  return std::sin(1.3 * i + 2.1 * j + 0.7 * k + c);
}

void write_solenoidal(const fs::path& file) {
  const auto g = testing_::whole_box(box, {0, 0, 0}, {1.5, 1.0, 0.5});
  auto s = testing_::known_state(g, true, false);
  const double dx = g.spacing[0], dy = g.spacing[1], dz = g.spacing[2];
  for (int k = 0; k <= box[2]; ++k)
    for (int j = 0; j <= box[1]; ++j)
      for (int i = 0; i <= box[0]; ++i) {
        const auto c = g.index(i, j, k);
        auto a = [&](int comp, int di, int dj, int dk) {
          return potential(comp, i + di, j + dj, k + dk);
        };
        s.face_field[0][c] =
            (a(2, 0, 1, 0) - a(2, 0, 0, 0)) / dy - (a(1, 0, 0, 1) - a(1, 0, 0, 0)) / dz;
        s.face_field[1][c] =
            (a(0, 0, 0, 1) - a(0, 0, 0, 0)) / dz - (a(2, 1, 0, 0) - a(2, 0, 0, 0)) / dx;
        s.face_field[2][c] =
            (a(1, 1, 0, 0) - a(1, 0, 0, 0)) / dx - (a(0, 0, 1, 0) - a(0, 0, 0, 0)) / dy;
      }
  brume::io::write_snapshot(file, s, testing_::known_info(g), MPI_COMM_WORLD);
}

struct Reference {
  std::map<std::string, std::array<double, 4>> fields;  // values, non-finite, min, max
  double divergence = -1.0;
};

Reference numpy_reference(const fs::path& file) {
  const auto r = testing_::run_python(testing_::source_script("tests/io/integrity_reference.py"),
                                      {file.string()});
  EXPECT_EQ(r.exit_code, 0) << r.output;
  Reference ref;
  std::istringstream lines(r.output);
  std::string word;
  while (lines >> word) {
    if (word == "field") {
      std::string name;
      std::array<double, 4> v{};
      lines >> name >> v[0] >> v[1] >> v[2] >> v[3];
      ref.fields[name] = v;
    } else if (word == "divergence") {
      lines >> ref.divergence;
    }
  }
  return ref;
}

void expect_matches(const SnapshotIntegrity& mine, const Reference& ref) {
  ASSERT_EQ(mine.fields.size(), ref.fields.size());
  for (const auto& f : mine.fields) {
    const auto& r = ref.fields.at(f.name);
    EXPECT_EQ(double(f.values), r[0]) << f.name;
    EXPECT_EQ(double(f.non_finite), r[1]) << f.name;
    EXPECT_EQ(f.min, r[2]) << f.name;  // extremes are values of the file: exact
    EXPECT_EQ(f.max, r[3]) << f.name;
  }
  // Same formula, same order of operations: equal up to the last bits (1e-12 relative).
  EXPECT_NEAR(mine.divergence, ref.divergence, 1e-12 * ref.divergence + 1e-300);
}

SnapshotIntegrity check(const fs::path& file, long slab_cells) {
  const SnapshotReader reader(file, MPI_COMM_SELF);
  return check_integrity(reader, slab_cells);
}

}  // namespace

TEST(SnapshotIntegrity, ASolenoidalFieldIsSoundAndAgreesWithNumpyForAnySlabs) {
  const fs::path folder = testing_::scratch_folder("brume-integrity-sound");
  write_solenoidal(folder / "s.h5");
  const Reference ref = numpy_reference(folder / "s.h5");
  for (const long slab_cells : {1L << 21, 60L, 1L}) {  // one slab; two of 2 planes; the same
    const SnapshotIntegrity mine = check(folder / "s.h5", slab_cells);
    expect_matches(mine, ref);
    EXPECT_EQ(mine.non_finite, 0);
    // Four round-off-sized terms of O(1) potentials: a few ε of 2.2e-16, far below 1e-13.
    EXPECT_LT(mine.divergence, 1e-13);
    EXPECT_TRUE(mine.sound());
  }
  fs::remove_all(folder);
}

TEST(SnapshotIntegrity, AKickedFaceAndANaNAreFound) {
  const fs::path folder = testing_::scratch_folder("brume-integrity-damaged");
  write_solenoidal(folder / "s.h5");
  for (const char* damage : {"kick_face_x", "nan_density"}) {
    const fs::path bad = folder / (std::string(damage) + ".h5");
    const auto r = testing_::run_python(testing_::source_script("tests/io/damage_snapshot.py"),
                                        {(folder / "s.h5").string(), bad.string(), damage});
    ASSERT_EQ(r.exit_code, 0) << r.output;
    const Reference ref = numpy_reference(bad);
    for (const long slab_cells : {1L << 21, 60L}) {
      const SnapshotIntegrity mine = check(bad, slab_cells);
      expect_matches(mine, ref);
      EXPECT_FALSE(mine.sound()) << damage;
    }
  }
  const SnapshotIntegrity kicked = check(folder / "kick_face_x.h5", 60);
  EXPECT_GT(kicked.divergence, kicked.divergence_limit);
  const SnapshotIntegrity nan = check(folder / "nan_density.h5", 60);
  EXPECT_EQ(nan.non_finite, 1);
  EXPECT_EQ(nan.fields.front().non_finite, 1);
  fs::remove_all(folder);
}

TEST(SnapshotIntegrity, LimitsFollowThePrecision) {
  // Above the ~3ε that storing explains (3.6e-7 for float32, 6.7e-16 for float64).
  EXPECT_GT(brume::io::divergence_limit(true), 100 * 3 * 1.2e-7);
  EXPECT_GT(brume::io::divergence_limit(false), 100 * 3 * 2.3e-16);
  EXPECT_LT(brume::io::divergence_limit(false), brume::io::divergence_limit(true));
}
