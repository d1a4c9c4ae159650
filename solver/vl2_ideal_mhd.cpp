// Instances of the VL2 integrator for one equation of state and field choice.
#include "solver/vl2_dispatch.hpp"

namespace brume::solver {

std::unique_ptr<Integrator> make_vl2_ideal_mhd(const SchemeOptions& o, const BlockGeometry& g,
                                               std::shared_ptr<const GhostFiller> ghosts) {
  return make_vl2<IdealGas, true>(o, g, std::move(ghosts), IdealGas{o.gamma});
}

}  // namespace brume::solver
