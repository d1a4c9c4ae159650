// The configuration section `jeans` (Jeans resolution of the gas and the multi-free-fall
// star-formation rate estimated from its density PDF) and the settings it resolves to.
#pragma once

#include <cstddef>

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"

namespace brume::physics {

struct JeansSettings {
  bool enabled = true;
  long every = 1;
  double cells = 4.0;                     // resolution length in cells when length is 0
  double length = 0.0;                    // resolution length, cm; 0: cells × the cell width
  bool magnetic_support = false;          // √(c_s² + v_A²) in place of c_s in the Jeans length
  double efficiency = 0.5;                // ε
  double time_factor = 1.91;              // φ_t
  double critical_density_factor = 1.12;  // φ_x
  std::size_t pdf_bins = 400;             // bins of s = ln(ρ/ρ̄)
  double pdf_lowest = -20.0;              // s of the first bin's lower edge
  double pdf_highest = 20.0;              // s of the last bin's upper edge
};

[[nodiscard]] config::Section jeans_section();
[[nodiscard]] JeansSettings jeans_settings(const config::ResolvedConfig& config);

}  // namespace brume::physics
