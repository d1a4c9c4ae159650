#include "app/schema.hpp"

#include "app/diagnostics.hpp"
#include "io/config/core_sections.hpp"
#include "physics/cooling_settings.hpp"
#include "physics/diffusion_section.hpp"
#include "physics/distributions_settings.hpp"
#include "physics/jeans_settings.hpp"
#include "physics/phase_boundaries.hpp"
#include "physics/sky_settings.hpp"
#include "physics/spectra_settings.hpp"
#include "physics/stirring_settings.hpp"
#include "physics/structure_settings.hpp"
#include "problems/problem.hpp"

namespace brume::app {

const config::Schema& brume_schema() {
  static const config::Schema schema = config::Schema::combine({
      config::core_sections(problems::problem_choices()),
      problems::problem_sections(),
      {physics::stirring_section()},
      {physics::cooling_section()},
      {physics::diffusion_section()},
      {statistics_section()},
      {physics::phases_section()},
      {physics::sky_maps_section()},
      {physics::distributions_section(), physics::jeans_section()},
      {physics::structure_functions_section()},
      {physics::spectra_section()},
  });
  return schema;
}

}  // namespace brume::app
