// The configuration section `cooling` and the settings it resolves to.
#pragma once

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"
#include "physics/cooling_curve.hpp"

namespace brume::physics {

struct CoolingSettings {
  bool enabled = false;
  NetCooling net;
  double temperature_floor = 10.0;   // K
  double temperature_ceiling = 1e9;  // K
  double time_step_fraction = 0.0;   // of the shortest cooling time; 0: no limit
  double relative_tolerance = 1e-6;  // per sub-step of the cell integrator
};

[[nodiscard]] config::Section cooling_section();

// Reads the table when the section asks for one (config::Error naming the file and line).
[[nodiscard]] CoolingSettings cooling_settings(const config::ResolvedConfig& config);

}  // namespace brume::physics
