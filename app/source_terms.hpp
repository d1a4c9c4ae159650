// The source terms a configuration asks for, in the order of the first half step: forcing, then
// heating and cooling, then diffusion (conduction, viscosity, resistivity).
#pragma once

#include <memory>
#include <vector>

#include "app/run_setup.hpp"
#include "io/config/resolved.hpp"
#include "physics/run_context.hpp"
#include "physics/source_term.hpp"

namespace brume::app {

[[nodiscard]] physics::RunContext run_context(const RunSetup& setup, MPI_Comm comm,
                                              std::shared_ptr<const solver::GhostFiller> ghosts);

// Throws UserError for a source whose configuration cannot be used (e.g. an unreadable table).
[[nodiscard]] std::vector<std::unique_ptr<physics::SourceTerm>> make_source_terms(
    const config::ResolvedConfig& config, const physics::RunContext& context);

}  // namespace brume::app
