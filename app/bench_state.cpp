#include "app/bench_state.hpp"

#include <array>
#include <cmath>
#include <cstddef>

namespace brume::app {
namespace {

constexpr double two_pi = 6.283185307179586;

using Vector = std::array<double, 3>;

// Vector potential of the bench field: three low modes, one per component.
Vector potential(double x, double y, double z) {
  return {0.08 * std::sin(two_pi * (y + 0.3 * z)), 0.06 * std::sin(two_pi * (2.0 * z + 0.1)),
          0.07 * std::cos(two_pi * (x - y))};
}

struct Flow {
  double density, vx, vy, vz, pressure;
};

Flow flow(double x, double y, double z) {
  const double k = two_pi;
  return {1.0 + 0.3 * std::sin(k * (x + y)) + 0.1 * std::cos(k * 2.0 * z),
          0.4 * std::sin(k * z) + 0.1 * std::cos(k * (y - x)),
          0.4 * std::sin(k * x) + 0.1 * std::sin(k * 2.0 * z),
          0.4 * std::sin(k * y) + 0.1 * std::cos(k * (x + z)), 0.6 + 0.1 * std::cos(k * (x - z))};
}

// The edge potential A_e at the edge along e at the lower corner of cell (i, j, k).
double edge_potential(const solver::BlockGeometry& g, int e, const int idx[3]) {
  double x[3];
  for (int d = 0; d < 3; ++d)
    x[d] = d == e ? g.centre(d, idx[d]) : g.face(d, idx[d]);
  return potential(x[0], x[1], x[2])[std::size_t(e)];
}

void set_face_field(solver::State& s) {
  const solver::BlockGeometry& g = s.geometry;
  const Vector uniform{0.5, 0.25, 0.15};
  for (int d = 0; d < 3; ++d) {
    const int t1 = solver::tangent1(d), t2 = solver::tangent2(d);
    int hi[3];
    for (int x = 0; x < 3; ++x)
      hi[x] = g.cells[x] + (x == d && g.active(x) ? 1 : 0);
    for (int k = 0; k < hi[2]; ++k) {
      for (int j = 0; j < hi[1]; ++j) {
        for (int i = 0; i < hi[0]; ++i) {
          const int at[3] = {i, j, k};
          int up1[3] = {i, j, k}, up2[3] = {i, j, k};
          up1[t1] += 1;
          up2[t2] += 1;
          // B_d = ∂_t1 A_t2 − ∂_t2 A_t1 on the face.
          double b = uniform[std::size_t(d)];
          if (g.active(t1)) {
            b += (edge_potential(g, t2, up1) - edge_potential(g, t2, at)) / g.spacing[t1];
          }
          if (g.active(t2)) {
            b -= (edge_potential(g, t1, up2) - edge_potential(g, t1, at)) / g.spacing[t2];
          }
          s.face_field[std::size_t(d)][std::size_t(g.index(i, j, k))] = b;
        }
      }
    }
  }
}

}  // namespace

void set_bench_flow(solver::State& s, double gamma) {
  if (s.magnetic) set_face_field(s);
  const solver::BlockGeometry& g = s.geometry;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::size_t c = std::size_t(g.index(i, j, k));
        const Flow w = flow(g.centre(0, i), g.centre(1, j), g.centre(2, k));
        s.density[c] = w.density;
        s.momentum[0][c] = w.density * w.vx;
        s.momentum[1][c] = w.density * w.vy;
        s.momentum[2][c] = w.density * w.vz;
        if (s.isothermal) continue;
        double b2 = 0.0;
        if (s.magnetic) {
          for (int d = 0; d < 3; ++d) {
            const double b = solver::cell_field(s, d, std::ptrdiff_t(c));
            b2 += b * b;
          }
        }
        s.energy[c] = w.pressure / (gamma - 1.0) +
                      0.5 * w.density * (w.vx * w.vx + w.vy * w.vy + w.vz * w.vz) + 0.5 * b2;
      }
    }
  }
}

}  // namespace brume::app
