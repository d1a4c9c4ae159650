// The code-unit system: three base units (length, velocity, mass density) and everything derived
// from them. Magnetic field in Gaussian units with the 4π absorbed into the code unit:
// B_code = B_gauss / sqrt(4π ρ_u v_u²), so that the magnetic pressure is B_code²/2 in code units
// and the Alfvén speed is B_code/sqrt(ρ_code).
#pragma once

namespace brume::units {

struct CodeUnits {
  double length = 1.0;    // cm per code length
  double velocity = 1.0;  // cm/s per code velocity
  double density = 1.0;   // g/cm^3 per code density

  [[nodiscard]] double time() const;            // s
  [[nodiscard]] double mass() const;            // g
  [[nodiscard]] double pressure() const;        // erg/cm^3 (= energy density)
  [[nodiscard]] double energy() const;          // erg
  [[nodiscard]] double magnetic_field() const;  // G
  // Temperature for which k_B T / (μ m_H) equals one code velocity squared, for a given mean
  // molecular weight μ (K).
  [[nodiscard]] double temperature(double mean_molecular_weight) const;
};

// Code units from a number density n (cm^-3) of particles of mean mass μ m_H (m_H: mass of a
// hydrogen atom): ρ_u = μ m_H n.
[[nodiscard]] CodeUnits code_units_from_number_density(double length_cm, double velocity_cm_s,
                                                       double number_density_cm3,
                                                       double mean_molecular_weight);

}  // namespace brume::units
