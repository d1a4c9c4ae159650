// Reductions over every block of a decomposed box whose results do not depend on the number of
// ranks: minima and maxima are exact, integer counts are exact, sums of doubles go through the
// exact accumulator (exact_sum.hpp), and the reported numerical failure is the one a single
// block would have found first.
#pragma once

#include <mpi.h>

#include <array>

#include "solver/step_report.hpp"

namespace brume::solver {

// The smallest stable time step over all blocks, the largest elapsed wall time over all ranks
// and the largest stop request (a signal number, 0 for none), so that every rank takes the same
// decision on a wall budget or a signal, in one collective.
struct StepAgreement {
  double time_step = 0.0;
  double wall_seconds = 0.0;
  int stop_signal = 0;
};
[[nodiscard]] StepAgreement agree_on_step(double time_step, double wall_seconds, MPI_Comm comm,
                                          int stop_signal = 0);

[[nodiscard]] double global_minimum(double value, MPI_Comm comm);
[[nodiscard]] long long global_sum(long long value, MPI_Comm comm);

// Counts summed over all blocks; of the failures (and of the floored cells), the earliest stage
// and within it the cell first in global (k, j, i) order — what one block spanning the box reports.
// `box_cells` are the cell counts of the whole box. Collective.
[[nodiscard]] StepReport combine_step_reports(const StepReport& local,
                                              const std::array<long, 3>& box_cells, MPI_Comm comm);

}  // namespace brume::solver
