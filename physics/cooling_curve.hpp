// The optically thin cooling function Λ(T) (erg cm^3 s^-1) and the net cooling rate per volume
// n²Λ(T) − nΓ with a constant heating rate Γ per particle (erg s^-1). Two forms: the analytic fit
// of Koyama & Inutsuka 2002 and a table read from a file (cooling_table_reader.hpp). Each is a
// concrete type so that the per-cell integrator is instantiated for it at compile time.
#pragma once

#include <variant>
#include <vector>

namespace brume::physics {

// Λ and dΛ/dT at one temperature (erg cm^3 s^-1 and erg cm^3 s^-1 K^-1).
struct CoolingValue {
  double lambda = 0.0;
  double slope = 0.0;
};

// Koyama & Inutsuka 2002, ApJ 564, L97, eq. 4 as corrected by Vázquez-Semadeni et al. 2007,
// ApJ 657, 870, eq. 5 (from memory): Λ/Γ_0 = 1e7 exp(−1.184e5/(T + 1000)) + 1.4e-2 √T exp(−92/T)
// cm^3 with Γ_0 = 2e-26 erg s^-1. T in K.
struct KoyamaInutsukaFit {
  static constexpr double reference_heating = 2.0e-26;  // erg s^-1, Γ_0 of the fit
  [[nodiscard]] CoolingValue operator()(double temperature) const;
};

// Λ(T) interpolated linearly in (ln T, ln Λ) between rows (a piecewise power law), the end
// segments' power laws extended beyond the first and last rows.
class CoolingTable {
 public:
  // Temperatures (K) strictly increasing, Λ > 0; at least two rows (the reader checks).
  CoolingTable(const std::vector<double>& temperature, const std::vector<double>& lambda);
  [[nodiscard]] CoolingValue operator()(double temperature) const;
  [[nodiscard]] std::size_t rows() const { return log_t_.size(); }
  [[nodiscard]] double lowest_temperature() const;
  [[nodiscard]] double highest_temperature() const;

 private:
  std::vector<double> log_t_;
  std::vector<double> log_lambda_;
};

using CoolingFunction = std::variant<KoyamaInutsukaFit, CoolingTable>;

// The net cooling of the gas: Λ(T) from `function`, heating Γ per particle.
struct NetCooling {
  CoolingFunction function;
  double heating = KoyamaInutsukaFit::reference_heating;  // Γ, erg s^-1

  [[nodiscard]] CoolingValue lambda(double temperature) const;
  // n²Λ(T) − nΓ, erg cm^-3 s^-1, for n in cm^-3 and T in K.
  [[nodiscard]] double rate(double number_density, double temperature) const;
};

}  // namespace brume::physics
