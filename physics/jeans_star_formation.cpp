#include "physics/jeans_star_formation.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>

namespace brume::physics {

// Federrath & Klessen 2012, ApJ 761, 156, §2 (from memory).
double box_virial_parameter(double velocity_dispersion_squared, double gravitational_constant,
                            double mean_density, double box_length) {
  return 5.0 * velocity_dispersion_squared /
         (std::numbers::pi * gravitational_constant * mean_density * box_length * box_length);
}

// Krumholz & McKee 2005, ApJ 630, 250; Federrath & Klessen 2012, Table 1, KM (from memory).
double km_critical_log_density(double phi_x, double virial_parameter, double mach, double beta) {
  const double pi2 = std::numbers::pi * std::numbers::pi;
  const double x = pi2 / 5.0 * phi_x * phi_x * virial_parameter * mach * mach / (1.0 + 1.0 / beta);
  if (!(x > 0.0) || !std::isfinite(x)) return std::numeric_limits<double>::quiet_NaN();
  return std::log(x);
}

// Federrath & Klessen 2012, ApJ 761, 156, multi-ff integral (from memory).
double multi_free_fall_integral(const std::vector<double>& fractions, double s_lowest,
                                double s_highest, double s_crit) {
  const auto bins = double(fractions.size());
  const double width = (s_highest - s_lowest) / bins;
  double sum = 0.0;
  for (std::size_t k = 0; k < fractions.size(); ++k) {
    const double a = s_lowest + (s_highest - s_lowest) * double(k) / bins;
    const double b = s_lowest + (s_highest - s_lowest) * double(k + 1) / bins;
    if (b <= s_crit || fractions[k] == 0.0) continue;
    const double from = std::max(a, s_crit);
    sum += fractions[k] / width * (2.0 / 3.0) * (std::exp(1.5 * b) - std::exp(1.5 * from));
  }
  return sum;
}

}  // namespace brume::physics
