#include "app/source_terms.hpp"

#include <utility>

#include "physics/cooling_term.hpp"
#include "physics/diffusion_section.hpp"
#include "physics/diffusion_term.hpp"
#include "physics/stirring_term.hpp"

namespace brume::app {

physics::RunContext run_context(const RunSetup& setup, MPI_Comm comm,
                                std::shared_ptr<const solver::GhostFiller> ghosts) {
  physics::RunContext c;
  c.code_units = setup.code_units;
  c.gamma = setup.gamma;
  c.sound_speed = setup.sound_speed;
  c.mean_molecular_weight = setup.mean_molecular_weight;
  c.isothermal = setup.isothermal;
  c.magnetic = setup.magnetic;
  c.box_cells = setup.cells;
  c.box_lower = setup.lower;
  c.box_size = setup.size;
  c.comm = comm;
  c.ghosts = std::move(ghosts);
  return c;
}

std::vector<std::unique_ptr<physics::SourceTerm>> make_source_terms(
    const config::ResolvedConfig& config, const physics::RunContext& context) {
  std::vector<std::unique_ptr<physics::SourceTerm>> terms;
  // Each module adds its term here when its section asks for it, in the order of the first
  // half step (the header says which).
  (void)config, (void)context;
  if (physics::stirring_enabled(config))
    terms.push_back(physics::make_stirring_term(config, context));
  if (config.flag("cooling.enabled")) {
    terms.push_back(
        std::make_unique<physics::CoolingTerm>(physics::cooling_settings(config), context));
  }
  if (physics::diffusion_requested(config)) {
    terms.push_back(
        std::make_unique<physics::DiffusionTerm>(physics::diffusion_coefficients(config, context),
                                                 physics::diffusion_max_stages(config), context));
  }
  return terms;
}

}  // namespace brume::app
