#include "physics/structure_settings.hpp"

#include <string>

#include "io/config/number_text.hpp"
#include "physics/phase_boundaries.hpp"
#include "solver/units/dimension.hpp"

namespace brume::physics {

namespace {

std::optional<config::Issue> fit_range_ordered(const config::SectionValues& values) {
  if (values.integer("fit_highest_lag") <= values.integer("fit_lowest_lag")) {
    return config::Issue{
        "fit_highest_lag",
        "is " + std::to_string(values.integer("fit_highest_lag")) + ", not above fit_lowest_lag (" +
            std::to_string(values.integer("fit_lowest_lag")) + "); a slope needs a range of lags"};
  }
  return std::nullopt;
}

}  // namespace

config::Section structure_functions_section() {
  using namespace config;
  return {
      "structure_functions",
      "Velocity structure functions along the axes, the flux-based third-order function and "
      "the velocity dispersion of cold gas versus scale (docs/structure-functions.md).",
      {flag_key("enabled", "Measure the structure functions.").with_default("true"),
       integer_key("every", "Measure at every Nth statistics time (statistics.interval).")
           .with_default("1")
           .at_least(1),
       integer_key("max_order", "Highest order p of S_p = <|dv|^p> (p = 1 ... max_order).")
           .with_default("6")
           .at_least(1)
           .at_most(6),
       choice_key("lag_set",
                  {{"every_cell", "Every integer lag 1 ... N/2 cells."},
                   {"logarithmic",
                    "Integer lags near 2^(k / lags_per_octave), 1 ... N/2 cells, N/2 included."}},
                  "Which lags (in cells; N: the fewest cells of an axis with more than one).")
           .with_default("logarithmic"),
       integer_key("lags_per_octave", "Lags per factor 2 of the logarithmic set.")
           .with_default("4")
           .at_least(1)
           .at_most(16),
       integer_key("fit_lowest_lag", "Smallest lag (cells) of the size-linewidth fit.")
           .with_default("2")
           .at_least(1),
       integer_key("fit_highest_lag", "Largest lag (cells) of the size-linewidth fit.")
           .with_default("16")
           .at_least(2),
       integer_key("minimum_cold_pairs",
                   "Lags with fewer pairs of cold cells are left out of the fit.")
           .with_default("1000")
           .at_least(1)},
      {fit_range_ordered},
      std::nullopt};
}

StructureSettings structure_settings(const config::ResolvedConfig& config) {
  StructureSettings s;
  s.enabled = config.flag("structure_functions.enabled");
  s.every = long(config.integer("structure_functions.every"));
  s.max_order = int(config.integer("structure_functions.max_order"));
  s.lag_set = config.text("structure_functions.lag_set") == "every_cell"
                  ? StructureLagSet::every_cell
                  : StructureLagSet::logarithmic;
  s.lags_per_octave = int(config.integer("structure_functions.lags_per_octave"));
  s.fit_lowest_lag = long(config.integer("structure_functions.fit_lowest_lag"));
  s.fit_highest_lag = long(config.integer("structure_functions.fit_highest_lag"));
  s.minimum_cold_pairs = long(config.integer("structure_functions.minimum_cold_pairs"));
  for (const char* face : {"x_lower", "x_upper", "y_lower", "y_upper", "z_lower", "z_upper"}) {
    if (config.text(std::string("box.boundaries.") + face) != "periodic") s.periodic_box = false;
  }
  // The cold phase of every statistic is the one of the section `phases`.
  const PhaseBoundaries phases = phase_boundaries(config);
  s.cold_temperature = phases.cold_below;
  s.cold_origin =
      "phases.cold_below (" + config::format_digits(phases.cold_below, 6) + " K): " + phases.origin;
  return s;
}

}  // namespace brume::physics
