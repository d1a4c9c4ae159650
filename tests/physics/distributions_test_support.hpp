// Synthetic cell quantities for the distributions and Jeans tests: every cell set to chosen
// values, on one rank (MPI_COMM_SELF), in code units of 1 pc, 1 km/s and 1 m_H cm^-3 (μ = 1).
#pragma once

#include <mpi.h>

#include <array>
#include <functional>

#include "physics/cell_quantities.hpp"
#include "physics/run_context.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics::testing {

// The cell's values in code units (temperature in K).
struct CellValues {
  double density = 1.0;
  std::array<double, 3> velocity{};
  std::array<double, 3> field{};
  double pressure = 1.0;
  double temperature = 1.0;
};

inline RunContext synthetic_context(const std::array<long, 3>& cells, bool magnetic) {
  RunContext c;
  c.code_units =
      units::code_units_from_number_density(units::cgs::parsec, units::cgs::kilometre, 1.0, 1.0);
  c.mean_molecular_weight = 1.0;
  c.magnetic = magnetic;
  c.box_cells = cells;
  c.box_size = {double(cells[0]), double(cells[1]), double(cells[2])};  // cells of 1 pc
  c.comm = MPI_COMM_SELF;
  return c;
}

// A block of `cells` whose first cell has global index `offset`; `value(i, j, k)` gives the
// values of the cell of global index (i, j, k).
inline CellQuantities synthetic_cells(const std::array<int, 3>& cells,
                                      const std::array<long, 3>& offset,
                                      const std::array<long, 3>& box_cells,
                                      const std::function<CellValues(long, long, long)>& value) {
  CellQuantities q;
  q.cells = cells;
  q.offset = offset;
  q.box_cells = box_cells;
  q.spacing = {1.0, 1.0, 1.0};
  const std::size_t n = std::size_t(cells[0]) * std::size_t(cells[1]) * std::size_t(cells[2]);
  q.density.resize(n);
  q.pressure.resize(n);
  q.temperature.resize(n);
  for (std::size_t d = 0; d < 3; ++d) {
    q.velocity[d].resize(n);
    q.field[d].resize(n);
  }
  for (int k = 0; k < cells[2]; ++k) {
    for (int j = 0; j < cells[1]; ++j) {
      for (int i = 0; i < cells[0]; ++i) {
        const std::size_t c = q.at(i, j, k);
        const CellValues v = value(offset[0] + i, offset[1] + j, offset[2] + k);
        q.density[c] = v.density;
        q.pressure[c] = v.pressure;
        q.temperature[c] = v.temperature;
        for (std::size_t d = 0; d < 3; ++d) {
          q.velocity[d][c] = v.velocity[d];
          q.field[d][c] = v.field[d];
        }
      }
    }
  }
  return q;
}

}  // namespace brume::physics::testing
