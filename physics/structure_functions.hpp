// The structure-function diagnostic (docs/structure-functions.md): along each axis, with exact
// periodic shifts by whole cells, S_p(ℓ) = ⟨|δv|^p⟩ of the longitudinal and transverse velocity
// increments, the flux-based third-order function ⟨δ(ρv_∥) |δv|²⟩, and the rms velocity
// increment of pairs of cold cells with the size–linewidth slope fitted to it.
#pragma once

#include <memory>

#include "io/config/resolved.hpp"
#include "physics/diagnostic.hpp"
#include "physics/structure_settings.hpp"

namespace brume::physics {

class StructureFunctions final : public Diagnostic {
 public:
  explicit StructureFunctions(StructureSettings settings) : settings_(std::move(settings)) {}
  [[nodiscard]] std::string name() const override { return "structure_functions"; }
  // Collective over context.comm; bitwise the same result on any number of ranks. Assumes a
  // periodic box: the shift wraps around every axis.
  [[nodiscard]] io::Measurement measure(const CellQuantities& cells,
                                        const RunContext& context) const override;

 private:
  StructureSettings settings_;
};

// The diagnostic of the section `structure_functions`; nullptr when it is not enabled.
[[nodiscard]] std::unique_ptr<Diagnostic> make_structure_functions(
    const config::ResolvedConfig& config, const RunContext& context);

}  // namespace brume::physics
