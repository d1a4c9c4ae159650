// What one step reports to the run loop: counts of floors and fallbacks, and a numerical failure.
#pragma once

#include <array>

namespace brume::solver {

// A cell singled out after a stage (the first in k, j, i order of the block): the first with a
// non-finite value, or the first a floor acted on (its values before the floor).
struct NumericalFailure {
  bool occurred = false;
  long step = 0;               // state.step at the start of the failed step
  int stage = 0;               // 1: predictor, 2: corrector
  std::array<long, 3> cell{};  // global cell index
  double density = 0.0;
  std::array<double, 3> momentum{};
  double energy = 0.0;  // zero for isothermal gas
};

struct StepReport {
  long density_floors = 0;   // cell-stages where the density floor was applied
  long pressure_floors = 0;  // cell-stages where the pressure floor was applied
  long fallback_cells = 0;   // cell-stages recomputed with first-order fluxes
  NumericalFailure failure;
  NumericalFailure first_floored;  // the first cell-stage a floor acted on in this step
  [[nodiscard]] bool ok() const { return !failure.occurred; }
};

}  // namespace brume::solver
