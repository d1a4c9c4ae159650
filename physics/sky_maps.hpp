// The diagnostic "sky_maps": for each chosen line of sight, the column density and the optically
// thin dust-polarization maps (Stokes I, Q, U, polarization fraction and angles) of the box, the
// flat-sky TT, EE, BB and TE spectra of the maps, their power-law slopes and the BB/EE ratio
// over the fit range (docs/sky-maps.md).
#pragma once

#include <memory>
#include <utility>

#include "io/config/resolved.hpp"
#include "physics/diagnostic.hpp"
#include "physics/sky_settings.hpp"

namespace brume::physics {

class SkyMaps final : public Diagnostic {
 public:
  explicit SkyMaps(SkySettings settings) : settings_(std::move(settings)) {}
  [[nodiscard]] std::string name() const override { return "sky_maps"; }
  // Maps bitwise the same on any number of ranks; spectra computed on rank 0 and broadcast.
  [[nodiscard]] io::Measurement measure(const CellQuantities& cells,
                                        const RunContext& context) const override;
  [[nodiscard]] const SkySettings& settings() const { return settings_; }

 private:
  SkySettings settings_;
};

[[nodiscard]] std::unique_ptr<Diagnostic> make_sky_maps(const config::ResolvedConfig& config,
                                                        const RunContext& context);

}  // namespace brume::physics
