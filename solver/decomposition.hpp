// The 3D Cartesian decomposition of the box over MPI ranks: how many ranks along each axis, which
// block this rank owns, and the Cartesian communicator the halo exchange and reductions use.
//
// Every block has the same cell counts (the box's cells must divide evenly), so that a block's
// global offset is its Cartesian coordinate times its cell counts.
#pragma once

#include <mpi.h>

#include <array>
#include <stdexcept>
#include <string>

#include "solver/block_geometry.hpp"

namespace brume::solver {

// A decomposition that cannot be made (a user error: uneven division, wrong rank counts).
class DecompositionError : public std::runtime_error {
 public:
  using std::runtime_error::runtime_error;
};

// Ranks per axis for `ranks` ranks and a box of `cells`. A `requested` entry of 0 means "choose";
// all three 0 choose the factorization with the smallest halo surface per block (ties: more ranks
// along z, then y, whose faces are contiguous in memory). Blocks must hold at least `min_cells`
// cells along each active axis (the ghost depth) and an inactive axis (one cell) gets one rank.
// Throws DecompositionError with a message that names box.ranks or box.cells.
[[nodiscard]] std::array<int, 3> choose_ranks_per_axis(int ranks, const std::array<long, 3>& cells,
                                                       const std::array<int, 3>& requested,
                                                       int min_cells);

class Decomposition {
 public:
  // Collective over `comm`. `periodic[d]` makes the Cartesian topology wrap along d.
  Decomposition(MPI_Comm comm, const std::array<long, 3>& cells,
                const std::array<int, 3>& requested, const std::array<bool, 3>& periodic,
                int min_cells);
  ~Decomposition();
  Decomposition(const Decomposition&) = delete;
  Decomposition& operator=(const Decomposition&) = delete;

  [[nodiscard]] MPI_Comm comm() const { return cart_; }
  [[nodiscard]] int rank() const { return rank_; }
  [[nodiscard]] int size() const { return size_; }
  [[nodiscard]] const std::array<int, 3>& ranks_per_axis() const { return ranks_; }
  [[nodiscard]] const std::array<int, 3>& coords() const { return coords_; }
  [[nodiscard]] const std::array<long, 3>& box_cells() const { return box_cells_; }
  [[nodiscard]] const std::array<int, 3>& block_cells() const { return block_cells_; }
  [[nodiscard]] std::array<long, 3> offset() const;
  // Rank of the neighbour below (side 0) or above (side 1) along d; MPI_PROC_NULL at a
  // non-periodic box face; this rank itself when one rank spans a periodic axis.
  [[nodiscard]] int neighbour(int d, int side) const { return neighbours_[d][side]; }

  // This rank's block of the box whose geometry (as one block) is `whole_box`.
  [[nodiscard]] BlockGeometry block(const BlockGeometry& whole_box) const;

  // "2 × 1 × 2 blocks of 32 × 64 × 32 cells" for the run log.
  [[nodiscard]] std::string describe() const;

 private:
  MPI_Comm cart_ = MPI_COMM_NULL;
  int rank_ = 0;
  int size_ = 1;
  std::array<int, 3> ranks_{1, 1, 1};
  std::array<int, 3> coords_{0, 0, 0};
  std::array<long, 3> box_cells_{1, 1, 1};
  std::array<int, 3> block_cells_{1, 1, 1};
  std::array<std::array<int, 2>, 3> neighbours_{};
};

}  // namespace brume::solver
