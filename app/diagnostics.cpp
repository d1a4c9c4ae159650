#include "app/diagnostics.hpp"

#include "physics/box_overview.hpp"
#include "physics/distributions_diagnostic.hpp"
#include "physics/jeans_diagnostic.hpp"
#include "physics/phase_boundaries.hpp"
#include "physics/sky_maps.hpp"
#include "physics/spectra_diagnostic.hpp"
#include "physics/structure_functions.hpp"
#include "solver/units/dimension.hpp"

namespace brume::app {

config::Section statistics_section() {
  namespace dim = units::dim;
  return {"statistics",
          "When the run measures itself: the time series and the statistics files "
          "(docs/statistics.md).",
          {config::quantity_key("interval", dim::time, "Myr",
                                "Simulated time between statistics files (statistics-NNNN.h5); "
                                "0: at every snapshot. Each diagnostic runs at every Nth of "
                                "these times (its own key `every`).")
               .with_default("0 Myr")
               .at_least(0),
           config::integer_key("timeline_every",
                               "Steps between rows of the time series (timeline.txt, "
                               "timeline.h5); 0: none.")
               .with_default("10")
               .at_least(0)},
          {},
          std::nullopt};
}

std::vector<ScheduledDiagnostic> make_diagnostics(const config::ResolvedConfig& config,
                                                  const physics::RunContext& context) {
  std::vector<ScheduledDiagnostic> list;
  list.push_back({std::make_unique<physics::BoxOverview>(physics::phase_boundaries(config)), 1});
  // Each diagnostic family adds itself here when its section enables it.
  if (config.flag("sky_maps.enabled"))
    list.push_back({physics::make_sky_maps(config, context), config.integer("sky_maps.every")});
  if (auto d = physics::make_distributions(config, context))
    list.push_back({std::move(d), config.integer("distributions.every")});
  if (auto d = physics::make_jeans(config, context))
    list.push_back({std::move(d), config.integer("jeans.every")});
  if (auto d = physics::make_structure_functions(config, context))
    list.push_back({std::move(d), config.integer("structure_functions.every")});
  if (auto d = physics::make_spectra(config, context))
    list.push_back({std::move(d), config.integer("spectra.every")});
  (void)context;
  return list;
}

}  // namespace brume::app
