// Piecewise-parabolic reconstruction of a cell-centred quantity (same interface as
// reconstruction.hpp): the original monotone limiter (Ppm, Colella & Woodward 1984, J. Comput.
// Phys. 54, 174, §1, eqs. 1.6–1.10), which flattens every extremum, and the extremum-preserving
// limiter (PpmExtremumPreserving, Colella & Sekora 2008, J. Comput. Phys. 227, 7069, §§2–3),
// which tells smooth extrema from jumps by comparing second differences and keeps the smooth ones.
#pragma once

#include <cmath>
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

// PPM with the extremum-preserving limiters of Colella & Sekora 2008 (equation numbers from
// memory): a fourth-order interface value limited only where it leaves the range of its two cells
// and the second differences around it disagree, and a parabola limited at an extremum only by
// as much as the neighbouring second differences demand. Branch-free (selects), as the row loop
// vectorizes.
struct PpmExtremumPreserving {
  static constexpr int stencil = 3;
  // Ratio by which a second difference may exceed its neighbours: C = 1.25 (Colella & Sekora
  // 2008, §2; from memory).
  static constexpr double ratio = 1.25;

  // sign(d) · min(|d|, C|d1|, C|d2|, C|d3|) when all four share a sign, otherwise 0.
  // Colella & Sekora 2008, eq. 18 (interface, d3 = d2) and eq. 26 (extremum), from memory.
  static double limited_curvature(double d, double d1, double d2, double d3) {
    const bool all_positive = d > 0.0 && d1 > 0.0 && d2 > 0.0 && d3 > 0.0;
    const bool all_negative = d < 0.0 && d1 < 0.0 && d2 < 0.0 && d3 < 0.0;
    const double a = std::fabs(d), b = ratio * std::fabs(d1), c = ratio * std::fabs(d2),
                 e = ratio * std::fabs(d3);
    const double ab = b < a ? b : a;
    const double ce = e < c ? e : c;
    const double m = ce < ab ? ce : ab;
    return all_positive || all_negative ? std::copysign(m, d) : 0.0;
  }

  // Value at the face between cells with means q0, q1 (neighbours qm1 below, qp2 above).
  // Fourth-order value 7/12 (q0 + q1) − 1/12 (qm1 + qp2) (Colella & Sekora 2008, eq. 16, from
  // memory); where it is not between q0 and q1, replaced by ½ (q0 + q1) − D²_lim / 6 with the
  // curvature D² = 3 (q0 − 2 a + q1) limited by those of the two cells (eqs. 17–18, from memory).
  static double interface(double qm1, double q0, double q1, double qp2) {
    const double a = (7.0 / 12.0) * (q0 + q1) - (1.0 / 12.0) * (qm1 + qp2);
    const bool outside = (a - q0) * (q1 - a) < 0.0;
    const double d2 = 3.0 * (q0 - 2.0 * a + q1);
    const double d2l = qm1 - 2.0 * q0 + q1;
    const double d2r = q0 - 2.0 * q1 + qp2;
    const double limited = 0.5 * (q0 + q1) - limited_curvature(d2, d2l, d2r, d2r) / 6.0;
    return outside ? limited : a;
  }

  // Limits the parabola of a cell (mean q0, edges al, ar; neighbours qm2 … qp2). At an extremum of
  // the parabola or of the cell means, its curvature D² = 6 (al − 2 q0 + ar) is limited by the
  // second differences of the three cells around it and both edges are pulled towards q0 by the
  // ratio D²_lim / D² (Colella & Sekora 2008, §3, eqs. 26–27, from memory): a smooth extremum
  // keeps its parabola, a jump is flattened. Elsewhere the overshoot correction of Colella &
  // Woodward 1984, eq. 1.10.
  static void limit(double qm2, double qm1, double q0, double qp1, double qp2, double& al,
                    double& ar) {
    const double dl = q0 - al, dr = ar - q0;
    const bool extremum = dl * dr <= 0.0 || (q0 - qm1) * (qp1 - q0) <= 0.0;
    const double d2 = 6.0 * (al - 2.0 * q0 + ar);
    const double d2c = qm1 - 2.0 * q0 + qp1;
    const double d2l = qm2 - 2.0 * qm1 + q0;
    const double d2r = q0 - 2.0 * qp1 + qp2;
    const double lim = limited_curvature(d2, d2c, d2l, d2r);
    const double scale = d2 != 0.0 ? lim / (d2 != 0.0 ? d2 : 1.0) : 0.0;
    const double ext_al = q0 - scale * dl, ext_ar = q0 + scale * dr;
    // Colella & Woodward 1984, eq. 1.10: an edge more than twice as far from q0 as the other
    // would put the parabola's extremum inside the cell; move it to 2× the other's distance.
    const bool left_far = std::fabs(dl) >= 2.0 * std::fabs(dr);
    const bool right_far = std::fabs(dr) >= 2.0 * std::fabs(dl);
    const double mono_al = left_far ? q0 - 2.0 * dr : al;
    const double mono_ar = right_far ? q0 + 2.0 * dl : ar;
    al = extremum ? ext_al : mono_al;
    ar = extremum ? ext_ar : mono_ar;
  }

  template <class Q>
  static void edges(const Q& q, std::ptrdiff_t c, std::ptrdiff_t s, double& lo, double& hi) {
    const double qm2 = q(c - 2 * s), qm1 = q(c - s), q0 = q(c), qp1 = q(c + s), qp2 = q(c + 2 * s);
    lo = interface(qm2, qm1, q0, qp1);  // lower face of cell c
    hi = interface(qm1, q0, qp1, qp2);  // upper face of cell c
    limit(qm2, qm1, q0, qp1, qp2, lo, hi);
  }
};

}  // namespace brume::solver
