// The HLLD Riemann fan: five speeds and four intermediate states, shared by the adiabatic
// (Miyoshi & Kusano 2005) and isothermal (Mignone 2007) variants, and the tangential jump across
// an outer (fast) wave, which both variants use.
#pragma once

#include <cmath>

#include "solver/riemann/face_algebra.hpp"
#include "solver/riemann/face_state.hpp"

namespace brume::solver {

// Speeds S_L ≤ S*_L ≤ S_M ≤ S*_R ≤ S_R and the states between them, left to right:
// U_L | U*_L | U**_L | U**_R | U*_R | U_R. Isothermal: U**_L = U**_R (no contact at S_M).
struct HlldFan {
  double sl, sal, sm, sar, sr;
  FaceConserved star_left, dstar_left, dstar_right, star_right;
};

// Member by member: an aggregate copy of the states would keep the fan in memory and stop the
// vectorization of a row loop that inlines the solver.
inline void copy_state(FaceConserved& to, const FaceConserved& from) {
  to.density = from.density;
  to.mn = from.mn;
  to.mt1 = from.mt1;
  to.mt2 = from.mt2;
  to.energy = from.energy;
  to.bt1 = from.bt1;
  to.bt2 = from.bt2;
}

[[nodiscard]] inline HlldFan make_hlld_fan(double sl, double sal, double sm, double sar, double sr,
                                           const FaceConserved& star_left,
                                           const FaceConserved& dstar_left,
                                           const FaceConserved& dstar_right,
                                           const FaceConserved& star_right) {
  HlldFan f;
  f.sl = sl;
  f.sal = sal;
  f.sm = sm;
  f.sar = sar;
  f.sr = sr;
  copy_state(f.star_left, star_left);
  copy_state(f.dstar_left, dstar_left);
  copy_state(f.dstar_right, dstar_right);
  copy_state(f.star_right, star_right);
  return f;
}

// Tangential velocity and field behind an outer wave (speed sk) of side K, with normal velocity
// s_m inside the fan:
//   v*_t = v_t − b_n b_t (s_m − v_n) / D,   b*_t = b_t (ρ (s_k − v_n)² − b_n²) / D,
//   D = ρ (s_k − v_n)(s_k − s_m) − b_n².
// Miyoshi & Kusano 2005, J. Comput. Phys. 208, 315, eqs. 44–47; Mignone 2007, J. Comput. Phys.
// 225, 1427, uses the same relations with s_m the HLL normal velocity.
// When D vanishes (b_t = 0, s_m = v_n, fast and Alfvén waves coinciding, b_n² ≥ γp) the paper
// prescribes no tangential jump: v*_t = v_t, b*_t = b_t. "Vanishes" is taken as
// |D| ≤ 1e-8 (ρ (s_k − v_n)² + b_n²), i.e. relative to the size of the terms that cancel.
struct TangentialStar {
  double vt1, vt2, bt1, bt2;
};

[[nodiscard]] inline TangentialStar hlld_tangential_star(const FaceState& s, double bn, double sk,
                                                         double sm) {
  const double rho_dv = s.density * (sk - s.vn);
  const double rho_dv2 = rho_dv * (sk - s.vn);
  const double bn2 = bn * bn;
  const double d = rho_dv * (sk - sm) - bn2;
  const bool degenerate = std::abs(d) <= 1e-8 * (rho_dv2 + bn2);
  const double inv_d = degenerate ? 0.0 : 1.0 / d;
  const double dv = bn * (sm - s.vn) * inv_d;
  const double fb = degenerate ? 1.0 : (rho_dv2 - bn2) * inv_d;
  return {s.vt1 - s.bt1 * dv, s.vt2 - s.bt2 * dv, s.bt1 * fb, s.bt2 * fb};
}

// sign(b_n) ∈ {−1, 0, 1}.
[[nodiscard]] inline double sign_of(double b) {
  return static_cast<double>((b > 0.0) - (b < 0.0));
}

}  // namespace brume::solver
