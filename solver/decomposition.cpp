#include "solver/decomposition.hpp"

#include <limits>
#include <tuple>

namespace brume::solver {

namespace {

const char* const axis_names[3] = {"x", "y", "z"};

template <class T>
std::string triple(const std::array<T, 3>& v) {
  return "[" + std::to_string(v[0]) + ", " + std::to_string(v[1]) + ", " + std::to_string(v[2]) +
         "]";
}

// Why `ranks` per axis does not fit `cells`, or an empty string when it does.
std::string misfit(const std::array<int, 3>& ranks, const std::array<long, 3>& cells,
                   int min_cells) {
  for (int d = 0; d < 3; ++d) {
    const std::string axis = axis_names[d];
    if (cells[d] == 1 && ranks[d] > 1) {
      return "box.cells has 1 cell along " + axis + ", which cannot be split over " +
             std::to_string(ranks[d]) + " ranks";
    }
    if (cells[d] % ranks[d] != 0) {
      return std::to_string(cells[d]) + " cells along " + axis + " do not divide evenly over " +
             std::to_string(ranks[d]) + " ranks";
    }
    if (cells[d] > 1 && cells[d] / ranks[d] < min_cells) {
      return std::to_string(ranks[d]) + " ranks along " + axis + " leave " +
             std::to_string(cells[d] / ranks[d]) + " cells per block, fewer than the " +
             std::to_string(min_cells) + " the scheme's ghost layers need";
    }
  }
  return {};
}

// Cells on the faces a block exchanges with other ranks (axes with more than one rank).
long halo_surface(const std::array<int, 3>& ranks, const std::array<long, 3>& cells) {
  long surface = 0;
  for (int d = 0; d < 3; ++d) {
    if (ranks[d] == 1) continue;
    long area = 1;
    for (int e = 0; e < 3; ++e) {
      if (e != d) area *= cells[e] / ranks[e];
    }
    surface += 2 * area;
  }
  return surface;
}

}  // namespace

std::array<int, 3> choose_ranks_per_axis(int ranks, const std::array<long, 3>& cells,
                                         const std::array<int, 3>& requested, int min_cells) {
  if (ranks < 1) throw DecompositionError("decomposition: need at least one rank");
  long fixed = 1;
  bool all_fixed = true;
  for (int d = 0; d < 3; ++d) {
    if (requested[d] < 0) {
      throw DecompositionError("box.ranks " + triple(requested) +
                               ": ranks per axis must be positive, or 0 to choose");
    }
    if (requested[d] > 0) fixed *= requested[d];
    all_fixed = all_fixed && requested[d] > 0;
  }
  if ((all_fixed && fixed != ranks) || (!all_fixed && ranks % fixed != 0)) {
    throw DecompositionError("box.ranks " + triple(requested) + " asks for " +
                             (all_fixed ? "" : "a multiple of ") + std::to_string(fixed) +
                             " ranks but brume runs on " + std::to_string(ranks) +
                             "; give ranks per axis whose product is " + std::to_string(ranks) +
                             ", or [0, 0, 0] to choose them automatically");
  }
  std::array<int, 3> best{0, 0, 0};
  auto best_key = std::make_tuple(std::numeric_limits<long>::max(), 0, 0);
  std::string first_misfit;
  for (int px = 1; px <= ranks; ++px) {
    if (ranks % px != 0 || (requested[0] > 0 && px != requested[0])) continue;
    for (int py = 1; py <= ranks / px; ++py) {
      if ((ranks / px) % py != 0 || (requested[1] > 0 && py != requested[1])) continue;
      const int pz = ranks / px / py;
      if (requested[2] > 0 && pz != requested[2]) continue;
      const std::array<int, 3> candidate{px, py, pz};
      const std::string why = misfit(candidate, cells, min_cells);
      if (!why.empty()) {
        if (first_misfit.empty()) first_misfit = why;
        continue;
      }
      const auto key = std::make_tuple(halo_surface(candidate, cells), -pz, -py);
      if (key < best_key) {
        best_key = key;
        best = candidate;
      }
    }
  }
  if (best[0] == 0) {
    if (all_fixed) {
      throw DecompositionError("box.ranks " + triple(requested) + " does not fit box.cells " +
                               triple(cells) + ": " + first_misfit);
    }
    throw DecompositionError(
        "box.cells " + triple(cells) + " cannot be split evenly over " + std::to_string(ranks) +
        " ranks (for example: " + first_misfit +
        "); choose cell counts divisible by the ranks per axis, another rank count, or box.ranks");
  }
  return best;
}

Decomposition::Decomposition(MPI_Comm comm, const std::array<long, 3>& cells,
                             const std::array<int, 3>& requested,
                             const std::array<bool, 3>& periodic, int min_cells)
    : box_cells_(cells) {
  int size = 1;
  MPI_Comm_size(comm, &size);
  ranks_ = choose_ranks_per_axis(size, cells, requested, min_cells);
  int periods[3];
  for (int d = 0; d < 3; ++d) {
    periods[d] = periodic[d] ? 1 : 0;
    block_cells_[d] = static_cast<int>(cells[d] / ranks_[d]);
  }
  // No reordering: rank 0 of `comm` stays rank 0 (it writes the files).
  MPI_Cart_create(comm, 3, ranks_.data(), periods, 0, &cart_);
  MPI_Comm_rank(cart_, &rank_);
  MPI_Comm_size(cart_, &size_);
  MPI_Cart_coords(cart_, rank_, 3, coords_.data());
  for (int d = 0; d < 3; ++d) {
    MPI_Cart_shift(cart_, d, 1, &neighbours_[d][0], &neighbours_[d][1]);
  }
}

Decomposition::~Decomposition() {
  if (cart_ != MPI_COMM_NULL) MPI_Comm_free(&cart_);
}

std::array<long, 3> Decomposition::offset() const {
  return {long(coords_[0]) * block_cells_[0], long(coords_[1]) * block_cells_[1],
          long(coords_[2]) * block_cells_[2]};
}

BlockGeometry Decomposition::block(const BlockGeometry& whole_box) const {
  BlockGeometry g = whole_box;
  g.cells = block_cells_;
  g.offset = offset();
  for (int d = 0; d < 3; ++d) {
    g.lower[d] = whole_box.lower[d] + static_cast<double>(g.offset[d]) * whole_box.spacing[d];
  }
  return g;
}

std::string Decomposition::describe() const {
  return std::to_string(ranks_[0]) + " × " + std::to_string(ranks_[1]) + " × " +
         std::to_string(ranks_[2]) + " blocks of " + std::to_string(block_cells_[0]) + " × " +
         std::to_string(block_cells_[1]) + " × " + std::to_string(block_cells_[2]) + " cells";
}

}  // namespace brume::solver
