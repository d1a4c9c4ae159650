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

  template <class Q>
  static void face(const Q& q, std::ptrdiff_t c, std::ptrdiff_t s, double& l, double& r) {
    const double qm3 = q(c - 3 * s), qm2 = q(c - 2 * s), qm1 = q(c - s), q0 = q(c), qp1 = q(c + s),
                 qp2 = q(c + 2 * s);
    // Limited slopes (Colella & Woodward 1984, eq. 1.8: the monotonized-central form).
    const double dm2 = MonotonizedCentral::slope(qm2 - qm3, qm1 - qm2);
    const double dm1 = MonotonizedCentral::slope(qm1 - qm2, q0 - qm1);
    const double d0 = MonotonizedCentral::slope(q0 - qm1, qp1 - q0);
    const double dp1 = MonotonizedCentral::slope(qp1 - q0, qp2 - qp1);
    const double i_m32 = interface(qm2, qm1, dm2, dm1);  // lower face of cell c − 1
    const double i_m12 = interface(qm1, q0, dm1, d0);    // the face itself
    const double i_p12 = interface(q0, qp1, d0, dp1);    // upper face of cell c
    double al_m1 = i_m32, ar_m1 = i_m12;
    monotonize(qm1, al_m1, ar_m1);
    double al_0 = i_m12, ar_0 = i_p12;
    monotonize(q0, al_0, ar_0);
    l = ar_m1;
    r = al_0;
  }
};

}  // namespace brume::solver
