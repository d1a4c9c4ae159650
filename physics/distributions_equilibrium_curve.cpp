#include "physics/distributions_equilibrium_curve.hpp"

#include "physics/cooling_equilibrium.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics {

// n Λ(T_eq) = Γ, the lowest root (physics/cooling_equilibrium.hpp; Field 1965, ApJ 142, 531).
EquilibriumCurve equilibrium_curve(const CoolingSettings& cooling, const LogBins& density) {
  EquilibriumCurve curve;
  curve.density = density.centres();
  curve.pressure.reserve(curve.density.size());
  const TemperatureBracket bracket{cooling.temperature_floor, cooling.temperature_ceiling};
  for (const double n : curve.density) {
    curve.pressure.push_back(equilibrium_pressure(cooling.net, n, bracket) / units::cgs::boltzmann);
  }
  return curve;
}

}  // namespace brume::physics
