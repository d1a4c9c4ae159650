// Helpers shared by the solver tests: boxes, initial states, sums and norms.
#pragma once

#include <array>
#include <cmath>
#include <functional>
#include <memory>

#include "solver/box_boundaries.hpp"
#include "solver/integrator.hpp"
#include "solver/primitive.hpp"
#include "solver/state.hpp"

namespace brume::solver::testing {

inline constexpr double kPi = 3.14159265358979323846;

// A state on [0, length]^3 restricted to the active axes (cells[d] > 1).
inline State make_box_state(std::array<int, 3> cells, bool magnetic, bool isothermal,
                            int ghost_layers = 3, std::array<double, 3> length = {1, 1, 1}) {
  return make_state(whole_box_geometry(cells, {0, 0, 0}, length, ghost_layers), magnetic,
                    isothermal);
}

struct Primitive {
  double density, vx, vy, vz, pressure;
};

// Sets the conserved variables of interior cells from point values at cell centres; the face
// field must be set first (the energy includes the magnetic energy of the cell-centred field).
inline void set_primitive(State& s, const std::function<Primitive(double, double, double)>& f,
                          double gamma) {
  const BlockGeometry& g = s.geometry;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = g.index(i, j, k);
        const Primitive w = f(g.centre(0, i), g.centre(1, j), g.centre(2, k));
        s.density[c] = w.density;
        s.momentum[0][c] = w.density * w.vx;
        s.momentum[1][c] = w.density * w.vy;
        s.momentum[2][c] = w.density * w.vz;
        if (!s.isothermal) {
          double b2 = 0.0;
          if (s.magnetic) {
            for (int d = 0; d < 3; ++d)
              b2 += cell_field(s, d, c) * cell_field(s, d, c);
          }
          s.energy[c] = w.pressure / (gamma - 1.0) +
                        0.5 * w.density * (w.vx * w.vx + w.vy * w.vy + w.vz * w.vz) + 0.5 * b2;
        }
      }
    }
  }
}

using Vector = std::array<double, 3>;

// Face field B = ∇ × A with A_e sampled on the cell edges along e: the discrete curl of an edge
// potential has zero discrete divergence to round-off (common practice, no source).
// Interior faces, including both boundary faces of each active axis.
inline void set_field_from_potential(State& s,
                                     const std::function<Vector(double, double, double)>& a) {
  const BlockGeometry& g = s.geometry;
  auto edge = [&](int e, int i, int j, int k) {
    // Edge along e at the lower corner of cell (i, j, k) in the other two axes.
    const int idx[3] = {i, j, k};
    double x[3];
    for (int d = 0; d < 3; ++d)
      x[d] = d == e ? g.centre(d, idx[d]) : g.face(d, idx[d]);
    return a(x[0], x[1], x[2])[std::size_t(e)];
  };
  for (int d = 0; d < 3; ++d) {
    const int t1 = tangent1(d), t2 = tangent2(d);
    int hi[3];
    for (int x = 0; x < 3; ++x)
      hi[x] = g.cells[x] + (x == d && g.active(x) ? 1 : 0);
    for (int k = 0; k < hi[2]; ++k) {
      for (int j = 0; j < hi[1]; ++j) {
        for (int i = 0; i < hi[0]; ++i) {
          int up1[3] = {i, j, k}, up2[3] = {i, j, k};
          up1[t1] += 1;
          up2[t2] += 1;
          double b = 0.0;
          // B_d = ∂_t1 A_t2 − ∂_t2 A_t1; inactive axes contribute nothing.
          if (g.active(t1)) {
            b += (edge(t2, up1[0], up1[1], up1[2]) - edge(t2, i, j, k)) / g.spacing[t1];
          }
          if (g.active(t2)) {
            b -= (edge(t1, up2[0], up2[1], up2[2]) - edge(t1, i, j, k)) / g.spacing[t2];
          }
          s.face_field[d][g.index(i, j, k)] = b;
        }
      }
    }
  }
}

// Adds a uniform field to every interior face (and both boundary faces).
inline void add_uniform_field(State& s, Vector b0) {
  const BlockGeometry& g = s.geometry;
  for (int d = 0; d < 3; ++d) {
    int hi[3];
    for (int x = 0; x < 3; ++x)
      hi[x] = g.cells[x] + (x == d && g.active(x) ? 1 : 0);
    for (int k = 0; k < hi[2]; ++k) {
      for (int j = 0; j < hi[1]; ++j) {
        for (int i = 0; i < hi[0]; ++i)
          s.face_field[d][g.index(i, j, k)] += b0[std::size_t(d)];
      }
    }
  }
}

// Sum over interior cells of q(c) (linear index), in k, j, i order.
inline double interior_sum(const State& s, const std::function<double(std::ptrdiff_t)>& q) {
  const BlockGeometry& g = s.geometry;
  double sum = 0.0;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i)
        sum += q(g.index(i, j, k));
    }
  }
  return sum;
}

// Advances to t_end with the stable step (the last step shortened); returns the number of steps.
inline long run_until(Integrator& integrator, State& s, double t_end, long max_steps = 1000000) {
  long steps = 0;
  while (s.time < t_end * (1.0 - 1e-14) && steps < max_steps) {
    const double dt = std::fmin(integrator.stable_time_step(s), t_end - s.time);
    const StepReport r = integrator.advance(s, dt);
    if (!r.ok()) return -1;
    ++steps;
  }
  return steps;
}

inline std::shared_ptr<const GhostFiller> periodic_box() {
  return std::make_shared<BoxGhostFiller>(BoxBoundaries{});
}

}  // namespace brume::solver::testing
