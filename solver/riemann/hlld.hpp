// HLLD flux for MHD: adiabatic (ideal gas, Miyoshi & Kusano 2005) and isothermal (Mignone 2007).
#pragma once

#include "solver/eos.hpp"
#include "solver/riemann/face_algebra.hpp"
#include "solver/riemann/face_state.hpp"
#include "solver/riemann/hlld_adiabatic.hpp"
#include "solver/riemann/hlld_fan.hpp"
#include "solver/riemann/hlld_isothermal.hpp"
#include "solver/riemann/physical_flux.hpp"

namespace brume::solver {

template <class Eos>
[[nodiscard]] inline HlldFan hlld_fan(const FaceState& left, const FaceState& right,
                                      const FaceConserved& ul, const FaceConserved& ur,
                                      const FaceFlux& fl, const FaceFlux& fr, double bn,
                                      const Eos& eos) {
  if constexpr (Eos::isothermal) {
    return hlld_isothermal_fan(left, right, ul, ur, fl, fr, bn, eos);
  } else {
    return hlld_adiabatic_fan(left, right, ul, ur, bn, eos);
  }
}

// Fluxes of the intermediate states by the jump conditions across each wave, chained from the
// left for S_M ≥ 0 and from the right otherwise, and the state at x/t = 0 chosen.
// Miyoshi & Kusano 2005, J. Comput. Phys. 208, 315, eqs. 64–66 (from memory); Mignone 2007,
// J. Comput. Phys. 225, 1427.
template <class Eos>
[[nodiscard]] inline FaceFlux hlld(const FaceState& left, const FaceState& right, double bn,
                                   const Eos& eos) {
  const FaceConserved ul = conserved<Eos, true>(left, bn, eos);
  const FaceConserved ur = conserved<Eos, true>(right, bn, eos);
  const FaceFlux fl = physical_flux<Eos, true>(left, bn, eos);
  const FaceFlux fr = physical_flux<Eos, true>(right, bn, eos);
  const HlldFan f = hlld_fan(left, right, ul, ur, fl, fr, bn, eos);
  const FaceFlux star_l = flux_across(fl, f.sl, f.star_left, ul);
  const FaceFlux dstar_l = flux_across(star_l, f.sal, f.dstar_left, f.star_left);
  const FaceFlux star_r = flux_across(fr, f.sr, f.star_right, ur);
  const FaceFlux dstar_r = flux_across(star_r, f.sar, f.dstar_right, f.star_right);
  const FaceFlux from_left = choose(f.sl >= 0.0, fl, choose(f.sal >= 0.0, star_l, dstar_l));
  const FaceFlux from_right = choose(f.sr < 0.0, fr, choose(f.sar < 0.0, star_r, dstar_r));
  return choose(f.sm >= 0.0, from_left, from_right);
}

struct Hlld {
  static constexpr bool supports_magnetic = true;
  static constexpr bool supports_hydro = false;
  template <class Eos, bool Magnetic>
  [[nodiscard]] static FaceFlux flux(const FaceState& left, const FaceState& right, double bn,
                                     const Eos& eos) {
    static_assert(Magnetic, "HLLD is an MHD solver: use Hllc (or Hlle, Llf) for hydrodynamics");
    return hlld<Eos>(left, right, bn, eos);
  }
};

}  // namespace brume::solver
