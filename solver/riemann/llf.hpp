// Local Lax–Friedrichs (Rusanov) flux: one wave speed, the largest signal speed of the two states.
#pragma once

#include <algorithm>
#include <cmath>

#include "solver/riemann/face_algebra.hpp"
#include "solver/riemann/face_state.hpp"
#include "solver/riemann/physical_flux.hpp"
#include "solver/riemann/wave_speeds.hpp"

namespace brume::solver {

// F = ½ (F_L + F_R) − ½ s (U_R − U_L), s = max(|v_L| + c_L, |v_R| + c_R), c the fast (sound) speed.
// Rusanov 1961, J. Comput. Math. Phys. USSR 1, 267 (Toro 2009 ch. 10; reference from memory).
template <class Eos, bool Magnetic>
[[nodiscard]] inline FaceFlux llf(const FaceState& left, const FaceState& right, double bn,
                                  const Eos& eos) {
  const FaceConserved ul = conserved<Eos, Magnetic>(left, bn, eos);
  const FaceConserved ur = conserved<Eos, Magnetic>(right, bn, eos);
  const FaceFlux fl = physical_flux<Eos, Magnetic>(left, bn, eos);
  const FaceFlux fr = physical_flux<Eos, Magnetic>(right, bn, eos);
  const double s = std::max(std::abs(left.vn) + fast_speed<Eos, Magnetic>(left, bn, eos),
                            std::abs(right.vn) + fast_speed<Eos, Magnetic>(right, bn, eos));
  // The HLL flux with S_L = −s, S_R = s is exactly the Rusanov flux.
  return hll_flux(ul, ur, fl, fr, -s, s);
}

struct Llf {
  static constexpr bool supports_magnetic = true;
  static constexpr bool supports_hydro = true;
  template <class Eos, bool Magnetic>
  [[nodiscard]] static FaceFlux flux(const FaceState& left, const FaceState& right, double bn,
                                     const Eos& eos) {
    return llf<Eos, Magnetic>(left, right, bn, eos);
  }
};

}  // namespace brume::solver
