// Primitive variables of every stored cell (interior and ghosts) of a state.
#pragma once

#include <cstddef>

#include "solver/primitive.hpp"
#include "solver/stage_checks.hpp"
#include "solver/stage_scratch.hpp"
#include "solver/state.hpp"

namespace brume::solver {

template <class Eos, bool Magnetic>
void compute_primitives(const State& s, const Eos& eos, PrimitiveArrays& w) {
  const BlockGeometry& g = s.geometry;
  const double* rho = s.density.data();
  const double* mx = s.momentum[0].data();
  const double* my = s.momentum[1].data();
  const double* mz = s.momentum[2].data();
  const double* en = s.energy.data();
  double* wr = w.density.data();
  double* vx = w.velocity[0].data();
  double* vy = w.velocity[1].data();
  double* vz = w.velocity[2].data();
  double* p = w.pressure.data();
  for (int k = -g.ghosts(2); k < g.cells[2] + g.ghosts(2); ++k) {
    for (int j = -g.ghosts(1); j < g.cells[1] + g.ghosts(1); ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (int i = -g.ghosts(0); i < g.cells[0] + g.ghosts(0); ++i) {
        const std::ptrdiff_t c = row + i;
        const double inv = 1.0 / rho[c];
        wr[c] = rho[c];
        vx[c] = mx[c] * inv;
        vy[c] = my[c] * inv;
        vz[c] = mz[c] * inv;
        if constexpr (!Eos::isothermal) {
          p[c] = pressure_from_conserved(rho[c], mx[c], my[c], mz[c], en[c],
                                         cell_field_sq<Magnetic>(s, c), eos);
        }
      }
    }
  }
}

}  // namespace brume::solver
