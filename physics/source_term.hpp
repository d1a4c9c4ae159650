// An operator split from the ideal-MHD step: forcing, heating and cooling, conduction, viscosity,
// resistivity. The run loop advances each term by dt/2 before the hyperbolic step and by dt/2
// after it, in reverse order (Strang 1968, SIAM J. Numer. Anal. 5, 506), so that the whole step
// stays second order. One virtual call per half step, never per cell.
#pragma once

#include <limits>
#include <string>
#include <vector>

#include "io/measurement.hpp"
#include "io/run_record.hpp"
#include "solver/state.hpp"

namespace brume::physics {

class SourceTerm {
 public:
  virtual ~SourceTerm() = default;

  // Short name for logs and the run record ("cooling", "forcing", ...).
  [[nodiscard]] virtual std::string name() const = 0;

  // Advances the interior cells (and face fields, for resistivity) of `state` by dt. A term that
  // needs ghosts fills them through its context's ghost filler. Collective when the term
  // communicates; every rank makes the same calls. Never leaves a non-positive density or
  // pressure it did not find.
  virtual void advance(solver::State& state, double dt) = 0;

  // Largest step this term allows on this block (+inf: none); the run loop takes the minimum
  // over terms and blocks.
  [[nodiscard]] virtual double time_step_limit(const solver::State& state) const {
    (void)state;
    return std::numeric_limits<double>::infinity();
  }

  // What a checkpoint must hold for the term to continue bit for bit (random state, mode
  // amplitudes, energy accumulators), under names that start with name() + ".".
  virtual void save(io::RunRecord& record) const { (void)record; }
  virtual void restore(const io::RunRecord& record) { (void)record; }

  // The term's running energy totals since the start of the run (work done, energy radiated), in
  // erg, for the time series. Collective.
  [[nodiscard]] virtual std::vector<io::MeasuredNumber> budget() const { return {}; }

  // One line for the run summary (energy injected, cells limited, ...); empty for none.
  [[nodiscard]] virtual std::string report() const { return {}; }
};

}  // namespace brume::physics
