// Unit factors the tests compare against, computed from their definitions.
#pragma once

#include <numbers>

namespace brume::config::testing {

// IAU 2012 Resolution B2: 1 au = 149597870700 m exactly; IAU 2015 Resolution B2:
// 1 pc = 648000/π au.
inline constexpr double au_cm = 1.495978707e13;
inline constexpr double parsec_cm = 648000.0 / std::numbers::pi * au_cm;
// Julian year of 365.25 days of 86400 s (IAU convention, common practice).
inline constexpr double megayear_s = 1e6 * 365.25 * 86400.0;
// Boltzmann constant, exact since the 2019 SI redefinition: 1.380649e-23 J/K.
inline constexpr double boltzmann_erg_per_k = 1.380649e-16;
// Relative tolerance when a factor may be composed in another order than here: a few ulp.
inline constexpr double factor_tolerance = 1e-14;

}  // namespace brume::config::testing
