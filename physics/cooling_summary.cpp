#include "physics/cooling_summary.hpp"

#include <cmath>

#include "io/config/number_text.hpp"
#include "physics/cooling_equilibrium.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics {

namespace {

std::string number(double value, const char* unit) {
  return config::format_digits(value, 4) + " " + unit;
}

}  // namespace

std::vector<std::pair<std::string, std::string>> cooling_summary(const CoolingSettings& s,
                                                                 double gamma) {
  namespace cgs = units::cgs;
  const TemperatureBracket bracket{s.temperature_floor, s.temperature_ceiling};
  std::vector<std::pair<std::string, std::string>> lines;
  for (const double n : {0.1, 1.0, 10.0, 100.0}) {
    const double t = equilibrium_temperature(s.net, n, bracket);
    std::string value = "none within the temperature floor and ceiling";
    if (!std::isnan(t)) {
      value = number(t, "K") + ", P_eq/k_B " + number(n * t, "K cm^-3") + ", " +
              (isobaric_slope(s.net, n, t) < 0.0 ? "isobarically unstable" : "stable");
    }
    lines.emplace_back("cooling: T_eq at n = " + number(n, "cm^-3"), value);
  }
  const UnstableRange r = unstable_range(s.net, bracket);
  if (!r.found) {
    lines.emplace_back("cooling: isobarically unstable range", "none for n in [1e-4, 1e6] cm^-3");
    return lines;
  }
  lines.emplace_back("cooling: isobarically unstable range",
                     "n " + number(r.n_low, "") + "to " + number(r.n_high, "cm^-3") + ", T " +
                         number(r.t_low, "") + "to " + number(r.t_high, "K"));
  lines.emplace_back(
      "cooling: two-phase pressure range P/k_B",
      number(r.p_min / cgs::boltzmann, "") + "to " + number(r.p_max / cgs::boltzmann, "K cm^-3"));
  const double n_mid = std::sqrt(r.n_low * r.n_high);
  const double t_mid = equilibrium_temperature(s.net, n_mid, bracket);
  // Gross cooling time e / (n²Λ) at equilibrium: the time scale of the instability.
  const double t_cool =
      n_mid * cgs::boltzmann * t_mid / ((gamma - 1.0) * n_mid * n_mid * s.net.lambda(t_mid).lambda);
  lines.emplace_back("cooling: cooling time e/(n^2 Lambda) at n = " + number(n_mid, "cm^-3"),
                     number(t_cool / cgs::megayear, "Myr"));
  return lines;
}

}  // namespace brume::physics
