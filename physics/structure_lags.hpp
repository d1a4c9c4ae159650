// The lags (in cells) at which structure functions are measured.
#pragma once

#include <vector>

#include "physics/structure_settings.hpp"

namespace brume::physics {

// Lags 1 … half_cells ascending, without repeats: every integer, or the integers nearest
// 2^(k / lags_per_octave) for k = 0, 1, … with half_cells always included. Empty when
// half_cells < 1.
[[nodiscard]] std::vector<long> structure_lags(StructureLagSet set, int lags_per_octave,
                                               long half_cells);

}  // namespace brume::physics
