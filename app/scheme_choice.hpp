// The solver's options and box boundaries as the configuration chooses them.
#pragma once

#include "app/run_setup.hpp"
#include "io/config/resolved.hpp"
#include "solver/box_boundaries.hpp"
#include "solver/integrator.hpp"

namespace brume::app {

[[nodiscard]] solver::SchemeOptions scheme_options(const config::ResolvedConfig& config,
                                                   const RunSetup& setup);

[[nodiscard]] solver::BoxBoundaries box_boundaries(const config::ResolvedConfig& config);

}  // namespace brume::app
