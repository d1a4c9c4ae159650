// The configuration section `structure_functions` and the settings it resolves to: which lags,
// which orders, and what counts as cold gas for the size–linewidth measurement.
#pragma once

#include <string>

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"

namespace brume::physics {

enum class StructureLagSet { every_cell, logarithmic };

struct StructureSettings {
  bool enabled = true;
  long every = 1;     // measure at every Nth statistics time
  int max_order = 6;  // S_p for p = 1 … max_order (≤ 6)
  StructureLagSet lag_set = StructureLagSet::logarithmic;
  int lags_per_octave = 4;                                           // logarithmic set only
  double cold_temperature = 300.0;                                   // K: cold gas is T < this
  std::string cold_origin = "structure_functions.cold_temperature";  // for the notes
  long fit_lowest_lag = 2;         // cells: the size–linewidth fit uses the lags in
  long fit_highest_lag = 16;       //        [fit_lowest_lag, fit_highest_lag]
  long minimum_cold_pairs = 1000;  // lags with fewer cold pairs are left out of the fit
  bool periodic_box = true;        // box.boundaries: the shifts wrap, so warn when not periodic
};

[[nodiscard]] config::Section structure_functions_section();

// Reads the section. With cooling on and cold_threshold: cooling_equilibrium, the cold threshold
// is the lower end of the isobarically unstable range of the cooling.* net cooling (when that
// range exists; otherwise cold_temperature, and cold_origin says so).
[[nodiscard]] StructureSettings structure_settings(const config::ResolvedConfig& config);

}  // namespace brume::physics
