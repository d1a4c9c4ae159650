// Synthetic blocks for the spectra tests: physics::CellQuantities of one block [lower, upper) of
// a periodic box whose density, velocity and field are given functions of the global cell index,
// so that the same box can be cut into any blocks for any rank layout.
#pragma once

#include <array>
#include <cstdint>

#include "physics/cell_quantities.hpp"
#include "physics/run_context.hpp"

namespace brume::testing {

struct SpectraCell {
  double density = 1.0;
  std::array<double, 3> velocity{};
  std::array<double, 3> field{};
};

template <class CellFunction>
physics::CellQuantities spectra_block(const std::array<long, 3>& box,
                                      const std::array<long, 3>& lower,
                                      const std::array<long, 3>& upper, CellFunction cell) {
  physics::CellQuantities q;
  q.box_cells = box;
  for (std::size_t d = 0; d < 3; ++d) {
    q.cells[d] = int(upper[d] - lower[d]);
    q.offset[d] = lower[d];
    q.spacing[d] = 1.0 / double(box[d]);
  }
  const std::size_t n = std::size_t(q.cells[0]) * std::size_t(q.cells[1]) * std::size_t(q.cells[2]);
  q.density.resize(n);
  q.pressure.assign(n, 1.0);
  q.temperature.assign(n, 1.0);
  for (std::size_t d = 0; d < 3; ++d) {
    q.velocity[d].resize(n);
    q.field[d].resize(n);
  }
  for (int k = 0; k < q.cells[2]; ++k) {
    for (int j = 0; j < q.cells[1]; ++j) {
      for (int i = 0; i < q.cells[0]; ++i) {
        const SpectraCell c = cell(lower[0] + i, lower[1] + j, lower[2] + k);
        const std::size_t at = q.at(i, j, k);
        q.density[at] = c.density;
        for (std::size_t d = 0; d < 3; ++d) {
          q.velocity[d][at] = c.velocity[d];
          q.field[d][at] = c.field[d];
        }
      }
    }
  }
  return q;
}

// The whole box as one block.
template <class CellFunction>
physics::CellQuantities spectra_box(const std::array<long, 3>& box, CellFunction cell) {
  return spectra_block(box, {0, 0, 0}, box, cell);
}

// A context for a box of unit code lengths (or `size`) on `comm`, code units 1.
inline physics::RunContext spectra_context(const std::array<long, 3>& box, MPI_Comm comm,
                                           const std::array<double, 3>& size = {1.0, 1.0, 1.0}) {
  physics::RunContext c;
  c.box_cells = box;
  c.box_size = size;
  c.magnetic = true;
  c.comm = comm;
  return c;
}

// A uniform number in [-1, 1) from a cell index and a stream: the splitmix64 output function
// (Steele, Lea & Flood 2014, OOPSLA, "Fast splittable pseudorandom number generators" — from
// memory) applied to a mix of the indices.
inline double cell_noise(long i, long j, long k, std::uint64_t stream) {
  std::uint64_t z = std::uint64_t(i) + 0x10000ULL * std::uint64_t(j) +
                    0x100000000ULL * std::uint64_t(k) + 0x1000000000000ULL * stream;
  z += 0x9E3779B97F4A7C15ULL;
  z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
  z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
  z ^= z >> 31;
  return double(z >> 11) * 0x1p-52 - 1.0;
}

// White noise in every field (density 1 ± 0.6, so positive), with Nyquist content on every axis.
inline SpectraCell noisy_cell(long i, long j, long k) {
  SpectraCell c;
  c.density = 1.0 + 0.6 * cell_noise(i, j, k, 0);
  for (std::size_t d = 0; d < 3; ++d) {
    c.velocity[d] = 0.3 + cell_noise(i, j, k, 1 + d);
    c.field[d] = 0.5 * cell_noise(i, j, k, 4 + d);
  }
  return c;
}

}  // namespace brume::testing
