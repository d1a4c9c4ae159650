#include "physics/spectra_settings.hpp"

#include <array>
#include <string>

namespace brume::physics {

namespace {

std::optional<config::Issue> some_field_chosen(const config::SectionValues& values) {
  if (!values.flag("enabled")) return std::nullopt;
  for (const char* key : {"velocity", "kinetic_energy", "cube_root_weighted_velocity",
                          "magnetic_field", "density", "log_density"}) {
    if (values.flag(key)) return std::nullopt;
  }
  return config::Issue{"enabled",
                       "spectra are enabled but every field is switched off; switch one on or "
                       "set spectra.enabled: false"};
}

}  // namespace

config::Section spectra_section() {
  using namespace config;
  return {
      "spectra",
      "Shell-averaged Fourier power spectra E(k) of velocity, density and field, with the "
      "Helmholtz parts of the velocity (docs/spectra.md).",
      {flag_key("enabled", "Measure the spectra at the statistics times.").with_default("true"),
       integer_key("every", "Measure at every Nth statistics time (statistics.interval).")
           .with_default("1")
           .at_least(1),
       flag_key("velocity", "Spectrum of v and of its solenoidal and compressive parts.")
           .with_default("true"),
       flag_key("kinetic_energy", "Spectrum of sqrt(rho) v (kinetic energy).").with_default("true"),
       flag_key("cube_root_weighted_velocity", "Spectrum of rho^(1/3) v.").with_default("true"),
       flag_key("magnetic_field", "Spectrum of the cell-centred B (MHD runs only).")
           .with_default("true"),
       flag_key("density", "Spectrum of rho.").with_default("true"),
       flag_key("log_density", "Spectrum of ln rho (rho in code units).").with_default("true")},
      {some_field_chosen},
      std::nullopt};
}

SpectraSettings spectra_settings(const config::ResolvedConfig& config) {
  SpectraSettings s;
  s.enabled = config.flag("spectra.enabled");
  s.every = config.integer("spectra.every");
  s.fields.velocity = config.flag("spectra.velocity");
  s.fields.kinetic = config.flag("spectra.kinetic_energy");
  s.fields.cube_root = config.flag("spectra.cube_root_weighted_velocity");
  s.fields.magnetic = config.flag("spectra.magnetic_field");
  s.fields.density = config.flag("spectra.density");
  s.fields.log_density = config.flag("spectra.log_density");
  return s;
}

}  // namespace brume::physics
