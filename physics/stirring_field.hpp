// The stirring acceleration on the interior cells of one block, a(x) = Σ_m 2 Re[â_m e^{i k_m·x}],
// summed directly over the modes (no FFT) with separable phase tables e^{i k_x x}, e^{i k_y y},
// e^{i k_z z} computed once per block from global cell indices, so that a cell gets the same
// bits in every decomposition.
//
// Per row (j, k) the modes are first gathered by their n_x, C_{n_x} = Σ â_m e^{i k_y y} e^{i k_z
// z}, so that the innermost loop over i sums only n_max + 1 terms per cell (unit stride, no
// branch).
#pragma once

#include <array>
#include <vector>

#include "physics/stirring_modes.hpp"
#include "solver/block_geometry.hpp"

namespace brume::physics {

class StirringField {
 public:
  // box_cells: the cells of the whole box (the phase of cell g along d is 2π n (g + ½) / N_d).
  StirringField(const std::vector<StirringMode>& modes, const solver::BlockGeometry& block,
                const std::array<long, 3>& box_cells);

  // Fills acceleration(d) with a_d at every interior cell, i fastest (compact interior layout,
  // not the block's storage layout). amplitudes: as StirringProcess::amplitudes().
  void evaluate(const std::vector<double>& amplitudes);

  [[nodiscard]] const std::vector<double>& acceleration(int d) const {
    return acceleration_[std::size_t(d)];
  }

 private:
  // re/im of e^{2πi n (g + ½)/N} for n in [−reach, reach] and the block's cells along one axis:
  // [(n + reach) · cells + i].
  struct PhaseTable {
    int reach = 0;
    int cells = 1;
    std::vector<double> re, im;
  };
  static PhaseTable phase_table(int reach, int cells, long offset, long box_cells);

  std::array<int, 3> cells_{};
  int highest_x_ = 0;
  std::vector<int> mode_nx_, mode_ny_, mode_nz_;
  std::array<PhaseTable, 3> phases_;
  std::array<std::vector<double>, 3> acceleration_;
  std::vector<double> gathered_;  // 6 per n_x: Re, Im of C_{n_x} for x, y, z
};

}  // namespace brume::physics
