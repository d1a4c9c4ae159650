// The diagnostic `spectra`: shell-averaged Fourier power spectra of the velocity (with its
// solenoidal and compressive parts), of √ρ v, ρ^(1/3) v, the cell-centred field, ρ and ln ρ
// (docs/spectra.md). Normalized so that Σ_k E(k) = (1/2) ⟨|f|²⟩, the mean over cells.
#pragma once

#include <memory>
#include <string>

#include "io/config/resolved.hpp"
#include "physics/diagnostic.hpp"
#include "physics/spectra_settings.hpp"

namespace brume::physics {

class SpectraDiagnostic final : public Diagnostic {
 public:
  explicit SpectraDiagnostic(SpectraFields fields);
  ~SpectraDiagnostic() override;
  SpectraDiagnostic(const SpectraDiagnostic&) = delete;
  SpectraDiagnostic& operator=(const SpectraDiagnostic&) = delete;

  [[nodiscard]] std::string name() const override { return "spectra"; }
  // Collective over context.comm. The FFT plan, shells and buffers are made at the first call
  // and kept while the decomposition stays the same.
  [[nodiscard]] io::Measurement measure(const CellQuantities& cells,
                                        const RunContext& context) const override;

 private:
  struct Workspace;
  SpectraFields fields_;
  mutable std::unique_ptr<Workspace> workspace_;
};

// The diagnostic the section `spectra` asks for; nullptr when spectra.enabled is false.
[[nodiscard]] std::unique_ptr<Diagnostic> make_spectra(const config::ResolvedConfig& config,
                                                       const RunContext& context);

}  // namespace brume::physics
