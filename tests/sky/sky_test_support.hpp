// Boxes and maps for the sky-map tests: a whole box as one block's cell quantities, filled by a
// function of the cell, and a run context of one rank.
#pragma once

#include <mpi.h>

#include <array>
#include <cstddef>

#include "physics/cell_quantities.hpp"
#include "physics/run_context.hpp"

namespace brume::sky_testing {

struct CellValues {
  double density = 1.0;
  std::array<double, 3> field{};
};

// `fill(i, j, k)` returns the density and field of cell (i, j, k).
template <class Fill>
physics::CellQuantities whole_box(const std::array<int, 3>& cells,
                                  const std::array<double, 3>& size, Fill&& fill) {
  physics::CellQuantities q;
  q.cells = cells;
  q.box_cells = {cells[0], cells[1], cells[2]};
  for (std::size_t d = 0; d < 3; ++d)
    q.spacing[d] = size[d] / cells[d];
  const std::size_t n = std::size_t(cells[0]) * std::size_t(cells[1]) * std::size_t(cells[2]);
  q.density.resize(n);
  q.pressure.assign(n, 1.0);
  q.temperature.assign(n, 1.0);
  for (auto& v : q.velocity)
    v.assign(n, 0.0);
  for (auto& b : q.field)
    b.resize(n);
  for (int k = 0; k < cells[2]; ++k) {
    for (int j = 0; j < cells[1]; ++j) {
      for (int i = 0; i < cells[0]; ++i) {
        const CellValues c = fill(i, j, k);
        const std::size_t at = q.at(i, j, k);
        q.density[at] = c.density;
        for (std::size_t d = 0; d < 3; ++d)
          q.field[d][at] = c.field[d];
      }
    }
  }
  return q;
}

inline physics::RunContext one_rank(const std::array<int, 3>& cells,
                                    const std::array<double, 3>& size) {
  physics::RunContext c;
  c.box_cells = {cells[0], cells[1], cells[2]};
  c.box_size = size;
  c.comm = MPI_COMM_SELF;
  return c;
}

}  // namespace brume::sky_testing
