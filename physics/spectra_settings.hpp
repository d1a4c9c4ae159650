// The configuration section `spectra` (shell-averaged Fourier power spectra, docs/spectra.md) and
// the settings it resolves to.
#pragma once

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"

namespace brume::physics {

// Which fields get a spectrum.
struct SpectraFields {
  bool velocity = true;   // v, with its solenoidal and compressive parts
  bool kinetic = true;    // √ρ v
  bool cube_root = true;  // ρ^(1/3) v
  bool magnetic = true;   // cell-centred B (MHD runs only)
  bool density = true;
  bool log_density = true;
};

struct SpectraSettings {
  bool enabled = true;
  long long every = 1;  // at every Nth statistics time
  SpectraFields fields;
};

[[nodiscard]] config::Section spectra_section();
[[nodiscard]] SpectraSettings spectra_settings(const config::ResolvedConfig& config);

}  // namespace brume::physics
