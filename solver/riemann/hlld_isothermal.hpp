// The isothermal HLLD fan: fast waves S_L, S_R and Alfvén waves S*_L, S*_R; there is no
// contact. Density and normal momentum are constant inside the fan and equal to their HLL
// averages, and the normal velocity is S_M = F_ρ^hll / ρ^hll, which makes the outer-wave jump
// conditions for mass hold on both sides. One state U** lies between the Alfvén waves.
#pragma once

#include <cmath>

#include "solver/eos.hpp"
#include "solver/riemann/face_algebra.hpp"
#include "solver/riemann/face_state.hpp"
#include "solver/riemann/hlld_fan.hpp"
#include "solver/riemann/physical_flux.hpp"
#include "solver/riemann/wave_speeds.hpp"

namespace brume::solver {

// Mignone 2007, J. Comput. Phys. 225, 1427 (the isothermal HLLD; section and equation numbers
// not checked, the relations below are re-derived from the jump conditions), with the outer speeds
// of Miyoshi & Kusano 2005, eq. 67. The central state follows from the jumps across S*_L and S*_R
// (ρ and v_n continuous):
//   v** = ½ (v*_L + v*_R) + ½ sign(B_n) (B*_R − B*_L) / sqrt(ρ*),
//   B** = ½ (B*_L + B*_R) + ½ sign(B_n) sqrt(ρ*) (v*_R − v*_L).
[[nodiscard]] inline HlldFan hlld_isothermal_fan(const FaceState& left, const FaceState& right,
                                                 const FaceConserved& ul, const FaceConserved& ur,
                                                 const FaceFlux& fl, const FaceFlux& fr, double bn,
                                                 const Isothermal& eos) {
  const OuterSpeeds s =
      miyoshi_kusano_speeds(left.vn, fast_speed<Isothermal, true>(left, bn, eos), right.vn,
                            fast_speed<Isothermal, true>(right, bn, eos));
  const FaceConserved hll = hll_state(ul, ur, fl, fr, s.left, s.right);
  const double rho = hll.density;
  const double sm = (fl.density + s.left * (rho - ul.density)) / rho;

  const TangentialStar tl = hlld_tangential_star(left, bn, s.left, sm);
  const TangentialStar tr = hlld_tangential_star(right, bn, s.right, sm);
  const FaceConserved sl = {rho, hll.mn, rho * tl.vt1, rho * tl.vt2, 0.0, tl.bt1, tl.bt2};
  const FaceConserved sr = {rho, hll.mn, rho * tr.vt1, rho * tr.vt2, 0.0, tr.bt1, tr.bt2};

  const double sqrt_rho = std::sqrt(rho);
  const double sgn = sign_of(bn);
  const double dv = 0.5 * sgn / sqrt_rho;
  const double db = 0.5 * sgn * sqrt_rho;
  const double v1 = 0.5 * (tl.vt1 + tr.vt1) + dv * (tr.bt1 - tl.bt1);
  const double v2 = 0.5 * (tl.vt2 + tr.vt2) + dv * (tr.bt2 - tl.bt2);
  const double b1 = 0.5 * (tl.bt1 + tr.bt1) + db * (tr.vt1 - tl.vt1);
  const double b2 = 0.5 * (tl.bt2 + tr.bt2) + db * (tr.vt2 - tl.vt2);
  const FaceConserved central = {rho, hll.mn, rho * v1, rho * v2, 0.0, b1, b2};
  const double ca = std::abs(bn) / sqrt_rho;
  return make_hlld_fan(s.left, sm - ca, sm, sm + ca, s.right, sl, central, central, sr);
}

}  // namespace brume::solver
