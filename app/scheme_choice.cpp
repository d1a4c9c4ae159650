#include "app/scheme_choice.hpp"

#include <stdexcept>

#include "solver/units/constants.hpp"

namespace brume::app {

namespace {

solver::Reconstruction reconstruction(const std::string& name) {
  if (name == "donor") return solver::Reconstruction::donor_cell;
  if (name == "plm") return solver::Reconstruction::plm;
  if (name == "ppm") return solver::Reconstruction::ppm;
  throw std::logic_error("unhandled reconstruction '" + name + "'");
}

solver::RiemannSolver riemann(const std::string& name) {
  if (name == "llf") return solver::RiemannSolver::llf;
  if (name == "hlle") return solver::RiemannSolver::hlle;
  if (name == "hllc") return solver::RiemannSolver::hllc;
  if (name == "hlld") return solver::RiemannSolver::hlld;
  throw std::logic_error("unhandled Riemann solver '" + name + "'");
}

solver::BoundaryKind boundary(const std::string& name) {
  if (name == "periodic") return solver::BoundaryKind::periodic;
  if (name == "outflow") return solver::BoundaryKind::outflow;
  if (name == "reflecting") return solver::BoundaryKind::reflecting;
  throw std::logic_error("unhandled boundary '" + name + "'");
}

}  // namespace

solver::SchemeOptions scheme_options(const config::ResolvedConfig& config, const RunSetup& setup) {
  solver::SchemeOptions options;
  options.reconstruction = reconstruction(config.text("scheme.reconstruction"));
  options.limiter = config.text("scheme.limiter") == "van_leer"
                        ? solver::SlopeLimiter::van_leer
                        : solver::SlopeLimiter::monotonized_central;
  options.ppm_limiter = config.text("scheme.ppm_limiter") == "extremum_preserving"
                            ? solver::PpmLimiter::extremum_preserving
                            : solver::PpmLimiter::monotone;
  options.characteristic = config.flag("scheme.characteristic_limiting");
  options.riemann = riemann(config.text("scheme.riemann_solver"));
  options.eos = setup.isothermal ? solver::GasModel::isothermal : solver::GasModel::ideal_gas;
  options.gamma = setup.gamma;
  options.sound_speed = setup.sound_speed;
  options.magnetic = setup.magnetic;
  options.courant = config.real("scheme.courant");
  const units::CodeUnits& u = setup.code_units;
  options.density_floor = setup.mean_molecular_weight * units::cgs::hydrogen_mass *
                          config.real("scheme.density_floor") / u.density;
  options.pressure_floor = config.real("scheme.pressure_floor") / u.pressure();
  return options;
}

solver::BoxBoundaries box_boundaries(const config::ResolvedConfig& config) {
  solver::BoxBoundaries b;
  const char* axes[3] = {"x", "y", "z"};
  for (int d = 0; d < 3; ++d) {
    b.lower[d] = boundary(config.text(std::string("box.boundaries.") + axes[d] + "_lower"));
    b.upper[d] = boundary(config.text(std::string("box.boundaries.") + axes[d] + "_upper"));
  }
  return b;
}

}  // namespace brume::app
