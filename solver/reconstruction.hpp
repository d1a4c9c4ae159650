// Spatial reconstruction of a cell-centred quantity to the two sides of a face, chosen at compile
// time. Each scheme provides
//   static constexpr int stencil;   // ghost layers it needs
//   template <class Q> static void edges(const Q& q, ptrdiff_t c, ptrdiff_t s, double& lo,
//                                        double& hi);
// the values at the lower (lo) and upper (hi) d-face of cell c, s being the linear step along the
// sweep direction d. The state left of the lower face of cell c is then hi of cell c − s and the
// state right of it lo of cell c (`face`, the same numbers for one face). A sweep computes the
// edges of each cell once, for a row of cells at a time (`reconstruct_row`, unit stride, no
// branches). `q(n)` reads the quantity at linear index n, so that derived quantities
// (face-averaged B) need no array.
#pragma once

#include <cmath>
#include <cstddef>

namespace brume::solver {

// Reads a stored array.
struct ArrayReader {
  const double* p;
  double operator()(std::ptrdiff_t n) const { return p[n]; }
};

// Reads the cell-centred field as the average of the two faces of a cell (linear step s).
struct FaceAverageReader {
  const double* b;
  std::ptrdiff_t s;
  double operator()(std::ptrdiff_t n) const { return 0.5 * (b[n] + b[n + s]); }
};

// First order: the cell values themselves (Godunov 1959, Mat. Sb. 47, 271).
struct DonorCell {
  static constexpr int stencil = 1;
  template <class Q>
  static void edges(const Q& q, std::ptrdiff_t c, std::ptrdiff_t /*s*/, double& lo, double& hi) {
    lo = hi = q(c);
  }
};

// Monotonized-central slope: minmod(2Δ−, (Δ− + Δ+)/2, 2Δ+), zero at extrema.
// van Leer 1977, J. Comput. Phys. 23, 276 (the "MC" limiter; equation number not checked).
struct MonotonizedCentral {
  static double slope(double dm, double dp) {
    // Selects rather than fmin (the same value for finite data), so that the row loop vectorizes.
    const double a = 2.0 * std::fabs(dm), b = 2.0 * std::fabs(dp), c = 0.5 * std::fabs(dm + dp);
    const double ab = b < a ? b : a;
    const double m = c < ab ? c : ab;
    return dm * dp > 0.0 ? std::copysign(m, dm) : 0.0;
  }
};

// Harmonic (van Leer) slope: 2 Δ− Δ+ / (Δ− + Δ+), zero at extrema.
// van Leer 1974, J. Comput. Phys. 14, 361 (harmonic-mean limiter; from memory), as used in
// van Leer 1979, J. Comput. Phys. 32, 101.
struct VanLeerLimiter {
  static double slope(double dm, double dp) {
    const double prod = dm * dp;
    return prod > 0.0 ? 2.0 * prod / (dm + dp) : 0.0;
  }
};

// Piecewise-linear reconstruction with a limited slope (applied to primitive variables by the
// caller). van Leer 1979, J. Comput. Phys. 32, 101, §4 (MUSCL).
template <class Limiter>
struct Plm {
  static constexpr int stencil = 2;
  template <class Q>
  static void edges(const Q& q, std::ptrdiff_t c, std::ptrdiff_t s, double& lo, double& hi) {
    const double qm1 = q(c - s), q0 = q(c), qp1 = q(c + s);
    const double half_slope = 0.5 * Limiter::slope(q0 - qm1, qp1 - q0);
    lo = q0 - half_slope;
    hi = q0 + half_slope;
  }
};

using PlmMonotonizedCentral = Plm<MonotonizedCentral>;
using PlmVanLeer = Plm<VanLeerLimiter>;

// States left (l: upper edge of cell c − s) and right (r: lower edge of cell c) of the lower face
// of cell c.
template <class Recon, class Q>
void face_states(const Q& q, std::ptrdiff_t c, std::ptrdiff_t s, double& l, double& r) {
  double unused_lo, unused_hi;
  Recon::edges(q, c - s, s, unused_lo, l);
  Recon::edges(q, c, s, r, unused_hi);
}

// Edges of the n cells c0, c0 + 1, …: lo[m], hi[m] belong to cell c0 + m.
template <class Recon, class Q>
[[gnu::flatten]] void reconstruct_row(const Q& q, std::ptrdiff_t c0, std::ptrdiff_t s, int n,
                                      double* lo, double* hi) {
#pragma GCC ivdep
  for (int m = 0; m < n; ++m)
    Recon::edges(q, c0 + m, s, lo[m], hi[m]);
}

}  // namespace brume::solver
