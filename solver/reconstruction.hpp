// Spatial reconstruction of a cell-centred quantity to the two sides of a face, chosen at compile
// time. Each scheme provides
//   static constexpr int stencil;   // ghost layers it needs
//   template <class Q> static void face(const Q& q, ptrdiff_t c, ptrdiff_t s, double& l, double&
//   r);
// which returns the states left (l, from cell c − s) and right (r, from cell c) of the face at the
// lower side of cell c, s being the linear step along the sweep direction. `q(n)` reads the
// quantity at linear index n, so that derived quantities (face-averaged B) need no array.
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
  static void face(const Q& q, std::ptrdiff_t c, std::ptrdiff_t s, double& l, double& r) {
    l = q(c - s);
    r = q(c);
  }
};

// Monotonized-central slope: minmod(2Δ−, (Δ− + Δ+)/2, 2Δ+), zero at extrema.
// van Leer 1977, J. Comput. Phys. 23, 276 (the "MC" limiter; equation number not checked).
struct MonotonizedCentral {
  static double slope(double dm, double dp) {
    const double m =
        std::fmin(std::fmin(2.0 * std::fabs(dm), 2.0 * std::fabs(dp)), 0.5 * std::fabs(dm + dp));
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
  static void face(const Q& q, std::ptrdiff_t c, std::ptrdiff_t s, double& l, double& r) {
    const double qm2 = q(c - 2 * s), qm1 = q(c - s), q0 = q(c), qp1 = q(c + s);
    l = qm1 + 0.5 * Limiter::slope(qm1 - qm2, q0 - qm1);
    r = q0 - 0.5 * Limiter::slope(q0 - qm1, qp1 - q0);
  }
};

using PlmMonotonizedCentral = Plm<MonotonizedCentral>;
using PlmVanLeer = Plm<VanLeerLimiter>;

}  // namespace brume::solver
