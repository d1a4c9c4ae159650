// Conserved ↔ primitive variables of one cell and the fast magnetosonic speed.
// Code units: B includes 1/sqrt(4π); E = p/(γ−1) + ρv²/2 + B²/2.
#pragma once

#include <cmath>

#include "solver/eos.hpp"

namespace brume::solver {

struct CellPrimitive {
  double density;
  double vx, vy, vz;
  double pressure;  // c_s² ρ for isothermal gas
};

// Gas pressure from conserved variables; `b2` = B². Isothermal: c_s² ρ, energy unused.
template <class Eos>
[[nodiscard]] inline double pressure_from_conserved(double rho, double mx, double my, double mz,
                                                    [[maybe_unused]] double energy,
                                                    [[maybe_unused]] double b2, const Eos& eos) {
  if constexpr (Eos::isothermal) {
    (void)mx, (void)my, (void)mz;
    return eos.sound_speed_sq(rho, 0.0) * rho;
  } else {
    const double kinetic = 0.5 * (mx * mx + my * my + mz * mz) / rho;
    return (eos.gamma - 1.0) * (energy - kinetic - 0.5 * b2);
  }
}

template <class Eos>
[[nodiscard]] inline CellPrimitive to_primitive(double rho, double mx, double my, double mz,
                                                double energy, double b2, const Eos& eos) {
  const double inv = 1.0 / rho;
  return {rho, mx * inv, my * inv, mz * inv,
          pressure_from_conserved(rho, mx, my, mz, energy, b2, eos)};
}

// Total energy of a primitive state (zero for isothermal gas, which has no energy equation).
template <class Eos>
[[nodiscard]] inline double total_energy_of(const CellPrimitive& w, double b2, const Eos& eos) {
  if constexpr (Eos::isothermal) {
    (void)w, (void)b2, (void)eos;
    return 0.0;
  } else {
    return w.pressure / (eos.gamma - 1.0) +
           0.5 * w.density * (w.vx * w.vx + w.vy * w.vy + w.vz * w.vz) + 0.5 * b2;
  }
}

// Fast magnetosonic speed along a direction with field component bn; b2 = B².
// c_f² = ½ [a² + B²/ρ + sqrt((a² + B²/ρ)² − 4 a² bn²/ρ)]; the root's argument is written as
// (a² − B²/ρ)² + 4 a² B_t²/ρ, a sum of non-negative terms (same value, no cancellation).
// Common practice (e.g. Stone et al. 2008, ApJS 178, 137, eq. 48, from memory).
template <class Eos>
[[nodiscard]] inline double fast_magnetosonic_speed(double rho, double pressure, double bn,
                                                    double b2, const Eos& eos) {
  const double a2 = eos.sound_speed_sq(rho, pressure);
  const double inv = 1.0 / rho;
  const double va2 = b2 * inv;
  const double bt2_raw = b2 - bn * bn;
  const double bt2 = (bt2_raw > 0.0 ? bt2_raw : 0.0) * inv;  // a select: fmax is a libm call
  const double d = a2 - va2;
  return std::sqrt(0.5 * (a2 + va2 + std::sqrt(d * d + 4.0 * a2 * bt2)));
}

}  // namespace brume::solver
