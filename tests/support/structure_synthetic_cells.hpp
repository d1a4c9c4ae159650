// Synthetic blocks for the structure-function tests: one rank's physics::CellQuantities of a
// periodic box whose density, velocity and temperature are given functions of the global cell
// index, so that the same box can be cut into blocks for any rank layout.
#pragma once

#include <array>
#include <cstdint>

#include "physics/cell_quantities.hpp"

namespace brume::testing {

struct SyntheticCell {
  double density = 1.0;
  std::array<double, 3> velocity{};
  double temperature = 1e4;
};

// Block `coords` of a box of `box` cells cut into `ranks` blocks per axis, spacing `spacing`.
// `cell(i, j, k)` with global indices returns a SyntheticCell.
template <class CellFunction>
physics::CellQuantities synthetic_block(const std::array<long, 3>& box,
                                        const std::array<int, 3>& ranks,
                                        const std::array<int, 3>& coords, double spacing,
                                        CellFunction cell) {
  physics::CellQuantities q;
  q.box_cells = box;
  for (std::size_t d = 0; d < 3; ++d) {
    q.cells[d] = int(box[d] / ranks[d]);
    q.offset[d] = long(coords[d]) * q.cells[d];
    q.spacing[d] = spacing;
  }
  const std::size_t n = std::size_t(q.cells[0]) * std::size_t(q.cells[1]) * std::size_t(q.cells[2]);
  q.density.resize(n);
  q.pressure.assign(n, 1.0);
  q.temperature.resize(n);
  for (std::size_t d = 0; d < 3; ++d) {
    q.velocity[d].resize(n);
    q.field[d].assign(n, 0.0);
  }
  for (int k = 0; k < q.cells[2]; ++k) {
    for (int j = 0; j < q.cells[1]; ++j) {
      for (int i = 0; i < q.cells[0]; ++i) {
        const SyntheticCell c = cell(q.offset[0] + i, q.offset[1] + j, q.offset[2] + k);
        const std::size_t at = q.at(i, j, k);
        q.density[at] = c.density;
        q.temperature[at] = c.temperature;
        for (std::size_t d = 0; d < 3; ++d)
          q.velocity[d][at] = c.velocity[d];
      }
    }
  }
  return q;
}

// Block coordinates of `rank` in a layout of `ranks` blocks per axis, x fastest.
inline std::array<int, 3> block_coords(int rank, const std::array<int, 3>& ranks) {
  return {rank % ranks[0], (rank / ranks[0]) % ranks[1], rank / (ranks[0] * ranks[1])};
}

// A uniform number in [-1, 1) from a cell index and a stream (splitmix64 finalizer: Steele,
// Lea & Flood 2014, OOPSLA, "Fast splittable pseudorandom number generators" — from memory).
inline double hashed_uniform(long i, long j, long k, std::uint64_t stream) {
  std::uint64_t z = (std::uint64_t(i) * 0x9E3779B97F4A7C15ULL) ^
                    (std::uint64_t(j) * 0xC2B2AE3D27D4EB4FULL) ^
                    (std::uint64_t(k) * 0x165667B19E3779F9ULL) ^ (stream * 0xD6E8FEB86659FD93ULL);
  z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
  z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
  z ^= z >> 31;
  return double(z >> 11) * 0x1p-52 - 1.0;
}

}  // namespace brume::testing
