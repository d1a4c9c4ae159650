// The cases `brume bench scaling` measures: for each scheme (3D MHD PLM + HLLD, hydrodynamics
// PLM + HLLC), strong scaling (a fixed box over 1, 2, 4, … ranks) and weak scaling (a fixed block
// per rank, the box growing with the ranks), in the order they run.
#pragma once

#include <array>
#include <string>
#include <vector>

#include "app/bench_decomposed_case.hpp"

namespace brume::app {

struct ScalingCase {
  std::string series;  // "strong" or "weak"
  int ranks = 1;
  DecomposedCase work;
};

// 1, 2, 4, … up to `world` ranks.
[[nodiscard]] std::vector<int> scaling_rank_counts(int world);

// The layout of a weak-scaling box of `ranks` blocks (a power of two): ranks doubled along z,
// then y, then x, in turn (2 → 1 × 1 × 2, 4 → 1 × 2 × 2, 8 → 2 × 2 × 2).
[[nodiscard]] std::array<int, 3> weak_ranks_per_axis(int ranks);

struct ScalingSizes {
  std::vector<int> strong_boxes{64, 128};  // cells per dimension of the strong-scaling boxes
  int weak_block = 64;                     // cells per dimension of a weak-scaling block
  int steps = 0;                           // timed steps; 0: default_steps of the series' size
};

// Every case for rank counts up to `world`. Throws UserError when a strong-scaling box cannot be
// split over one of the rank counts (too few cells per block for the scheme's ghost layers).
[[nodiscard]] std::vector<ScalingCase> scaling_plan(const ScalingSizes& sizes, int world);

}  // namespace brume::app
