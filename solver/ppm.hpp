// Piecewise-parabolic reconstruction of a cell-centred quantity (same interface as
// reconstruction.hpp). Colella & Woodward 1984, J. Comput. Phys. 54, 174, §1 (eqs. 1.6–1.10).
#pragma once

#include <cstddef>

#include "solver/reconstruction.hpp"

namespace brume::solver {

struct Ppm {
  static constexpr int stencil = 3;

  // Interface value between cells with values q0, q1 from the limited slopes dq0, dq1:
  // q0 + ½ (q1 − q0) − (dq1 − dq0)/6. Colella & Woodward 1984, eq. 1.6 with eq. 1.8 slopes.
  static double interface(double q0, double q1, double dq0, double dq1) {
    return q0 + 0.5 * (q1 - q0) - (dq1 - dq0) / 6.0;
  }

  // Monotonized parabola of a cell with mean q and edge values (al, ar). Colella & Woodward 1984,
  // eq. 1.10: flatten at extrema, pull the far edge in where the parabola would overshoot.
  static void monotonize(double q, double& al, double& ar) {
    const bool extremum = (ar - q) * (q - al) <= 0.0;
    const double da = ar - al;
    const double a6 = 6.0 * (q - 0.5 * (al + ar));
    const bool left_overshoot = da * a6 > da * da;
    const bool right_overshoot = -da * da > da * a6;
    const double new_al = extremum ? q : (left_overshoot ? 3.0 * q - 2.0 * ar : al);
    const double new_ar = extremum ? q : (right_overshoot ? 3.0 * q - 2.0 * al : ar);
    al = new_al;
    ar = new_ar;
  }

  // The monotonized parabola of cell c: its lower and upper edge values.
  template <class Q>
  static void edges(const Q& q, std::ptrdiff_t c, std::ptrdiff_t s, double& lo, double& hi) {
    const double qm2 = q(c - 2 * s), qm1 = q(c - s), q0 = q(c), qp1 = q(c + s), qp2 = q(c + 2 * s);
    // Limited slopes (Colella & Woodward 1984, eq. 1.8: the monotonized-central form).
    const double dm1 = MonotonizedCentral::slope(qm1 - qm2, q0 - qm1);
    const double d0 = MonotonizedCentral::slope(q0 - qm1, qp1 - q0);
    const double dp1 = MonotonizedCentral::slope(qp1 - q0, qp2 - qp1);
    lo = interface(qm1, q0, dm1, d0);  // lower face of cell c
    hi = interface(q0, qp1, d0, dp1);  // upper face of cell c
    monotonize(q0, lo, hi);
  }
};

}  // namespace brume::solver
