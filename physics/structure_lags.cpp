#include "physics/structure_lags.hpp"

#include <cmath>

namespace brume::physics {

std::vector<long> structure_lags(StructureLagSet set, int lags_per_octave, long half_cells) {
  std::vector<long> lags;
  if (half_cells < 1) return lags;
  if (set == StructureLagSet::every_cell) {
    for (long lag = 1; lag <= half_cells; ++lag)
      lags.push_back(lag);
    return lags;
  }
  for (int k = 0;; ++k) {
    const long lag = std::lround(std::exp2(double(k) / double(lags_per_octave)));
    if (lag > half_cells) break;
    if (lags.empty() || lag > lags.back()) lags.push_back(lag);
  }
  if (lags.back() != half_cells) lags.push_back(half_cells);
  return lags;
}

}  // namespace brume::physics
