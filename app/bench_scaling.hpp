// `brume bench scaling`, run as `mpiexec -n N brume bench scaling [--json] [--cells N]
// [--steps N]`: inside the one job, for 1, 2, 4, … ≤ N ranks (the first ranks of the job; the
// others wait asleep), the strong and weak scaling cases of bench_scaling_plan.hpp with the real
// decomposition and halo exchange, their parallel efficiency and the cost of the halo exchange
// and of the global reductions of a step. `--cells N` sets both the strong-scaling box (N³) and
// the weak-scaling block (N³ per rank); the defaults are 64³ and 128³ boxes and 64³ blocks.
#pragma once

#include "app/command_line.hpp"
#include "io/log.hpp"

namespace brume::app {

// Collective over MPI_COMM_WORLD; rank 0 prints. Throws UserError for bad options.
[[nodiscard]] int scaling_bench(const CommandLine& line, const io::Log& log);

}  // namespace brume::app
