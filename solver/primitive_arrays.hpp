// Primitive variables of every stored cell (interior and ghosts) of a state.
#pragma once

#include <cstddef>

#include "solver/cell_view.hpp"
#include "solver/primitive.hpp"
#include "solver/stage_checks.hpp"
#include "solver/stage_scratch.hpp"
#include "solver/state.hpp"

namespace brume::solver {

template <class Eos, bool Magnetic>
void compute_primitives(const State& s, const Eos& eos, PrimitiveArrays& w) {
  const BlockGeometry& g = s.geometry;
  const CellView<Magnetic> u(s);
  double* vx = w.velocity[0].data();
  double* vy = w.velocity[1].data();
  double* vz = w.velocity[2].data();
  double* p = w.pressure.data();
  const int i0 = -g.ghosts(0), i1 = g.cells[0] + g.ghosts(0);
  for (int k = -g.ghosts(2); k < g.cells[2] + g.ghosts(2); ++k) {
    for (int j = -g.ghosts(1); j < g.cells[1] + g.ghosts(1); ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
#pragma GCC ivdep
      for (int i = i0; i < i1; ++i) {
        const std::ptrdiff_t c = row + i;
        const double rho = u.rho[c];
        const double inv = 1.0 / rho;
        vx[c] = u.mx[c] * inv;
        vy[c] = u.my[c] * inv;
        vz[c] = u.mz[c] * inv;
        if constexpr (!Eos::isothermal) p[c] = u.pressure(c, eos);
      }
    }
  }
}

}  // namespace brume::solver
