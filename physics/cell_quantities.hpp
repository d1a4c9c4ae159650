// The primitive quantities of a block's interior cells, derived once per measurement and shared by
// every diagnostic: density, velocity, cell-centred field (face average), pressure and
// temperature. Flat arrays over the interior only, i fastest, code units (temperature in K).
#pragma once

#include <array>
#include <cstddef>
#include <vector>

#include "physics/run_context.hpp"
#include "solver/state.hpp"

namespace brume::physics {

struct CellQuantities {
  std::array<int, 3> cells{};    // interior cells of this block
  std::array<long, 3> offset{};  // global index of the first interior cell
  std::array<long, 3> box_cells{};
  std::array<double, 3> spacing{};  // cell size, code units
  std::vector<double> density;
  std::array<std::vector<double>, 3> velocity;
  std::array<std::vector<double>, 3> field;  // zero-filled for hydrodynamics
  std::vector<double> pressure;              // gas pressure (c_s² ρ when isothermal)
  std::vector<double> temperature;           // K, from p = n k_B T with the run's μ

  [[nodiscard]] std::size_t size() const { return density.size(); }
  // Flat index of interior cell (i, j, k) of this block.
  [[nodiscard]] std::size_t at(int i, int j, int k) const {
    return (std::size_t(k) * std::size_t(cells[1]) + std::size_t(j)) * std::size_t(cells[0]) +
           std::size_t(i);
  }
};

[[nodiscard]] CellQuantities cell_quantities(const solver::State& state, const RunContext& context);
// The same into `q`, reusing its storage (for measurements every few steps).
void fill_cell_quantities(const solver::State& state, const RunContext& context, CellQuantities& q);

}  // namespace brume::physics
