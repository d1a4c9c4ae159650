// A sink-free measurement of the box (PDFs, spectra, structure functions, synthetic maps, ...).
// The same object serves the run loop, on its own schedule, and `brume analyze` on a saved
// snapshot: it sees only the cell quantities of this rank's block and the run context, never
// files. One virtual call per measurement, never per cell.
#pragma once

#include <string>

#include "io/measurement.hpp"
#include "physics/cell_quantities.hpp"
#include "physics/run_context.hpp"

namespace brume::physics {

class Diagnostic {
 public:
  virtual ~Diagnostic() = default;

  // Group name of its results in a statistics file ("spectra", "distributions", ...).
  [[nodiscard]] virtual std::string name() const = 0;

  // Collective over context.comm: every rank calls it with its own block, and every rank gets the
  // whole result (global reductions done inside; results must not depend on the rank count
  // beyond round-off, and histograms and other sums are bitwise rank-count independent).
  [[nodiscard]] virtual io::Measurement measure(const CellQuantities& cells,
                                                const RunContext& context) const = 0;
};

}  // namespace brume::physics
