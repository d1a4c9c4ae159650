// Reads a cooling table in brume's own text format (docs/cooling.md):
//   # anything after '#' is a comment; blank lines are ignored
//   # temperature [K]   cooling function Λ [erg cm^3 s^-1]
//   10       1.2e-30
//   20       4.5e-29
// Two positive numbers per data line, temperatures strictly increasing, at least two rows.
#pragma once

#include <string>

#include "physics/cooling_curve.hpp"

namespace brume::physics {

// Throws config::Error naming the file, the line (0 when the file cannot be read), `key_path`
// (the configuration key that named the file) and what was expected there.
[[nodiscard]] CoolingTable read_cooling_table(const std::string& path, const std::string& key_path);

}  // namespace brume::physics
