// The closing report of a run: why it ended, what it cost, what the floors and fallbacks did, and
// how well mass, momentum and energy were kept.
#pragma once

#include <mpi.h>

#include <array>
#include <string>

#include "app/run_loop.hpp"
#include "solver/state.hpp"

namespace brume::app {

// Volume integrals over the interior cells of the whole box (code units).
struct RunTotals {
  double mass = 0.0;
  std::array<double, 3> momentum{};
  double energy = 0.0;  // total energy; 0 when isothermal
};

// Collective over `comm` (one block per rank): every cell's contribution is summed exactly and
// rounded once, so the totals do not depend on the number of ranks; the same on every rank.
[[nodiscard]] RunTotals totals(const solver::State& state, MPI_Comm comm);

[[nodiscard]] std::string run_report(const RunSummary& summary, const RunTotals& before,
                                     const RunTotals& after, const solver::State& state,
                                     const RunLimits& limits);

}  // namespace brume::app
