// Thermal equilibrium of a net cooling function (cgs: n in cm^-3, T in K, P in erg cm^-3):
// the equilibrium curve n Λ(T) = Γ, its isobarically unstable part (Field 1965, ApJ 142, 531),
// the two-phase pressure range and the Field length once a conductivity κ is known.
#pragma once

#include "physics/cooling_curve.hpp"

namespace brume::physics {

// Where the equilibrium temperature is searched (K).
struct TemperatureBracket {
  double low = 10.0;
  double high = 1e9;
};

// The lowest T in the bracket with n Λ(T) = Γ; NaN when the net rate keeps one sign there.
[[nodiscard]] double equilibrium_temperature(const NetCooling& net, double n,
                                             TemperatureBracket bracket = {});

// n k_B T_eq(n); NaN where T_eq is.
[[nodiscard]] double equilibrium_pressure(const NetCooling& net, double n,
                                          TemperatureBracket bracket = {});

// (∂𝓛/∂ln T) at constant pressure of 𝓛 = n²Λ − nΓ (n ∝ 1/T): n²TΛ' − 2n²Λ + nΓ, erg cm^-3 s^-1.
// Negative: isobarically unstable (Field 1965, ApJ 142, 531, criterion (∂ℒ/∂T)_P < 0; equation
// number not looked up).
[[nodiscard]] double isobaric_slope(const NetCooling& net, double n, double t);

// The first interval of densities whose equilibrium is isobarically unstable, within the scanned
// densities [1e-4, 1e6] cm^-3; on it P_eq falls with n, so P_max = P_eq(n_low) and
// P_min = P_eq(n_high) bound the pressures at which two stable phases coexist.
struct UnstableRange {
  bool found = false;
  double n_low = 0.0, n_high = 0.0;  // cm^-3
  double t_low = 0.0, t_high = 0.0;  // K: T_eq(n_high) and T_eq(n_low)
  double p_min = 0.0, p_max = 0.0;   // erg cm^-3
};
[[nodiscard]] UnstableRange unstable_range(const NetCooling& net, TemperatureBracket bracket = {});

// The density on the unstable branch of `range` with P_eq(n) = p (bisection in ln n); NaN
// when p is outside [p_min, p_max].
[[nodiscard]] double unstable_density_at_pressure(const NetCooling& net, const UnstableRange& range,
                                                  double p, TemperatureBracket bracket = {});

// e / |𝓛| with e = n k_B T/(γ − 1), s.
[[nodiscard]] double cooling_time(const NetCooling& net, double n, double t, double gamma);

// With a conductivity κ (erg s^-1 cm^-1 K^-1): the shortest wavelength of isobaric growth,
// 2π √(κT / −(∂𝓛/∂ln T)_p), from Field's (1965, ApJ 142, 531) cubic with conduction (its constant
// term changes sign there; derived in docs/cooling.md); NaN where the gas is stable.
[[nodiscard]] double field_critical_wavelength(const NetCooling& net, double n, double t,
                                               double conductivity);

// The usual estimate λ_F = √(κT / (n²Λ)) (Begelman & McKee 1990, ApJ 358, 375, eq. 1; from
// memory), cm.
[[nodiscard]] double field_length(const NetCooling& net, double n, double t, double conductivity);

}  // namespace brume::physics
