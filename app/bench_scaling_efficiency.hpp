// Parallel efficiency of the scaling cases: the per-core rate at n ranks over the per-core rate of
// the same series on one rank. Strong scaling (fixed box): rate(n) / (n · rate(1)) with rate the
// box's cell-updates per second; weak scaling (fixed block per rank): the same ratio of per-core
// rates, i.e. t(1) / t(n) for one step. Common practice, no source.
#pragma once

#include <string>
#include <vector>

#include "app/bench_decomposed_case.hpp"

namespace brume::app {

struct ScalingEntry {
  std::string series;  // "strong" or "weak"
  DecomposedResult result;
  double efficiency = 0.0;            // mean over the timed steps
  double best_step_efficiency = 0.0;  // of the fastest steps
};

// Sets the efficiencies of every entry from the one-rank entry of its series (same series, scheme
// and size); an entry without one gets none (0).
void set_efficiencies(std::vector<ScalingEntry>& entries);

}  // namespace brume::app
