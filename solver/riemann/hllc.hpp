// HLLC flux for hydrodynamics: HLL with the contact (entropy and shear) wave restored.
//
// Ideal gas: the three-wave solver of Toro, Spruce & Speares 1994.
// Isothermal gas: there is no entropy wave; the only linearly degenerate wave is the shear wave,
// which carries the tangential velocities at the normal velocity. Density and normal momentum
// are then constant across the fan and equal to their HLL averages (their flux is the HLL flux),
// and the tangential momenta are upwinded at the contact speed S_M = F_ρ^hll / ρ^hll. This is
// the B → 0 limit of the isothermal HLLD solver (Mignone 2007, J. Comput. Phys. 225, 1427).
//
// Both use the outer speeds of Miyoshi & Kusano 2005 (eq. 67), shared with HLLD, so that HLLD
// with B = 0 gives the HLLC flux.
#pragma once

#include <algorithm>

#include "solver/riemann/face_algebra.hpp"
#include "solver/riemann/face_state.hpp"
#include "solver/riemann/physical_flux.hpp"
#include "solver/riemann/wave_speeds.hpp"

namespace brume::solver {

// The approximate Riemann fan: outer speeds, contact speed and the two star states.
struct HllcFan {
  double sl, sm, sr;
  FaceConserved star_left, star_right;
};

// Star state of side K: ρ_K (S_K − v_K)/(S_K − S_M) (1, S_M, v_t1, v_t2,
// E_K/ρ_K + (S_M − v_K)(S_M + p_K/(ρ_K (S_K − v_K)))).
// Toro, Spruce & Speares 1994, Shock Waves 4, 25; Toro 2009 §10.4, eq. 10.39.
inline FaceConserved hllc_star_state(const FaceState& s, const FaceConserved& u, double sk,
                                     double sm) {
  const double rho_sk = s.density * (sk - s.vn);
  const double f = rho_sk / (sk - sm);
  return {f,
          f * sm,
          f * s.vt1,
          f * s.vt2,
          f * (u.energy / s.density + (sm - s.vn) * (sm + s.pressure / rho_sk)),
          0.0,
          0.0};
}

// Toro 2009 §10.4, eq. 10.37 (contact speed) and eq. 10.39 (star states); isothermal: see above.
template <class Eos>
[[nodiscard]] inline HllcFan hllc_fan(const FaceState& left, const FaceState& right,
                                      const FaceConserved& ul, const FaceConserved& ur,
                                      const FaceFlux& fl, const FaceFlux& fr, const Eos& eos) {
  const OuterSpeeds s = miyoshi_kusano_speeds(left.vn, fast_speed<Eos, false>(left, 0.0, eos),
                                              right.vn, fast_speed<Eos, false>(right, 0.0, eos));
  if constexpr (Eos::isothermal) {
    const FaceConserved u = hll_state(ul, ur, fl, fr, s.left, s.right);
    const double mass_flux = fl.density + s.left * (u.density - ul.density);
    const double sm = mass_flux / u.density;
    return {s.left,
            sm,
            s.right,
            {u.density, u.mn, u.density * left.vt1, u.density * left.vt2, 0.0, 0.0, 0.0},
            {u.density, u.mn, u.density * right.vt1, u.density * right.vt2, 0.0, 0.0, 0.0}};
  } else {
    const double ml = left.density * (s.left - left.vn);
    const double mr = right.density * (s.right - right.vn);
    const double sm = (right.pressure - left.pressure + ml * left.vn - mr * right.vn) / (ml - mr);
    return {s.left, sm, s.right, hllc_star_state(left, ul, s.left, sm),
            hllc_star_state(right, ur, s.right, sm)};
  }
}

template <class Eos>
[[nodiscard]] inline FaceFlux hllc(const FaceState& left, const FaceState& right,
                                   [[maybe_unused]] double bn, const Eos& eos) {
  const FaceConserved ul = conserved<Eos, false>(left, 0.0, eos);
  const FaceConserved ur = conserved<Eos, false>(right, 0.0, eos);
  const FaceFlux fl = physical_flux<Eos, false>(left, 0.0, eos);
  const FaceFlux fr = physical_flux<Eos, false>(right, 0.0, eos);
  const HllcFan fan = hllc_fan(left, right, ul, ur, fl, fr, eos);
  // Rankine–Hugoniot across the outer waves (Toro 2009 eq. 10.38).
  const FaceFlux star_left = flux_across(fl, fan.sl, fan.star_left, ul);
  const FaceFlux star_right = flux_across(fr, fan.sr, fan.star_right, ur);
  return choose(fan.sm >= 0.0, choose(fan.sl >= 0.0, fl, star_left),
                choose(fan.sr < 0.0, fr, star_right));
}

struct Hllc {
  static constexpr bool supports_magnetic = false;
  static constexpr bool supports_hydro = true;
  template <class Eos, bool Magnetic>
  [[nodiscard]] static FaceFlux flux(const FaceState& left, const FaceState& right, double bn,
                                     const Eos& eos) {
    static_assert(!Magnetic, "HLLC is a hydrodynamics solver: use Hlld for MHD");
    return hllc<Eos>(left, right, bn, eos);
  }
};

}  // namespace brume::solver
