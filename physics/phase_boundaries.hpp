// The temperatures that split the gas into cold, thermally unstable and warm phases: by default
// the ends of the isobarically unstable range of the cooling function in use (Field 1965, ApJ
// 142, 531), or set by hand in the section `phases`.
#pragma once

#include <string>

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"

namespace brume::physics {

struct PhaseBoundaries {
  double cold_below = 0.0;  // K: cold gas is colder than this
  double warm_above = 0.0;  // K: warm gas is hotter than this; unstable gas lies between
  std::string origin;       // how they were found, for notes and the log
};

[[nodiscard]] config::Section phases_section();

// Throws config::Error (naming the keys) when the boundaries are left to a cooling function
// that has no unstable range.
[[nodiscard]] PhaseBoundaries phase_boundaries(const config::ResolvedConfig& config);

}  // namespace brume::physics
