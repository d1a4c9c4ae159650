// The configuration section `stirring` (large-scale driving of the turbulence) and what it
// implies in code units: the shell, the process's correlation time and its amplitude.
#pragma once

#include <array>
#include <cstdint>
#include <vector>

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"
#include "physics/stirring_modes.hpp"
#include "solver/units/code_units.hpp"

namespace brume::physics {

enum class StirringAmplitude { injection_rate, velocity_rms };

struct StirringSettings {
  int lowest = 1;
  int highest = 3;
  double correlation_time = 0.0;  // code units; 0: the crossing time L / V
  double solenoidal_weight = 1.0;
  StirringProfile profile = StirringProfile::parabolic;
  StirringAmplitude amplitude = StirringAmplitude::velocity_rms;
  double injection_rate = 0.0;  // code units of velocity² / time (per unit mass)
  double velocity_rms = 0.0;    // code units
  std::uint64_t seed = 1;
};

// What the settings imply for a box: the driving's velocity V and injection rate per unit mass
// ε (one given, the other from ε = V³ / L), the correlation time T and the mean-square
// acceleration ⟨|a|²⟩ = ε / T (code units).
struct StirringScales {
  double length = 1.0;  // L: the cube root of the box volume
  double velocity = 0.0;
  double injection_rate = 0.0;
  double correlation_time = 0.0;
  double mean_square_acceleration = 0.0;
};

[[nodiscard]] config::Section stirring_section();
[[nodiscard]] bool stirring_enabled(const config::ResolvedConfig& config);
[[nodiscard]] StirringSettings stirring_settings(const config::ResolvedConfig& config,
                                                 const units::CodeUnits& code_units);
[[nodiscard]] StirringScales stirring_scales(const StirringSettings& settings,
                                             const std::array<double, 3>& box_size);

}  // namespace brume::physics
