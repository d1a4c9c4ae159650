// Turns the run-time scheme options into one compiled Vl2Integrator instance (once per run).
#pragma once

#include <memory>
#include <stdexcept>

#include "solver/characteristic_plm.hpp"
#include "solver/ppm.hpp"
#include "solver/reconstruction.hpp"
#include "solver/riemann/solvers.hpp"
#include "solver/vl2_integrator.hpp"

namespace brume::solver {

template <class Eos, bool Magnetic, class Solver>
std::unique_ptr<Integrator> make_vl2_with_solver(const SchemeOptions& o, const BlockGeometry& g,
                                                 std::shared_ptr<const GhostFiller> ghosts,
                                                 const Eos& eos) {
  if constexpr (Magnetic ? Solver::supports_magnetic : Solver::supports_hydro) {
    switch (o.reconstruction) {
      case Reconstruction::donor_cell:
        return std::make_unique<Vl2Integrator<Eos, Magnetic, DonorCell, Solver>>(o, g, ghosts, eos);
      case Reconstruction::plm:
        if (o.characteristic) {
          if (o.limiter == SlopeLimiter::van_leer) {
            return std::make_unique<Vl2Integrator<Eos, Magnetic, PlmCharacteristicVanLeer, Solver>>(
                o, g, ghosts, eos);
          }
          return std::make_unique<
              Vl2Integrator<Eos, Magnetic, PlmCharacteristicMonotonizedCentral, Solver>>(
              o, g, ghosts, eos);
        }
        if (o.limiter == SlopeLimiter::van_leer) {
          return std::make_unique<Vl2Integrator<Eos, Magnetic, PlmVanLeer, Solver>>(o, g, ghosts,
                                                                                    eos);
        }
        return std::make_unique<Vl2Integrator<Eos, Magnetic, PlmMonotonizedCentral, Solver>>(
            o, g, ghosts, eos);
      case Reconstruction::ppm:
        if (o.ppm_limiter == PpmLimiter::monotone) {
          return std::make_unique<Vl2Integrator<Eos, Magnetic, Ppm, Solver>>(o, g, ghosts, eos);
        }
        return std::make_unique<Vl2Integrator<Eos, Magnetic, PpmExtremumPreserving, Solver>>(
            o, g, ghosts, eos);
    }
    throw std::invalid_argument("scheme: unknown reconstruction");
  } else {
    (void)o, (void)g, (void)ghosts, (void)eos;
    throw std::invalid_argument(Magnetic ? "scheme: this Riemann solver is for hydrodynamics only"
                                         : "scheme: this Riemann solver is for MHD only");
  }
}

template <class Eos, bool Magnetic>
std::unique_ptr<Integrator> make_vl2(const SchemeOptions& o, const BlockGeometry& g,
                                     std::shared_ptr<const GhostFiller> ghosts, const Eos& eos) {
  switch (o.riemann) {
    case RiemannSolver::llf:
      return make_vl2_with_solver<Eos, Magnetic, Llf>(o, g, ghosts, eos);
    case RiemannSolver::hlle:
      return make_vl2_with_solver<Eos, Magnetic, Hlle>(o, g, ghosts, eos);
    case RiemannSolver::hllc:
      return make_vl2_with_solver<Eos, Magnetic, Hllc>(o, g, ghosts, eos);
    case RiemannSolver::hlld:
      return make_vl2_with_solver<Eos, Magnetic, Hlld>(o, g, ghosts, eos);
  }
  throw std::invalid_argument("scheme: unknown Riemann solver");
}

// One per equation of state and field choice, each compiled in its own file.
std::unique_ptr<Integrator> make_vl2_ideal_mhd(const SchemeOptions&, const BlockGeometry&,
                                               std::shared_ptr<const GhostFiller>);
std::unique_ptr<Integrator> make_vl2_ideal_hydro(const SchemeOptions&, const BlockGeometry&,
                                                 std::shared_ptr<const GhostFiller>);
std::unique_ptr<Integrator> make_vl2_isothermal_mhd(const SchemeOptions&, const BlockGeometry&,
                                                    std::shared_ptr<const GhostFiller>);
std::unique_ptr<Integrator> make_vl2_isothermal_hydro(const SchemeOptions&, const BlockGeometry&,
                                                      std::shared_ptr<const GhostFiller>);

}  // namespace brume::solver
