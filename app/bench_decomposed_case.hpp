// One measurement of `brume bench scaling`: a periodic box decomposed over the ranks of a
// communicator and advanced as `brume run` advances it (agreed time step, the step with its halo
// exchanges, the combined step report), then the communication of a step timed on its own.
#pragma once

#include <mpi.h>

#include <array>

#include "app/bench_case.hpp"

namespace brume::app {

struct DecomposedCase {
  BenchCase scheme;                     // physics, reconstruction, Riemann solver, steps
  std::array<long, 3> box_cells{};      // the whole box; its cells are 1/scheme.cells wide
  std::array<int, 3> ranks_per_axis{};  // {0, 0, 0}: chosen as `brume run` chooses
};

struct DecomposedResult {
  // Ranks, the box's interior cells, timings and rates over the box (a step lasts as long as
  // its slowest rank); bytes per cell of one block, halo buffers included.
  BenchResult step;
  std::array<long, 3> box_cells{};
  std::array<int, 3> ranks_per_axis{};
  std::array<int, 3> block_cells{};
  // Per step, mean over repetitions of the slowest rank: the halo exchange alone (two ghost
  // fills and two exchanges of fallback flags, as a VL2 step makes them) and the global
  // reductions alone (those of the integrator and of the run loop).
  double halo_seconds_per_step = 0.0;
  double reduction_seconds_per_step = 0.0;
  // What rank 0 sends per step (every block of a periodic box sends the same).
  int halo_messages_per_step = 0;
  long long halo_bytes_per_step = 0;
  // More ranks on some node than it has logical CPUs.
  bool oversubscribed = false;
};

// Collective over `comm`; the result is the same on every rank of it.
[[nodiscard]] DecomposedResult run_decomposed_case(const DecomposedCase& c, MPI_Comm comm);

}  // namespace brume::app
