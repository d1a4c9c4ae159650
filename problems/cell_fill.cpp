#include "problems/cell_fill.hpp"

namespace brume::problems {

void fill_cells(solver::State& state, double gamma, const PrimitiveProfile& profile) {
  const solver::BlockGeometry& g = state.geometry;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i) {
        const auto c = g.index(i, j, k);
        const PrimitiveCell w = profile(g.centre(0, i), g.centre(1, j), g.centre(2, k));
        state.density[c] = w.density;
        double kinetic = 0.0;
        for (int d = 0; d < 3; ++d) {
          state.momentum[d][c] = w.density * w.velocity[d];
          kinetic += 0.5 * w.density * w.velocity[d] * w.velocity[d];
        }
        if (state.isothermal) continue;
        double magnetic = 0.0;
        if (state.magnetic) {
          for (int d = 0; d < 3; ++d) {
            const double b = solver::cell_field(state, d, c);
            magnetic += 0.5 * b * b;
          }
        }
        state.energy[c] = w.pressure / (gamma - 1.0) + kinetic + magnetic;
      }
    }
  }
}

}  // namespace brume::problems
