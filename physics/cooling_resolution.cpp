#include "physics/cooling_resolution.hpp"

#include <cmath>
#include <cstdio>

#include "physics/cooling_equilibrium.hpp"
#include "physics/cooling_settings.hpp"
#include "physics/diffusion_section.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics {

std::optional<FieldLengthCheck> field_length_check(const config::ResolvedConfig& config,
                                                   double cell_size) {
  if (!config.flag("cooling.enabled")) return std::nullopt;
  const CoolingSettings cooling = cooling_settings(config);
  const TemperatureBracket bracket{cooling.temperature_floor, cooling.temperature_ceiling};
  const UnstableRange range = unstable_range(cooling.net, bracket);
  if (!range.found) return std::nullopt;
  FieldLengthCheck check;
  check.conduction = config.text("diffusion.conduction") != "off";
  check.smallest_cells = INFINITY;
  constexpr int points = 60;
  const double n_first = range.n_low, n_last = 10.0 * range.n_high;
  for (int p = 0; p < points; ++p) {
    const double n = n_first * std::pow(n_last / n_first, double(p) / (points - 1));
    const double t = equilibrium_temperature(cooling.net, n, bracket);
    if (std::isnan(t)) continue;
    const double length =
        std::sqrt(conductivity_cgs(config, t) * t / (n * n * cooling.net.lambda(t).lambda));
    if (length / cell_size < check.smallest_cells) {
      check.smallest_cells = length / cell_size;
      check.at_density = n;
      check.field_length = length;
    }
  }
  check.resolved = check.smallest_cells >= field_length_cells_needed;
  return check;
}

std::string field_length_text(const FieldLengthCheck& check) {
  char text[400];
  if (!check.conduction) {
    return "no thermal conduction (diffusion.conduction: off): the Field length is not "
           "resolved at any resolution, thermal instability grows fastest at the grid scale and "
           "the sizes of cold structures are set by the cells (Koyama & Inutsuka 2004); set "
           "diffusion.conduction to resolve it";
  }
  std::snprintf(text, sizeof text,
                "Field length %.3g pc at n = %.3g cm^-3 on the equilibrium curve: %.3g cells%s",
                check.field_length / units::cgs::parsec, check.at_density, check.smallest_cells,
                check.resolved ? " (resolved: at least 3 cells, Koyama & Inutsuka 2004)"
                               : "; fewer than the 3 cells Koyama & Inutsuka (2004) need for "
                                 "converged thermal instability: cold structures depend on the "
                                 "grid");
  return text;
}

}  // namespace brume::physics
