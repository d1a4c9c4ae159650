// The configuration section `sky_maps` (synthetic observables: column density and optically thin
// dust-polarization maps with their E/B spectra, docs/sky-maps.md) and the settings it resolves to.
#pragma once

#include <vector>

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"
#include "physics/run_context.hpp"

namespace brume::physics {

// How the total intensity is modelled (docs/sky-maps.md).
enum class SkyIntensity {
  column,               // I = ∫ n ds: a field in the plane of the sky gives p = p0
  alignment_corrected,  // I = ∫ n [1 − p0 (cos²γ − 2/3)] ds
};

struct SkySettings {
  bool enabled = true;
  long long every = 1;                 // at every Nth statistics time
  std::vector<int> axes{0, 1, 2};      // lines of sight, in increasing order
  double polarization_fraction = 0.1;  // p0, a parameter of the model
  SkyIntensity intensity = SkyIntensity::column;
  double density_cut = 0.0;         // code mass density; 0: no cut
  double number_density_cut = 0.0;  // the same in cm^-3, for the notes
  double fit_lowest = 2.0;          // annulus indices (units of 2π / L)
  double fit_highest = 0.0;         // 0: half the largest full annulus of each map
};

[[nodiscard]] config::Section sky_maps_section();
[[nodiscard]] SkySettings sky_settings(const config::ResolvedConfig& config,
                                       const RunContext& context);

}  // namespace brume::physics
