// The one call a stage makes to refresh ghost cells and ghost faces of a state. Box boundaries
// implement it now; a halo exchange between blocks will implement it for internal block faces.
#pragma once

#include "solver/state.hpp"

namespace brume::solver {

class GhostFiller {
 public:
  virtual ~GhostFiller() = default;
  // Fill every ghost cell and ghost face (including edges and corners) of `state`.
  virtual void fill(State& state) const = 0;
};

}  // namespace brume::solver
