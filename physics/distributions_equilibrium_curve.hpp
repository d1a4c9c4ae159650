// The thermal-equilibrium pressure P_eq(n) = n k_B T_eq(n) of the cooling in use at the centres
// of the density bins, stored beside the pressure-density diagram.
#pragma once

#include <vector>

#include "physics/cooling_settings.hpp"
#include "physics/distributions_log_bins.hpp"

namespace brume::physics {

struct EquilibriumCurve {
  std::vector<double> density;   // cm^-3, geometric bin centres
  std::vector<double> pressure;  // P_eq / k_B, K cm^-3; NaN where n Λ(T) = Γ has no root
};

// Roots searched for within the cooling's temperature floor and ceiling.
[[nodiscard]] EquilibriumCurve equilibrium_curve(const CoolingSettings& cooling,
                                                 const LogBins& density);

}  // namespace brume::physics
