#include "physics/cell_quantities.hpp"

#include <algorithm>

namespace brume::physics {

CellQuantities cell_quantities(const solver::State& state, const RunContext& context) {
  CellQuantities q;
  fill_cell_quantities(state, context, q);
  return q;
}

void fill_cell_quantities(const solver::State& state, const RunContext& context,
                          CellQuantities& q) {
  const solver::BlockGeometry& g = state.geometry;
  q.cells = g.cells;
  q.offset = g.offset;
  q.box_cells = context.box_cells;
  q.spacing = g.spacing;
  const std::size_t n = std::size_t(g.cells[0]) * std::size_t(g.cells[1]) * std::size_t(g.cells[2]);
  q.density.resize(n);
  q.pressure.resize(n);
  q.temperature.resize(n);
  for (int d = 0; d < 3; ++d) {
    q.velocity[d].resize(n);
    q.field[d].resize(n);
    if (!state.magnetic) std::fill(q.field[d].begin(), q.field[d].end(), 0.0);
  }
  const double kelvin = context.code_units.temperature(context.mean_molecular_weight);
  const double c2 = context.sound_speed * context.sound_speed;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      const std::size_t out = q.at(0, j, k);
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        const double rho = state.density[std::size_t(c)];
        double kinetic = 0.0;
        double magnetic = 0.0;
        for (int d = 0; d < 3; ++d) {
          const double v = state.momentum[d][std::size_t(c)] / rho;
          q.velocity[d][out + std::size_t(i)] = v;
          kinetic += rho * v * v;
          if (state.magnetic) {
            const double b = solver::cell_field(state, d, c);
            q.field[d][out + std::size_t(i)] = b;
            magnetic += b * b;
          }
        }
        const double p = state.isothermal ? c2 * rho
                                          : (context.gamma - 1.0) * (state.energy[std::size_t(c)] -
                                                                     0.5 * (kinetic + magnetic));
        q.density[out + std::size_t(i)] = rho;
        q.pressure[out + std::size_t(i)] = p;
        q.temperature[out + std::size_t(i)] = p / rho * kelvin;
      }
    }
  }
}

}  // namespace brume::physics
