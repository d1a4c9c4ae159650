// The physical (Euler or ideal-MHD) flux of a face state, its conserved variables and its
// total pressure, in the face frame. Code units: magnetic pressure is B²/2.
// `Magnetic == false` ignores the field arguments (B = 0). Isothermal gas: p = c_s² ρ, and the
// energy component is zero.
#pragma once

#include "solver/riemann/face_algebra.hpp"
#include "solver/riemann/face_state.hpp"

namespace brume::solver {

// Gas pressure: the stored one for an ideal gas, c_s² ρ for isothermal gas.
template <class Eos>
[[nodiscard]] inline double gas_pressure(const FaceState& s, const Eos& eos) {
  if constexpr (Eos::isothermal) {
    return eos.sound_speed_sq(s.density, s.pressure) * s.density;
  } else {
    return s.pressure;
  }
}

// Tangential field seen by the solver: zero for hydrodynamics.
template <bool Magnetic>
[[nodiscard]] inline double field([[maybe_unused]] double b) {
  if constexpr (Magnetic) {
    return b;
  } else {
    return 0.0;
  }
}

// p + B²/2.
template <class Eos, bool Magnetic>
[[nodiscard]] inline double total_pressure(const FaceState& s, double bn, const Eos& eos) {
  const double bt1 = field<Magnetic>(s.bt1), bt2 = field<Magnetic>(s.bt2);
  const double b = field<Magnetic>(bn);
  return gas_pressure(s, eos) + 0.5 * (b * b + bt1 * bt1 + bt2 * bt2);
}

// E = p/(γ−1) + ρv²/2 + B²/2 (zero for isothermal gas).
template <class Eos, bool Magnetic>
[[nodiscard]] inline double total_energy(const FaceState& s, double bn, const Eos& eos) {
  if constexpr (Eos::isothermal) {
    return 0.0;
  } else {
    const double bt1 = field<Magnetic>(s.bt1), bt2 = field<Magnetic>(s.bt2);
    const double b = field<Magnetic>(bn);
    const double v2 = s.vn * s.vn + s.vt1 * s.vt1 + s.vt2 * s.vt2;
    return s.pressure / (eos.gamma - 1.0) + 0.5 * s.density * v2 +
           0.5 * (b * b + bt1 * bt1 + bt2 * bt2);
  }
}

template <class Eos, bool Magnetic>
[[nodiscard]] inline FaceConserved conserved(const FaceState& s, double bn, const Eos& eos) {
  return {s.density,
          s.density * s.vn,
          s.density * s.vt1,
          s.density * s.vt2,
          total_energy<Eos, Magnetic>(s, bn, eos),
          field<Magnetic>(s.bt1),
          field<Magnetic>(s.bt2)};
}

// F(U) of the 1D ideal-MHD (or Euler) equations along the face normal
// (common practice; e.g. Miyoshi & Kusano 2005, J. Comput. Phys. 208, 315, eqs. 2–4).
template <class Eos, bool Magnetic>
[[nodiscard]] inline FaceFlux physical_flux(const FaceState& s, double bn, const Eos& eos) {
  const double b = field<Magnetic>(bn);
  const double bt1 = field<Magnetic>(s.bt1), bt2 = field<Magnetic>(s.bt2);
  const double pt = total_pressure<Eos, Magnetic>(s, bn, eos);
  const double mass = s.density * s.vn;
  double energy = 0.0;
  if constexpr (!Eos::isothermal) {
    const double vb = s.vn * b + s.vt1 * bt1 + s.vt2 * bt2;
    energy = (total_energy<Eos, Magnetic>(s, bn, eos) + pt) * s.vn - b * vb;
  }
  return {mass,   mass * s.vn + pt - b * b, mass * s.vt1 - b * bt1, mass * s.vt2 - b * bt2,
          energy, s.vn * bt1 - b * s.vt1,   s.vn * bt2 - b * s.vt2};
}

}  // namespace brume::solver
