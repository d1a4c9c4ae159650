// HLLE flux: the two-wave HLL solver with outer speeds bounding the fast (sound) waves.
#pragma once

#include <algorithm>

#include "solver/riemann/face_algebra.hpp"
#include "solver/riemann/face_state.hpp"
#include "solver/riemann/physical_flux.hpp"
#include "solver/riemann/wave_speeds.hpp"

namespace brume::solver {

// HLL flux with speeds S_L = min(v_L − c_L, v_R − c_R, 0), S_R = max(v_L + c_L, v_R + c_R, 0),
// c the fast magnetosonic (sound) speed: Einfeldt 1988, SIAM J. Numer. Anal. 25, 294, §2 (HLL
// with fast-wave bounds; equation numbers not checked); the speeds are the direct estimates of
// Davis 1988, SIAM J. Sci. Stat. Comput. 9, 445 (no Roe average, so that hydro and MHD share one
// form).
template <class Eos, bool Magnetic>
[[nodiscard]] inline FaceFlux hlle(const FaceState& left, const FaceState& right, double bn,
                                   const Eos& eos) {
  const FaceConserved ul = conserved<Eos, Magnetic>(left, bn, eos);
  const FaceConserved ur = conserved<Eos, Magnetic>(right, bn, eos);
  const FaceFlux fl = physical_flux<Eos, Magnetic>(left, bn, eos);
  const FaceFlux fr = physical_flux<Eos, Magnetic>(right, bn, eos);
  const OuterSpeeds s = davis_speeds(left.vn, fast_speed<Eos, Magnetic>(left, bn, eos), right.vn,
                                     fast_speed<Eos, Magnetic>(right, bn, eos));
  // Clipping the speeds at zero makes the one formula give F_L (S_L ≥ 0) and F_R (S_R ≤ 0).
  return hll_flux(ul, ur, fl, fr, std::min(s.left, 0.0), std::max(s.right, 0.0));
}

struct Hlle {
  static constexpr bool supports_magnetic = true;
  static constexpr bool supports_hydro = true;
  template <class Eos, bool Magnetic>
  [[nodiscard]] static FaceFlux flux(const FaceState& left, const FaceState& right, double bn,
                                     const Eos& eos) {
    return hlle<Eos, Magnetic>(left, right, bn, eos);
  }
};

}  // namespace brume::solver
