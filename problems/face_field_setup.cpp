#include "problems/face_field_setup.hpp"

namespace brume::problems {

namespace {

// Position along d of a face-centred quantity with normal `normal`: the face itself along the
// normal, the cell centre across it.
double face_position(const solver::BlockGeometry& g, int d, int normal, int index) {
  return d == normal && g.active(d) ? g.face(d, index) : g.centre(d, index);
}

}  // namespace

void set_face_field(solver::State& state, const std::array<double, 3>& uniform,
                    const VectorPotential& potential) {
  const solver::BlockGeometry& g = state.geometry;
  for (int d = 0; d < 3; ++d) {
    const int t1 = solver::tangent1(d);
    const int t2 = solver::tangent2(d);
    const std::array<int, 3> last{g.cells[0] - 1 + int(d == 0 && g.active(0)),
                                  g.cells[1] - 1 + int(d == 1 && g.active(1)),
                                  g.cells[2] - 1 + int(d == 2 && g.active(2))};
    for (int k = 0; k <= last[2]; ++k) {
      for (int j = 0; j <= last[1]; ++j) {
        for (int i = 0; i <= last[0]; ++i) {
          const std::array<int, 3> n{i, j, k};
          std::array<double, 3> x{face_position(g, 0, d, i), face_position(g, 1, d, j),
                                  face_position(g, 2, d, k)};
          // B_d = ∂A_t2/∂t1 − ∂A_t1/∂t2, each as a difference between the two bounding edges.
          double curl = 0.0;
          if (g.active(t1)) {
            std::array<double, 3> lo = x, hi = x;
            lo[t1] = g.face(t1, n[t1]);
            hi[t1] = g.face(t1, n[t1] + 1);
            curl += (potential(hi[0], hi[1], hi[2])[t2] - potential(lo[0], lo[1], lo[2])[t2]) /
                    g.spacing[t1];
          }
          if (g.active(t2)) {
            std::array<double, 3> lo = x, hi = x;
            lo[t2] = g.face(t2, n[t2]);
            hi[t2] = g.face(t2, n[t2] + 1);
            curl -= (potential(hi[0], hi[1], hi[2])[t1] - potential(lo[0], lo[1], lo[2])[t1]) /
                    g.spacing[t2];
          }
          state.face_field[d][g.index(i, j, k)] = uniform[d] + curl;
        }
      }
    }
  }
}

void set_uniform_field(solver::State& state, std::array<double, 3> gauss,
                       double code_magnetic_field) {
  if (!state.magnetic) return;
  for (double& b : gauss)
    b /= code_magnetic_field;
  set_face_field(state, gauss, [](double, double, double) {
    return std::array<double, 3>{0.0, 0.0, 0.0};
  });
}

}  // namespace brume::problems
