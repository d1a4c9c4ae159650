// The spectra of one box cut into blocks for 1, 2 and 4 ranks in different layouts, uneven
// blocks, and FFTW slabs that leave a rank without planes: the same spectra to round-off, the
// same mode counts exactly. The reference is the one-rank result (no other source needed: the
// check is that the decomposition does not matter).
#include <gtest/gtest.h>

#include <algorithm>
#include <array>
#include <cmath>
#include <cstring>
#include <string>
#include <vector>

#include "physics/spectra_diagnostic.hpp"
#include "solver/distributed_fft.hpp"
#include "tests/mpi/sub_communicator.hpp"
#include "tests/support/spectra_synthetic_cells.hpp"

namespace brume::mpi_testing {
namespace {

// Block edges along x, y and z; rank r holds block (r mod px, (r / px) mod py, r / (px py)).
using Layout = std::array<std::vector<long>, 3>;

// 16 × 12 × 6 cells in a unit cube: FFTW gives 4 ranks slabs of 2, 2, 2 and 0 planes.
constexpr std::array<long, 3> box = {16, 12, 6};

physics::CellQuantities block_of(const Layout& layout, int rank) {
  const std::array<int, 3> blocks = {int(layout[0].size()) - 1, int(layout[1].size()) - 1,
                                     int(layout[2].size()) - 1};
  const std::array<int, 3> at = {rank % blocks[0], (rank / blocks[0]) % blocks[1],
                                 rank / (blocks[0] * blocks[1])};
  std::array<long, 3> lower{}, upper{};
  for (std::size_t d = 0; d < 3; ++d) {
    lower[d] = layout[d][std::size_t(at[d])];
    upper[d] = layout[d][std::size_t(at[d]) + 1];
  }
  return testing::spectra_block(box, lower, upper, testing::noisy_cell);
}

io::Measurement measured(const physics::SpectraDiagnostic& spectra, const Layout& layout,
                         MPI_Comm comm) {
  int rank = 0;
  MPI_Comm_rank(comm, &rank);
  return spectra.measure(block_of(layout, rank), testing::spectra_context(box, comm));
}

// Each value within 1e-12 of the array's largest magnitude: a different slab split changes only
// the order of the sums of ~10³ terms per shell and the FFT's butterflies (≈ 1e-15 each).
void expect_same(const io::Measurement& m, const io::Measurement& reference,
                 const std::string& what) {
  ASSERT_EQ(m.arrays.size(), reference.arrays.size()) << what;
  for (std::size_t a = 0; a < m.arrays.size(); ++a) {
    const io::MeasuredArray& x = m.arrays[a];
    const io::MeasuredArray& r = reference.arrays[a];
    ASSERT_EQ(x.name, r.name) << what;
    ASSERT_EQ(x.values.size(), r.values.size()) << what << " " << x.name;
    double scale = 0.0;
    for (const double v : r.values)
      if (std::isfinite(v)) scale = std::max(scale, std::abs(v));
    for (std::size_t s = 0; s < x.values.size(); ++s) {
      if (std::isnan(r.values[s])) {
        EXPECT_TRUE(std::isnan(x.values[s])) << what << " " << x.name << "[" << s << "]";
      } else if (x.name == "mode_count" || x.name == "wavenumber") {
        EXPECT_EQ(x.values[s], r.values[s]) << what << " " << x.name << "[" << s << "]";
      } else {
        EXPECT_NEAR(x.values[s], r.values[s], 1e-12 * scale)
            << what << " " << x.name << "[" << s << "]";
      }
    }
  }
  ASSERT_EQ(m.numbers.size(), reference.numbers.size());
  for (std::size_t n = 0; n < m.numbers.size(); ++n) {
    EXPECT_NEAR(m.numbers[n].value, reference.numbers[n].value,
                1e-12 * std::abs(reference.numbers[n].value))
        << what << " " << m.numbers[n].name;
  }
}

TEST(MpiSpectra, SameSpectraForEveryRankCountAndLayout) {
  const Layout whole = {{{0, 16}, {0, 12}, {0, 6}}};
  const std::vector<std::pair<int, Layout>> layouts = {
      {2, {{{0, 5, 16}, {0, 12}, {0, 6}}}},       {2, {{{0, 16}, {0, 12}, {0, 1, 6}}}},
      {2, {{{0, 16}, {0, 7, 12}, {0, 6}}}},       {4, {{{0, 9, 16}, {0, 7, 12}, {0, 6}}}},
      {4, {{{0, 16}, {0, 12}, {0, 1, 2, 5, 6}}}}, {4, {{{0, 16}, {0, 3, 4, 10, 12}, {0, 6}}}},
      {4, {{{0, 2, 8, 9, 16}, {0, 12}, {0, 6}}}}, {4, {{{0, 8, 16}, {0, 12}, {0, 4, 6}}}},
  };
  io::Measurement reference;
  {
    SubCommunicator one(1);
    if (one.member()) {
      const physics::SpectraDiagnostic spectra(physics::SpectraFields{});
      reference = measured(spectra, whole, one.comm());
      // The plan is kept: a second measurement gives the same bits.
      const io::Measurement again = measured(spectra, whole, one.comm());
      for (std::size_t a = 0; a < again.arrays.size(); ++a) {
        const std::vector<double>& x = again.arrays[a].values;
        const std::vector<double>& r = reference.arrays[a].values;
        ASSERT_EQ(x.size(), r.size());
        EXPECT_EQ(std::memcmp(x.data(), r.data(), x.size() * sizeof(double)), 0)
            << again.arrays[a].name;
      }
    }
  }
  // Only world rank 0, rank 0 of every sub-communicator, holds and compares the reference.
  if (world_rank() == 0) {
    EXPECT_GT(reference.arrays.size(), 5u);
  }
  for (std::size_t i = 0; i < layouts.size(); ++i) {
    const auto& [ranks, layout] = layouts[i];
    if (ranks > world_size()) continue;
    SubCommunicator sub(ranks);
    if (!sub.member()) continue;
    const physics::SpectraDiagnostic spectra(physics::SpectraFields{});
    const io::Measurement m = measured(spectra, layout, sub.comm());
    if (world_rank() == 0) expect_same(m, reference, "layout " + std::to_string(i));
  }
}

// Blocks that leave a hole are refused on every rank (not a hang or a wrong spectrum).
TEST(MpiSpectra, BlocksThatDoNotTileAreRefused) {
  SubCommunicator two(2);
  if (!two.member()) return;
  int rank = 0;
  MPI_Comm_rank(two.comm(), &rank);
  const std::array<long, 3> offset = {rank == 0 ? 0L : 9L, 0, 0};
  const std::array<int, 3> cells = {rank == 0 ? 8 : 7, 12, 6};  // x 0–7 and 9–15: a gap at 8
  EXPECT_THROW(solver::DistributedFft(two.comm(), box, offset, cells, 1), std::invalid_argument);
}

}  // namespace
}  // namespace brume::mpi_testing
