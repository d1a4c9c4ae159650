// Ghost filling for a plane-parallel problem along the diagonal of a 2D x–y grid with Δx = Δy:
// the solution depends on i + j only, so q(i, j) = q(i + 1, j − 1). The y ghosts are therefore
// the other end of the box shifted by ny cells in x ("shifted periodic"); the x ends are outflow,
// which is exact while the waves stay away from them (the states there are uniform).
#pragma once

#include <algorithm>
#include <cstddef>

#include "solver/box_boundaries.hpp"

namespace brume::shocks {

class DiagonalGhostFiller final : public solver::GhostFiller {
 public:
  void fill(solver::State& s) const override {
    const solver::BlockGeometry& g = s.geometry;
    auto both_axes = [&](double* q, bool x_staggered, bool y_staggered) {
      solver::fill_axis(q, g, 0, solver::BoundaryKind::outflow, solver::BoundaryKind::outflow,
                        x_staggered, 1.0);
      fill_y_shifted(q, g, x_staggered, y_staggered);
    };
    both_axes(s.density.data(), false, false);
    for (auto& m : s.momentum)
      both_axes(m.data(), false, false);
    if (!s.isothermal) both_axes(s.energy.data(), false, false);
    if (s.magnetic) {
      for (int d = 0; d < 3; ++d)
        both_axes(s.face_field[std::size_t(d)].data(), d == 0, d == 1);
    }
  }

 private:
  // Lower ghost j = −m takes (i − ny, ny − m); upper ghost j = ny − 1 + m (cells) or ny + m
  // (faces) takes (i + ny, m − 1) or (i + ny, m): periodic in y and shifted along x so that i + j
  // is kept. Sources beyond the stored x range are clamped to its end (uniform state there).
  static void fill_y_shifted(double* q, const solver::BlockGeometry& g, bool x_staggered,
                             bool staggered) {
    const int ny = g.cells[1], ng = g.ghost_layers, ex = g.extent(0);
    // Stored x slots: cells 0 .. ex − 2 (the last slot is the upper face of x-face arrays only).
    const int x_last = x_staggered ? ex - 1 : ex - 2;
    const std::ptrdiff_t sy = g.stride(1);
    auto slot = [&](int i_storage, int j) { return i_storage + sy * (j + ng); };
    for (int m = 1; m <= ng; ++m) {
      const int hi_dst = staggered ? ny + m : ny - 1 + m;
      const int hi_src = staggered ? m : m - 1;
      for (int i = 0; i < ex; ++i) {
        const int below = std::clamp(i - ny, 0, x_last), above = std::clamp(i + ny, 0, x_last);
        q[slot(i, -m)] = q[slot(below, ny - m)];
        q[slot(i, hi_dst)] = q[slot(above, hi_src)];
      }
    }
  }
};

}  // namespace brume::shocks
