// The box in a few numbers: energies (kinetic, magnetic of the mean and the fluctuating field,
// thermal, total), rms velocity, sonic and Alfvén Mach numbers (volume- and mass-weighted),
// volume and mass fractions of the cold, unstable and warm phases, and the extremes of density
// and temperature. These are the columns of the time series and the group "overview" of every
// statistics file. Sums are exact (solver::ExactSum), so the numbers do not depend on the ranks.
#pragma once

#include <utility>

#include "physics/diagnostic.hpp"
#include "physics/phase_boundaries.hpp"

namespace brume::physics {

class BoxOverview final : public Diagnostic {
 public:
  explicit BoxOverview(PhaseBoundaries phases) : phases_(std::move(phases)) {}
  [[nodiscard]] std::string name() const override { return "overview"; }
  [[nodiscard]] io::Measurement measure(const CellQuantities& cells,
                                        const RunContext& context) const override;

 private:
  PhaseBoundaries phases_;
};

}  // namespace brume::physics
