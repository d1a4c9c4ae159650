#include "solver/box_boundaries.hpp"

#include <algorithm>
#include <cstddef>

#include "solver/boundary_layer_flags.hpp"

namespace brume::solver {
namespace {

// Interior-relative index p along the axis of the source slot of ghost layer m (1 ≤ m ≤ g).
// Cell arrays hold cells 0..n−1; staggered face arrays hold faces 0..n (n is the upper boundary).
int lower_source(BoundaryKind kind, int m, int n, bool staggered) {
  switch (kind) {
    case BoundaryKind::periodic:
      return n - m;
    case BoundaryKind::outflow:
      return 0;
    case BoundaryKind::reflecting:
      return staggered ? m : m - 1;
  }
  return 0;
}

int upper_source(BoundaryKind kind, int m, int n, bool staggered) {
  // Ghost slot: n − 1 + m for cells, n + m for faces.
  switch (kind) {
    case BoundaryKind::periodic:
      return staggered ? m : m - 1;
    case BoundaryKind::outflow:
      return staggered ? n : n - 1;
    case BoundaryKind::reflecting:
      return n - m;  // mirror about the wall (cell n − m or face n − m)
  }
  return 0;
}

}  // namespace

void fill_axis(double* q, const BlockGeometry& g, int axis, BoundaryKind lower, BoundaryKind upper,
               bool staggered, double parity) {
  if (!g.active(axis)) return;
  const int n = g.cells[axis];
  const int ng = g.ghost_layers;
  const int a1 = axis == 0 ? 1 : 0;  // the two other axes, a1 < a2
  const int a2 = axis == 2 ? 1 : 2;
  const std::ptrdiff_t sa = g.stride(axis), s1 = g.stride(a1), s2 = g.stride(a2);
  const int e1 = g.extent(a1), e2 = g.extent(a2);
  const double lower_sign = lower == BoundaryKind::reflecting ? parity : 1.0;
  const double upper_sign = upper == BoundaryKind::reflecting ? parity : 1.0;
  auto slot = [&](int p) { return std::ptrdiff_t(p + ng) * sa; };
  for (int m = 1; m <= ng; ++m) {
    const std::ptrdiff_t lo_dst = slot(-m), lo_src = slot(lower_source(lower, m, n, staggered));
    const int hi = staggered ? n + m : n - 1 + m;
    const std::ptrdiff_t hi_dst = slot(hi), hi_src = slot(upper_source(upper, m, n, staggered));
    for (int c2 = 0; c2 < e2; ++c2) {
      for (int c1 = 0; c1 < e1; ++c1) {
        const std::ptrdiff_t base = c1 * s1 + c2 * s2;
        q[base + lo_dst] = lower_sign * q[base + lo_src];
        q[base + hi_dst] = upper_sign * q[base + hi_src];
      }
    }
  }
}

void BoxGhostFiller::fill(State& state) const {
  const BlockGeometry& g = state.geometry;
  for (int axis = 0; axis < 3; ++axis) {
    const BoundaryKind lo = boundaries_.lower[axis], hi = boundaries_.upper[axis];
    fill_axis(state.density.data(), g, axis, lo, hi, false, 1.0);
    for (int d = 0; d < 3; ++d) {
      fill_axis(state.momentum[d].data(), g, axis, lo, hi, false, d == axis ? -1.0 : 1.0);
    }
    if (!state.isothermal) fill_axis(state.energy.data(), g, axis, lo, hi, false, 1.0);
    if (state.magnetic) {
      for (int d = 0; d < 3; ++d) {
        fill_axis(state.face_field[d].data(), g, axis, lo, hi, d == axis, d == axis ? -1.0 : 1.0);
      }
    }
  }
}

void BoxGhostFiller::exchange_flags(const BlockGeometry& g,
                                    std::vector<std::ptrdiff_t>& cells) const {
  const std::size_t interior = cells.size();
  for (int axis = 0; axis < 3; ++axis) {
    if (g.active(axis) && boundaries_.lower[axis] == BoundaryKind::periodic &&
        boundaries_.upper[axis] == BoundaryKind::periodic) {
      append_periodic_images(cells, interior, g, axis);
    }
  }
  if (cells.size() != interior) std::sort(cells.begin(), cells.end());
}

}  // namespace brume::solver
