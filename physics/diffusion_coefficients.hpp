// The diffusion coefficients in code units, as the operator uses them.
#pragma once

namespace brume::physics {

enum class ConductionLaw {
  none,
  constant,   // κ = κ_ref
  power_law,  // κ = κ_ref (T / T_ref)^a
};

struct DiffusionCoefficients {
  ConductionLaw conduction = ConductionLaw::none;
  // κ in code units (energy flux per gradient of θ = p/ρ, θ in code velocity²) at θ_ref.
  double conductivity = 0.0;
  double reference_theta = 1.0;  // T_ref as θ = T / code_units.temperature(μ)
  double conductivity_exponent = 0.0;
  double viscosity = 0.0;    // kinematic ν, code units
  double resistivity = 0.0;  // η, code units (E = η J with J = ∇ × B)
  double gamma = 5.0 / 3.0;  // adiabatic index: ρ c_v = ρ / (γ − 1) in θ

  [[nodiscard]] bool conducts() const { return conduction != ConductionLaw::none; }
  [[nodiscard]] bool viscous() const { return viscosity > 0.0; }
  [[nodiscard]] bool resistive() const { return resistivity > 0.0; }
};

}  // namespace brume::physics
