// The sign of the mass flux through a face, which selects the upwind side of the edge EMFs of
// constrained transport (solver/constrained_transport.hpp).
#pragma once

#include <cmath>
#include <cstdint>

namespace brume::solver {

// Below this fraction of the face's mass-flux scale sqrt(ρ_L + ρ_R) sqrt(|F_mn|) (≈ ρ c_f) the
// mass flux counts as zero. A flux that vanishes in exact arithmetic (gas at rest, uniform
// states whose field differs in the last bits) comes out of the Riemann solver as ±1e-14 of that
// scale (measured); its sign would pick one of two upwind candidates of the edge EMF that differ
// at first order, so that round-off decides an O(Δt ΔE/Δx) change of the face field. 1e-10 is far
// above that noise and far below any flux whose direction matters (common practice, no source).
inline constexpr double negligible_mass_flux = 1e-10;

// −1, 0 or 1: the sign of `mass_flux`, 0 when |F_ρ| ≤ ε sqrt((ρ_L + ρ_R) |F_mn|), so that the
// edge EMF takes the average of both candidates, as for a vanishing flux. Gardiner & Stone 2005,
// J. Comput. Phys. 205, 509, §3.2 (upwinding by the sign of the mass flux; from memory).
[[nodiscard]] inline std::int8_t mass_flux_sign(double mass_flux, double density_sum,
                                                double momentum_flux) {
  const double floor2 =
      negligible_mass_flux * negligible_mass_flux * density_sum * std::fabs(momentum_flux);
  const int counts = int(mass_flux * mass_flux > floor2);
  return std::int8_t(counts * (int(mass_flux > 0.0) - int(mass_flux < 0.0)));
}

}  // namespace brume::solver
