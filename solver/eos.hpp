// Equations of state, chosen at compile time: the solver templates take one of these types.
#pragma once

namespace brume::solver {

// Ideal gas, p = (γ − 1) e_thermal.
struct IdealGas {
  static constexpr bool isothermal = false;
  double gamma = 5.0 / 3.0;
  [[nodiscard]] double sound_speed_sq(double density, double pressure) const {
    return gamma * pressure / density;
  }
};

// Isothermal gas, p = c_s² ρ; there is no energy equation.
struct Isothermal {
  static constexpr bool isothermal = true;
  double sound_speed = 1.0;
  [[nodiscard]] double sound_speed_sq(double /*density*/, double /*pressure*/) const {
    return sound_speed * sound_speed;
  }
};

}  // namespace brume::solver
