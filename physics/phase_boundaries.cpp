#include "physics/phase_boundaries.hpp"


#include "io/config/error.hpp"
#include "io/config/number_text.hpp"
#include "physics/cooling_equilibrium.hpp"
#include "physics/cooling_settings.hpp"
#include "solver/units/dimension.hpp"

namespace brume::physics {

namespace {

namespace dim = units::dim;

std::optional<config::Issue> ordered(const config::SectionValues& values) {
  const double cold = values.real("cold_below"), warm = values.real("warm_above");
  if (cold > 0.0 && warm > 0.0 && !(cold < warm)) {
    return config::Issue{"warm_above", "warm_above must exceed cold_below"};
  }
  return std::nullopt;
}

std::string kelvin(double t) {
  return config::format_digits(t, 4) + " K";
}

}  // namespace

config::Section phases_section() {
  return {"phases",
          "Temperatures that split the gas into cold, thermally unstable and warm phases for "
          "the statistics (docs/statistics.md).",
          {config::quantity_key("cold_below", dim::temperature, "K",
                                "Gas colder than this is cold; 0: the low-temperature end of "
                                "the isobarically unstable range of the cooling function.")
               .with_default("0 K")
               .at_least(0),
           config::quantity_key("warm_above", dim::temperature, "K",
                                "Gas hotter than this is warm; 0: the high-temperature end of "
                                "the isobarically unstable range of the cooling function.")
               .with_default("0 K")
               .at_least(0)},
          {ordered},
          std::nullopt};
}

PhaseBoundaries phase_boundaries(const config::ResolvedConfig& config) {
  PhaseBoundaries b;
  b.cold_below = config.real("phases.cold_below");
  b.warm_above = config.real("phases.warm_above");
  if (b.cold_below > 0.0 && b.warm_above > 0.0) {
    b.origin = "set by hand (phases.cold_below, phases.warm_above)";
    return b;
  }
  // The cooling section's function, whether or not cooling is on: its defaults describe the
  // neutral ISM (Koyama & Inutsuka 2002).
  const CoolingSettings cooling = cooling_settings(config);
  const UnstableRange range = unstable_range(cooling.net);
  if (!range.found) {
    const char* key = b.cold_below > 0.0 ? "phases.warm_above" : "phases.cold_below";
    const config::Source& where = config.source(key);
    throw config::Error(where.where, where.line, where.column, key,
                        "the cooling function has no isobarically unstable range to take the "
                        "phase boundaries from; set phases.cold_below and phases.warm_above");
  }
  if (b.cold_below <= 0.0) b.cold_below = range.t_low;
  if (b.warm_above <= 0.0) b.warm_above = range.t_high;
  b.origin = "isobarically unstable range of the " +
             std::string(config.flag("cooling.enabled") ? "" : "(inactive) ") +
             "cooling function: " + kelvin(range.t_low) + " to " + kelvin(range.t_high);
  return b;
}

}  // namespace brume::physics
