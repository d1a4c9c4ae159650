// Signal speeds of a face state and the outer wave-speed estimates of the HLL-family solvers.
#pragma once

#include <algorithm>
#include <cmath>

#include "solver/riemann/face_state.hpp"
#include "solver/riemann/physical_flux.hpp"

namespace brume::solver {

// Fast magnetosonic speed (the sound speed for hydrodynamics),
// c_f² = ½ [a² + b² + sqrt((a² − b²)² + 4 a² b_t²/ρ)], b² = B²/ρ; the square-root argument is
// written as a sum of non-negative terms (equal to (a² + b²)² − 4 a² b_n²/ρ) to avoid cancellation.
// Common practice, e.g. Miyoshi & Kusano 2005, J. Comput. Phys. 208, 315, eq. 3 and text after it.
template <class Eos, bool Magnetic>
[[nodiscard]] inline double fast_speed(const FaceState& s, double bn, const Eos& eos) {
  const double a2 = eos.sound_speed_sq(s.density, gas_pressure(s, eos));
  if constexpr (!Magnetic) {
    return std::sqrt(a2);
  } else {
    const double inv_rho = 1.0 / s.density;
    const double bt2 = (s.bt1 * s.bt1 + s.bt2 * s.bt2) * inv_rho;
    const double b2 = bn * bn * inv_rho + bt2;
    const double d = a2 - b2;
    return std::sqrt(0.5 * (a2 + b2 + std::sqrt(d * d + 4.0 * a2 * bt2)));
  }
}

struct OuterSpeeds {
  double left, right;
};

// S_L = min(v_L − c_L, v_R − c_R), S_R = max(v_L + c_L, v_R + c_R).
// Davis 1988, SIAM J. Sci. Stat. Comput. 9, 445 (Toro 2009 §10.5.1).
[[nodiscard]] inline OuterSpeeds davis_speeds(double vl, double cl, double vr, double cr) {
  return {std::min(vl - cl, vr - cr), std::max(vl + cl, vr + cr)};
}

// S_L = min(v_L, v_R) − max(c_L, c_R), S_R = max(v_L, v_R) + max(c_L, c_R).
// Miyoshi & Kusano 2005, J. Comput. Phys. 208, 315, eq. 67.
[[nodiscard]] inline OuterSpeeds miyoshi_kusano_speeds(double vl, double cl, double vr, double cr) {
  const double c = std::max(cl, cr);
  return {std::min(vl, vr) - c, std::max(vl, vr) + c};
}

}  // namespace brume::solver
