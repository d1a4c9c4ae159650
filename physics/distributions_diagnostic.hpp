// The diagnostic "distributions": volume- and mass-weighted PDFs of number density, temperature,
// plasma beta and dynamic over magnetic pressure, the pressure-density diagram with the
// thermal-equilibrium curve of the cooling in use, and the field-density diagram
// (docs/distributions.md).
#pragma once

#include <memory>
#include <optional>

#include "io/config/resolved.hpp"
#include "physics/diagnostic.hpp"
#include "physics/distributions_equilibrium_curve.hpp"
#include "physics/distributions_settings.hpp"

namespace brume::physics {

class DistributionsDiagnostic final : public Diagnostic {
 public:
  // No curve: the cooling is off (a note says so).
  DistributionsDiagnostic(DistributionsSettings settings, std::optional<EquilibriumCurve> curve);

  [[nodiscard]] std::string name() const override { return "distributions"; }
  [[nodiscard]] io::Measurement measure(const CellQuantities& cells,
                                        const RunContext& context) const override;

 private:
  DistributionsSettings settings_;
  std::optional<EquilibriumCurve> curve_;
};

// Null when distributions.enabled is false.
[[nodiscard]] std::unique_ptr<Diagnostic> make_distributions(const config::ResolvedConfig& config,
                                                             const RunContext& context);

}  // namespace brume::physics
