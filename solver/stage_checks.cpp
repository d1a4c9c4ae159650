#include "solver/stage_checks.hpp"

namespace brume::solver {

NumericalFailure find_non_finite(const State& s) {
  const BlockGeometry& g = s.geometry;
  NumericalFailure f;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      bool bad = false;
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        const double e = s.isothermal ? 0.0 : s.energy[c];
        bad |= !std::isfinite(s.density[c] + s.momentum[0][c] + s.momentum[1][c] +
                              s.momentum[2][c] + e);
      }
      if (!bad) continue;
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        const double e = s.isothermal ? 0.0 : s.energy[c];
        const bool finite = std::isfinite(s.density[c]) && std::isfinite(s.momentum[0][c]) &&
                            std::isfinite(s.momentum[1][c]) && std::isfinite(s.momentum[2][c]) &&
                            std::isfinite(e);
        if (finite) continue;
        f.occurred = true;
        f.cell = {g.offset[0] + i, g.offset[1] + j, g.offset[2] + k};
        f.density = s.density[c];
        f.momentum = {s.momentum[0][c], s.momentum[1][c], s.momentum[2][c]};
        f.energy = e;
        return f;
      }
    }
  }
  return f;
}

}  // namespace brume::solver
