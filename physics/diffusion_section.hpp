// The configuration section `diffusion`: thermal conduction, kinematic viscosity and Ohmic
// resistivity, and the stage cap of their super-time-stepping.
#pragma once

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"
#include "physics/diffusion_coefficients.hpp"
#include "physics/run_context.hpp"

namespace brume::physics {

[[nodiscard]] config::Section diffusion_section();

// True when the section asks for any diffusion (a conduction law, ν > 0 or η > 0).
[[nodiscard]] bool diffusion_requested(const config::ResolvedConfig& config);

// The coefficients of the section in code units of `context`.
[[nodiscard]] DiffusionCoefficients diffusion_coefficients(const config::ResolvedConfig& config,
                                                           const RunContext& context);

// κ(T) of the section's conduction law in cgs (erg s^-1 cm^-1 K^-1) at temperature t (K); 0
// without conduction.
[[nodiscard]] double conductivity_cgs(const config::ResolvedConfig& config, double t);

[[nodiscard]] int diffusion_max_stages(const config::ResolvedConfig& config);

}  // namespace brume::physics
