#include "app/bench_scaling_efficiency.hpp"

namespace brume::app {

namespace {

bool same_series(const ScalingEntry& a, const ScalingEntry& b) {
  const BenchCase &x = a.result.step.setup, &y = b.result.step.setup;
  return a.series == b.series && x.physics == y.physics && x.reconstruction == y.reconstruction &&
         x.riemann == y.riemann && x.cells == y.cells;
}

}  // namespace

void set_efficiencies(std::vector<ScalingEntry>& entries) {
  for (ScalingEntry& e : entries) {
    e.efficiency = e.best_step_efficiency = 0.0;
    for (const ScalingEntry& one : entries) {
      if (one.result.step.ranks != 1 || !same_series(e, one)) continue;
      const BenchResult &n = e.result.step, &base = one.result.step;
      e.efficiency = n.cell_updates_per_second_per_core / base.cell_updates_per_second_per_core;
      e.best_step_efficiency =
          n.best_cell_updates_per_second_per_core / base.best_cell_updates_per_second_per_core;
    }
  }
}

}  // namespace brume::app
