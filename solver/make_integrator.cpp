#include <stdexcept>
#include <string>

#include "solver/integrator.hpp"
#include "solver/vl2_dispatch.hpp"

namespace brume::solver {

int required_ghost_layers(const SchemeOptions& options) {
  switch (options.reconstruction) {
    case Reconstruction::donor_cell:
      return DonorCell::stencil;
    case Reconstruction::plm:
      return options.characteristic ? PlmCharacteristicMonotonizedCentral::stencil
                                    : PlmMonotonizedCentral::stencil;
    case Reconstruction::ppm:
      return options.ppm_limiter == PpmLimiter::monotone ? Ppm::stencil
                                                         : PpmExtremumPreserving::stencil;
  }
  return Ppm::stencil;
}

std::unique_ptr<Integrator> make_integrator(const SchemeOptions& o, const BlockGeometry& g,
                                            std::shared_ptr<const GhostFiller> ghosts) {
  if (o.characteristic && o.reconstruction != Reconstruction::plm) {
    throw std::invalid_argument("scheme: characteristic limiting is available with plm only");
  }
  if (!(o.courant > 0.0) || !(o.density_floor > 0.0) || !(o.pressure_floor > 0.0)) {
    throw std::invalid_argument("scheme: courant number and floors must be positive");
  }
  if (o.eos == GasModel::ideal_gas && !(o.gamma > 1.0)) {
    throw std::invalid_argument("scheme: the adiabatic index gamma must exceed 1");
  }
  if (o.eos == GasModel::isothermal && !(o.sound_speed > 0.0)) {
    throw std::invalid_argument("scheme: the isothermal sound speed must be positive");
  }
  if (g.ghost_layers < required_ghost_layers(o)) {
    throw std::invalid_argument("scheme: the block has " + std::to_string(g.ghost_layers) +
                                " ghost layers, the reconstruction needs " +
                                std::to_string(required_ghost_layers(o)));
  }
  if (!ghosts) throw std::invalid_argument("scheme: no ghost filler given");
  if (o.eos == GasModel::ideal_gas) {
    return o.magnetic ? make_vl2_ideal_mhd(o, g, std::move(ghosts))
                      : make_vl2_ideal_hydro(o, g, std::move(ghosts));
  }
  return o.magnetic ? make_vl2_isothermal_mhd(o, g, std::move(ghosts))
                    : make_vl2_isothermal_hydro(o, g, std::move(ghosts));
}

}  // namespace brume::solver
