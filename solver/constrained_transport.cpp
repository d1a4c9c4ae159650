#include "solver/constrained_transport.hpp"

#include <algorithm>
#include <cmath>

namespace brume::solver {

void fill_inactive_face_emf(int d, const PrimitiveArrays& w, const State& source, CtScratch& ct) {
  const BlockGeometry& g = source.geometry;
  const int t1 = tangent1(d), t2 = tangent2(d);
  const CellEmfReader e1 = cell_emf_reader(w, source, t1);
  const CellEmfReader e2 = cell_emf_reader(w, source, t2);
  double* out1 = ct.face_emf[d][0].data();
  double* out2 = ct.face_emf[d][1].data();
  std::int8_t* sign = ct.mass_sign[d].data();
  const double* v = w.velocity[d].data();
  int lo[3], hi[3];
  for (int a = 0; a < 3; ++a) {
    const bool wide = a != d && g.active(a);
    lo[a] = wide ? -1 : 0;
    hi[a] = g.cells[a] + (wide ? 1 : 0);
  }
  for (int k = lo[2]; k < hi[2]; ++k) {
    for (int j = lo[1]; j < hi[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (int i = lo[0]; i < hi[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        out1[c] = e1(c);
        out2[c] = e2(c);
        sign[c] = std::int8_t(int(v[c] > 0.0) - int(v[c] < 0.0));
      }
    }
  }
}

void edge_emf(int e, const PrimitiveArrays& w, const State& source, CtScratch& ct) {
  const BlockGeometry& g = source.geometry;
  const int a = tangent1(e), b = tangent2(e);
  const std::ptrdiff_t sa = g.step(a), sb = g.step(b);
  // The cell-centred EMF (CellEmfReader) from local pointers, so that the loop vectorizes.
  const double* va = w.velocity[a].data();
  const double* vb = w.velocity[b].data();
  const double* ba = source.face_field[a].data();
  const double* bb = source.face_field[b].data();
  auto cell_emf = [=](std::ptrdiff_t n) {
    return vb[n] * (0.5 * (ba[n] + ba[n + sa])) - va[n] * (0.5 * (bb[n] + bb[n + sb]));
  };
  const double* ea = ct.face_emf[a][1].data();  // E_e on a-faces: t2(a) = e
  const double* eb = ct.face_emf[b][0].data();  // E_e on b-faces: t1(b) = e
  const std::int8_t* ma = ct.mass_sign[a].data();
  const std::int8_t* mb = ct.mass_sign[b].data();
  // E_e goes over the face EMF that only the cells of the same row read (x: a row later).
  double* result = edge_emf_values(ct, e);
  const bool lagged = e == 0;  // E_x replaces z-face EMFs that the next row (in y) still reads
  int hi[3];
  for (int x = 0; x < 3; ++x)
    hi[x] = g.cells[x] + (x != e && g.active(x) ? 1 : 0);
  for (int k = 0; k < hi[2]; ++k) {
    for (int j = 0; j < hi[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      double* out = ct.edge_rows.data() + std::size_t(j & 1) * ct.row_length;
#pragma GCC ivdep
      for (int i = 0; i < hi[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        const double c00 = cell_emf(c - sa - sb), c10 = cell_emf(c - sb), c01 = cell_emf(c - sa),
                     c11 = cell_emf(c);
        const double a0 = ea[c - sb], a1 = ea[c];  // a-faces below and above the edge in b
        const double b0 = eb[c - sa], b1 = eb[c];  // b-faces below and above the edge in a
        // Half-cell differences along b, upwinded in a by the mass flux through the a-faces.
        const double db_upper = upwind_pick(upwind_weight(ma[c]), c01 - b0, c11 - b1);
        const double db_lower = upwind_pick(upwind_weight(ma[c - sb]), b0 - c00, b1 - c10);
        // Half-cell differences along a, upwinded in b by the mass flux through the b-faces.
        const double da_upper = upwind_pick(upwind_weight(mb[c]), c10 - a0, c11 - a1);
        const double da_lower = upwind_pick(upwind_weight(mb[c - sa]), a0 - c00, a1 - c01);
        out[i] =
            0.25 * ((a0 + a1) + (b0 + b1)) + 0.25 * ((db_lower - db_upper) + (da_lower - da_upper));
      }
      if (!lagged) {
        std::copy(out, out + hi[0], result + row);
      } else if (j > 0) {
        const double* done = ct.edge_rows.data() + std::size_t((j - 1) & 1) * ct.row_length;
        std::copy(done, done + hi[0], result + g.index(0, j - 1, k));
      }
    }
    if (lagged) {
      const int j = hi[1] - 1;
      const double* last = ct.edge_rows.data() + std::size_t(j & 1) * ct.row_length;
      std::copy(last, last + hi[0], result + g.index(0, j, k));
    }
  }
}

void ct_update(const CtScratch& ct, double dt, const State& base, State& target) {
  const BlockGeometry& g = base.geometry;
  for (int d = 0; d < 3; ++d) {
    const int t1 = tangent1(d), t2 = tangent2(d);
    const std::ptrdiff_t s1 = g.step(t1), s2 = g.step(t2);
    const double c1 = dt / g.spacing[t1], c2 = dt / g.spacing[t2];
    const double* e1 = edge_emf_values(ct, t1);
    const double* e2 = edge_emf_values(ct, t2);
    const double* b0 = base.face_field[d].data();
    double* b = target.face_field[d].data();
    int hi[3];
    for (int x = 0; x < 3; ++x)
      hi[x] = g.cells[x] + (x == d && g.active(x) ? 1 : 0);
    for (int k = 0; k < hi[2]; ++k) {
      for (int j = 0; j < hi[1]; ++j) {
        const std::ptrdiff_t row = g.index(0, j, k);
        for (int i = 0; i < hi[0]; ++i) {
          const std::ptrdiff_t c = row + i;
          // (∇ × E)_d = ∂_t1 E_t2 − ∂_t2 E_t1.
          b[c] = b0[c] - (c1 * (e2[c + s1] - e2[c]) - c2 * (e1[c + s2] - e1[c]));
        }
      }
    }
  }
}

double relative_divergence(const State& s) {
  if (!s.magnetic) return 0.0;
  const BlockGeometry& g = s.geometry;
  double max_div = 0.0, max_b = 0.0;
  const double h = std::min({g.active(0) ? g.spacing[0] : 1e300, g.active(1) ? g.spacing[1] : 1e300,
                             g.active(2) ? g.spacing[2] : 1e300});
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = g.index(i, j, k);
        double div = 0.0, b2 = 0.0;
        for (int d = 0; d < 3; ++d) {
          const double* b = s.face_field[d].data();
          div += (b[c + g.step(d)] - b[c]) / g.spacing[d];
          const double bc = cell_field(s, d, c);
          b2 += bc * bc;
        }
        max_div = std::max(max_div, std::fabs(div));
        max_b = std::max(max_b, std::sqrt(b2));
      }
    }
  }
  return max_b > 0.0 ? max_div * h / max_b : max_div * h;
}

}  // namespace brume::solver
