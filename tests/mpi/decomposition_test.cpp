// The decomposition: ranks per axis chosen to keep the halo small, user errors for impossible
// requests, and the blocks of a Cartesian communicator tiling the box. Common practice, no source.
#include <gtest/gtest.h>

#include <set>
#include <tuple>

#include "solver/decomposition.hpp"
#include "tests/mpi/sub_communicator.hpp"

namespace brume::mpi_testing {
namespace {

using solver::choose_ranks_per_axis;
using solver::DecompositionError;
using Ranks = std::array<int, 3>;

// The message of the error the call throws, or "no error".
template <class Call>
std::string error_of(Call&& call) {
  try {
    call();
  } catch (const DecompositionError& error) {
    return error.what();
  }
  return "no error";
}

TEST(MpiDecomposition, AutomaticChoiceMinimizesTheHaloSurface) {
  // A cube on 8 ranks: a split over two or three axes exchanges 6144 cells per block (e.g.
  // 2 × 2 × 2: 3 · 2 · 32²), over one axis 8192 (2 · 64²); of the ties, most ranks along z, then y.
  EXPECT_EQ(choose_ranks_per_axis(8, {64, 64, 64}, {0, 0, 0}, 2), (Ranks{1, 2, 4}));
  // A long box is cut across its long axis.
  EXPECT_EQ(choose_ranks_per_axis(4, {256, 32, 32}, {0, 0, 0}, 2), (Ranks{4, 1, 1}));
  // Equal surfaces: more ranks along z, whose faces are contiguous.
  EXPECT_EQ(choose_ranks_per_axis(2, {32, 32, 32}, {0, 0, 0}, 2), (Ranks{1, 1, 2}));
  // One rank: nothing to cut.
  EXPECT_EQ(choose_ranks_per_axis(1, {17, 5, 1}, {0, 0, 0}, 2), (Ranks{1, 1, 1}));
  // A 2D box (one cell along z) is never cut along z.
  EXPECT_EQ(choose_ranks_per_axis(4, {64, 64, 1}, {0, 0, 0}, 2)[2], 1);
  // An uneven axis is avoided when another split fits.
  EXPECT_EQ(choose_ranks_per_axis(2, {30, 31, 31}, {0, 0, 0}, 2), (Ranks{2, 1, 1}));
}

TEST(MpiDecomposition, RequestedRanksAreKeptOrCompleted) {
  EXPECT_EQ(choose_ranks_per_axis(4, {64, 64, 64}, {4, 1, 1}, 2), (Ranks{4, 1, 1}));
  EXPECT_EQ(choose_ranks_per_axis(8, {64, 64, 64}, {1, 0, 0}, 2), (Ranks{1, 2, 4}));
}

TEST(MpiDecomposition, ImpossibleRequestsAreUserErrors) {
  EXPECT_EQ(error_of([] {
              (void)choose_ranks_per_axis(2, {16, 16, 16}, {3, 1, 1}, 2);
            }),
            "box.ranks [3, 1, 1] asks for 3 ranks but brume runs on 2; give ranks per axis whose "
            "product is 2, or [0, 0, 0] to choose them automatically");
  EXPECT_EQ(error_of([] {
              (void)choose_ranks_per_axis(6, {16, 16, 16}, {4, 0, 0}, 2);
            }),
            "box.ranks [4, 0, 0] asks for a multiple of 4 ranks but brume runs on 6; give ranks "
            "per axis whose product is 6, or [0, 0, 0] to choose them automatically");
  EXPECT_EQ(error_of([] {
              (void)choose_ranks_per_axis(2, {15, 16, 16}, {2, 1, 1}, 2);
            }),
            "box.ranks [2, 1, 1] does not fit box.cells [15, 16, 16]: 15 cells along x do not "
            "divide evenly over 2 ranks");
  EXPECT_EQ(error_of([] {
              (void)choose_ranks_per_axis(8, {16, 16, 16}, {8, 1, 1}, 3);
            }),
            "box.ranks [8, 1, 1] does not fit box.cells [16, 16, 16]: 8 ranks along x leave 2 "
            "cells per block, fewer than the 3 the scheme's ghost layers need");
  EXPECT_EQ(error_of([] {
              (void)choose_ranks_per_axis(2, {16, 16, 1}, {1, 1, 2}, 2);
            }),
            "box.ranks [1, 1, 2] does not fit box.cells [16, 16, 1]: box.cells has 1 cell along "
            "z, which cannot be split over 2 ranks");
  const std::string automatic = error_of([] {
    (void)choose_ranks_per_axis(4, {15, 15, 15}, {0, 0, 0}, 2);
  });
  EXPECT_EQ(automatic.rfind("box.cells [15, 15, 15] cannot be split evenly over 4 ranks", 0), 0U)
      << automatic;
  EXPECT_NE(error_of([] {
              (void)choose_ranks_per_axis(2, {16, 16, 16}, {-1, 0, 0}, 2);
            }),
            "no error");
}

// On every rank count up to the world's: the blocks tile the box once, neighbours agree.
TEST(MpiDecomposition, BlocksTileTheBoxAndNeighboursAgree) {
  for (int ranks = 1; ranks <= world_size(); ++ranks) {
    SubCommunicator sub(ranks);
    if (!sub.member()) continue;
    const std::array<long, 3> cells{12, 8, 6};
    const solver::Decomposition decomposition(sub.comm(), cells, {0, 0, 0}, {true, false, true}, 2);
    const auto offset = decomposition.offset();
    // Every block's offset, gathered: distinct and on the block lattice.
    long mine[3] = {offset[0], offset[1], offset[2]};
    std::vector<long> all(std::size_t(3 * ranks));
    MPI_Allgather(mine, 3, MPI_LONG, all.data(), 3, MPI_LONG, decomposition.comm());
    std::set<std::tuple<long, long, long>> distinct;
    for (int r = 0; r < ranks; ++r) {
      distinct.insert(
          {all[std::size_t(3 * r)], all[std::size_t(3 * r + 1)], all[std::size_t(3 * r + 2)]});
      for (int d = 0; d < 3; ++d) {
        const long o = all[std::size_t(3 * r + d)];
        EXPECT_EQ(o % decomposition.block_cells()[d], 0);
        EXPECT_LT(o, cells[d]);
      }
    }
    EXPECT_EQ(distinct.size(), std::size_t(ranks));
    // My upper neighbour's lower neighbour is me; y is not periodic: no neighbour past the box.
    for (int d = 0; d < 3; ++d) {
      const int up = decomposition.neighbour(d, 1);
      int back = MPI_PROC_NULL;
      int send = decomposition.rank();
      MPI_Sendrecv(&send, 1, MPI_INT, up, 0, &back, 1, MPI_INT, decomposition.neighbour(d, 0), 0,
                   decomposition.comm(), MPI_STATUS_IGNORE);
      if (decomposition.neighbour(d, 0) != MPI_PROC_NULL) {
        EXPECT_EQ(back, decomposition.neighbour(d, 0));
      }
    }
    if (decomposition.coords()[1] == 0) {
      EXPECT_EQ(decomposition.neighbour(1, 0), MPI_PROC_NULL);
    }
  }
}

}  // namespace
}  // namespace brume::mpi_testing
