#include "solver/units/code_units.hpp"

#include <cmath>
#include <numbers>

#include "solver/units/constants.hpp"

namespace brume::units {

double CodeUnits::time() const {
  return length / velocity;
}

double CodeUnits::mass() const {
  return density * length * length * length;
}

double CodeUnits::pressure() const {
  return density * velocity * velocity;
}

double CodeUnits::energy() const {
  return pressure() * length * length * length;
}

// Gaussian units with 4π absorbed into the code unit: B_code = B_gauss / sqrt(4π ρ_u v_u²), so the
// magnetic pressure B_gauss²/(8π) becomes B_code²/2 in units of ρ_u v_u².
double CodeUnits::magnetic_field() const {
  return std::sqrt(4.0 * std::numbers::pi * density * velocity * velocity);
}

// k_B T / (μ m_H) = v_u²  ⇔  T = μ m_H v_u² / k_B.
double CodeUnits::temperature(double mean_molecular_weight) const {
  return mean_molecular_weight * cgs::hydrogen_mass * velocity * velocity / cgs::boltzmann;
}

CodeUnits code_units_from_number_density(double length_cm, double velocity_cm_s,
                                         double number_density_cm3, double mean_molecular_weight) {
  return {length_cm, velocity_cm_s,
          mean_molecular_weight * cgs::hydrogen_mass * number_density_cm3};
}

}  // namespace brume::units
