// Instances of the VL2 integrator for one equation of state and field choice.
#include "solver/vl2_dispatch.hpp"

namespace brume::solver {

std::unique_ptr<Integrator> make_vl2_isothermal_hydro(const SchemeOptions& o,
                                                      const BlockGeometry& g,
                                                      std::shared_ptr<const GhostFiller> ghosts) {
  return make_vl2<Isothermal, false>(o, g, std::move(ghosts), Isothermal{o.sound_speed});
}

}  // namespace brume::solver
