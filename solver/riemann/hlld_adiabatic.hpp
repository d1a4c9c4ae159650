// The adiabatic HLLD fan (ideal gas): fast waves S_L, S_R, Alfvén waves S*_L, S*_R and the
// contact S_M; total pressure and normal velocity are constant inside the fan.
#pragma once

#include <cmath>

#include "solver/eos.hpp"
#include "solver/riemann/face_algebra.hpp"
#include "solver/riemann/face_state.hpp"
#include "solver/riemann/hlld_fan.hpp"
#include "solver/riemann/physical_flux.hpp"
#include "solver/riemann/wave_speeds.hpp"

namespace brume::solver {

// Star state of side K: ρ* (eq. 43), tangential parts (eqs. 44–47), E* (eq. 48).
// Miyoshi & Kusano 2005, J. Comput. Phys. 208, 315.
[[nodiscard]] inline FaceConserved hlld_star_state(const FaceState& s, const FaceConserved& u,
                                                   double pt, double bn, double sk, double sm,
                                                   double pt_star) {
  const double rho = s.density * (sk - s.vn) / (sk - sm);
  const TangentialStar t = hlld_tangential_star(s, bn, sk, sm);
  const double vb = s.vn * bn + s.vt1 * s.bt1 + s.vt2 * s.bt2;
  const double vb_star = sm * bn + t.vt1 * t.bt1 + t.vt2 * t.bt2;
  const double energy =
      ((sk - s.vn) * u.energy - pt * s.vn + pt_star * sm + bn * (vb - vb_star)) / (sk - sm);
  return {rho, rho * sm, rho * t.vt1, rho * t.vt2, energy, t.bt1, t.bt2};
}

// Miyoshi & Kusano 2005, J. Comput. Phys. 208, 315 (equation numbers from memory): S_M eq. 38, p*_T
// eq. 41, star states eqs. 43–48, Alfvén speeds eq. 51, double-star states eqs. 59–63, outer speeds
// eq. 67. B_n → 0: S*_L, S*_R → S_M and the double-star states are never selected (sign(B_n) = 0
// also removes their jumps), so the solver reduces to HLLC, as the paper states.
[[nodiscard]] inline HlldFan hlld_adiabatic_fan(const FaceState& left, const FaceState& right,
                                                const FaceConserved& ul, const FaceConserved& ur,
                                                double bn, const IdealGas& eos) {
  const double ptl = total_pressure<IdealGas, true>(left, bn, eos);
  const double ptr = total_pressure<IdealGas, true>(right, bn, eos);
  const OuterSpeeds s = miyoshi_kusano_speeds(left.vn, fast_speed<IdealGas, true>(left, bn, eos),
                                              right.vn, fast_speed<IdealGas, true>(right, bn, eos));
  const double ml = left.density * (s.left - left.vn);
  const double mr = right.density * (s.right - right.vn);
  const double inv_dm = 1.0 / (mr - ml);
  const double sm = (mr * right.vn - ml * left.vn - ptr + ptl) * inv_dm;
  const double pt_star = (mr * ptl - ml * ptr + ml * mr * (right.vn - left.vn)) * inv_dm;

  const FaceConserved sl = hlld_star_state(left, ul, ptl, bn, s.left, sm, pt_star);
  const FaceConserved sr = hlld_star_state(right, ur, ptr, bn, s.right, sm, pt_star);

  const double rl = std::sqrt(sl.density), rr = std::sqrt(sr.density);
  const double sgn = sign_of(bn);
  const double abs_bn = std::abs(bn);
  const double inv_r = 1.0 / (rl + rr);
  // Star velocities are the star momenta over the star densities.
  const double vl1 = sl.mt1 / sl.density, vl2 = sl.mt2 / sl.density;
  const double vr1 = sr.mt1 / sr.density, vr2 = sr.mt2 / sr.density;
  const double v1 = (rl * vl1 + rr * vr1 + sgn * (sr.bt1 - sl.bt1)) * inv_r;
  const double v2 = (rl * vl2 + rr * vr2 + sgn * (sr.bt2 - sl.bt2)) * inv_r;
  const double b1 = (rl * sr.bt1 + rr * sl.bt1 + sgn * rl * rr * (vr1 - vl1)) * inv_r;
  const double b2 = (rl * sr.bt2 + rr * sl.bt2 + sgn * rl * rr * (vr2 - vl2)) * inv_r;
  const double vb_dstar = sm * bn + v1 * b1 + v2 * b2;
  const double vb_l = sm * bn + vl1 * sl.bt1 + vl2 * sl.bt2;
  const double vb_r = sm * bn + vr1 * sr.bt1 + vr2 * sr.bt2;
  const FaceConserved dl = {
      sl.density, sl.mn, sl.density * v1, sl.density * v2, sl.energy - sgn * rl * (vb_l - vb_dstar),
      b1,         b2};
  const FaceConserved dr = {
      sr.density, sr.mn, sr.density * v1, sr.density * v2, sr.energy + sgn * rr * (vb_r - vb_dstar),
      b1,         b2};
  return make_hlld_fan(s.left, sm - abs_bn / rl, sm, sm + abs_bn / rr, s.right, sl, dl, dr, sr);
}

}  // namespace brume::solver
