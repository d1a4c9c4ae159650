// The diagnostic "jeans": volume and mass fractions of gas whose Jeans length is below a chosen
// resolution length and below the 4 cells of Truelove et al. 1997, and the multi-free-fall
// star-formation rate per free-fall time estimated from the measured density PDF
// (docs/jeans.md).
#pragma once

#include <memory>

#include "io/config/resolved.hpp"
#include "physics/diagnostic.hpp"
#include "physics/jeans_settings.hpp"

namespace brume::physics {

class JeansDiagnostic final : public Diagnostic {
 public:
  explicit JeansDiagnostic(JeansSettings settings) : settings_(settings) {}

  [[nodiscard]] std::string name() const override { return "jeans"; }
  [[nodiscard]] io::Measurement measure(const CellQuantities& cells,
                                        const RunContext& context) const override;

 private:
  JeansSettings settings_;
};

// Null when jeans.enabled is false.
[[nodiscard]] std::unique_ptr<Diagnostic> make_jeans(const config::ResolvedConfig& config,
                                                     const RunContext& context);

}  // namespace brume::physics
