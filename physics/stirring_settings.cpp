#include "physics/stirring_settings.hpp"

#include <cmath>
#include <string>

#include "solver/units/dimension.hpp"

namespace brume::physics {

namespace {

namespace dim = units::dim;
constexpr units::Dimension specific_power = dim::velocity * dim::velocity / dim::time;

// When stirring is on: a shell that is ordered, holds at least one mode of non-zero weight and
// lies below the Nyquist wavenumber of every stirred axis.
std::optional<config::Issue> shell_fits_the_box(const config::SectionValues& values) {
  if (!values.flag("enabled")) return std::nullopt;
  const auto lowest = values.integer("lowest_wavenumber");
  const auto highest = values.integer("highest_wavenumber");
  if (highest < lowest) {
    return config::Issue{"highest_wavenumber", "is " + std::to_string(highest) +
                                                   ", below lowest_wavenumber (" +
                                                   std::to_string(lowest) + ")"};
  }
  const auto cells = values.config().integers3("box.cells");
  std::array<bool, 3> active{};
  for (std::size_t d = 0; d < 3; ++d) {
    active[d] = cells[d] > 1;
    if (active[d] && 2 * highest >= cells[d]) {
      return config::Issue{"highest_wavenumber",
                           "is " + std::to_string(highest) + " but box.cells has " +
                               std::to_string(cells[d]) +
                               " cells on an axis; it must stay below half the cells"};
    }
  }
  const StirringProfile profile =
      values.text("profile") == "flat" ? StirringProfile::flat : StirringProfile::parabolic;
  if (stirring_modes(int(lowest), int(highest), profile, 1.0, {1.0, 1.0, 1.0}, active).empty()) {
    return config::Issue{"highest_wavenumber",
                         "the shell " + std::to_string(lowest) + " to " + std::to_string(highest) +
                             " holds no mode of non-zero weight in this box; widen it or use "
                             "profile: flat"};
  }
  return std::nullopt;
}

}  // namespace

config::Section stirring_section() {
  using namespace config;
  return {
      "stirring",
      "Large-scale driving: an Ornstein-Uhlenbeck acceleration field in a shell of Fourier modes "
      "(docs/forcing.md).",
      {flag_key("enabled", "Drive the gas with the stirring acceleration.").with_default("false"),
       integer_key("lowest_wavenumber", "Smallest |n| of the stirred modes (k = 2π n / L).")
           .with_default("1")
           .at_least(1)
           .at_most(64),
       integer_key("highest_wavenumber", "Largest |n| of the stirred modes (k = 2π n / L).")
           .with_default("3")
           .at_least(1)
           .at_most(64),
       quantity_key("correlation_time", dim::time, "Myr",
                    "Correlation time of the modes (0: the crossing time L / V of the box at the "
                    "driving velocity).")
           .with_default("0 Myr")
           .at_least(0),
       real_key("solenoidal_weight",
                "Helmholtz weight ζ of the projection: 1 purely solenoidal, 0 purely "
                "compressive.")
           .with_default("1")
           .at_least(0)
           .at_most(1),
       choice_key("profile",
                  {{"parabolic",
                    "Amplitude 1 − ((|n| − n_c)/Δ)², peaking mid-shell, zero at "
                    "its ends."},
                   {"flat", "Equal amplitude for every mode of the shell."}},
                  "Spectral profile of the mode amplitudes.")
           .with_default("parabolic"),
       choice_key("amplitude_mode",
                  {{"injection_rate", "Set by the injection rate per unit mass ε."},
                   {"velocity_rms", "Set by a velocity V, through ε = V³ / L."}},
                  "What sets the amplitude of the acceleration.")
           .with_default("velocity_rms"),
       quantity_key("injection_rate", specific_power, "km^2 s^-2 Myr^-1",
                    "Energy injection rate per unit mass (amplitude_mode: injection_rate).")
           .with_default("1000 km^2 s^-2 Myr^-1")
           .above(0),
       quantity_key("velocity_rms", dim::velocity, "km/s",
                    "Driving velocity V (amplitude_mode: velocity_rms).")
           .with_default("10 km/s")
           .above(0),
       integer_key("seed", "Seed of the counter-based random numbers.")
           .with_default("1")
           .at_least(0)},
      {shell_fits_the_box},
      std::nullopt};
}

bool stirring_enabled(const config::ResolvedConfig& config) {
  return config.flag("stirring.enabled");
}

StirringSettings stirring_settings(const config::ResolvedConfig& config,
                                   const units::CodeUnits& u) {
  StirringSettings s;
  s.lowest = int(config.integer("stirring.lowest_wavenumber"));
  s.highest = int(config.integer("stirring.highest_wavenumber"));
  s.correlation_time = config.real("stirring.correlation_time") / u.time();
  s.solenoidal_weight = config.real("stirring.solenoidal_weight");
  s.profile = config.text("stirring.profile") == "flat" ? StirringProfile::flat
                                                        : StirringProfile::parabolic;
  s.amplitude = config.text("stirring.amplitude_mode") == "injection_rate"
                    ? StirringAmplitude::injection_rate
                    : StirringAmplitude::velocity_rms;
  s.injection_rate = config.real("stirring.injection_rate") / (u.velocity * u.velocity / u.time());
  s.velocity_rms = config.real("stirring.velocity_rms") / u.velocity;
  s.seed = std::uint64_t(config.integer("stirring.seed"));
  return s;
}

// ε = V³ / L: the dimensional estimate of the dissipation rate of turbulence at speed V on the
// scale L, which a steady driven state balances (common practice, no source; Mac Low 1999, ApJ
// 524, 169, measures the dissipation of driven supersonic turbulence against it). ⟨|a|²⟩ = ε / T
// is the injection rate of a force with correlation time T into gas that does not react within
// T, ∫₀^∞ ⟨a(t)·a(t − s)⟩ ds (Eswaran & Pope 1988, Comput. Fluids 16, 257, §2 — from memory).
StirringScales stirring_scales(const StirringSettings& settings,
                               const std::array<double, 3>& box_size) {
  StirringScales s;
  s.length = std::cbrt(box_size[0] * box_size[1] * box_size[2]);
  if (settings.amplitude == StirringAmplitude::velocity_rms) {
    s.velocity = settings.velocity_rms;
    s.injection_rate = s.velocity * s.velocity * s.velocity / s.length;
  } else {
    s.injection_rate = settings.injection_rate;
    s.velocity = std::cbrt(s.injection_rate * s.length);
  }
  s.correlation_time =
      settings.correlation_time > 0.0 ? settings.correlation_time : s.length / s.velocity;
  s.mean_square_acceleration = s.injection_rate / s.correlation_time;
  return s;
}

}  // namespace brume::physics
