#include "solver/global_reductions.hpp"

#include <limits>

namespace brume::solver {

StepAgreement agree_on_step(double time_step, double wall_seconds, MPI_Comm comm, int stop_signal) {
  // One MPI_MIN over (dt, −wall, −signal): the minimum of dt, the maxima of the others.
  const double local[3] = {time_step, -wall_seconds, -double(stop_signal)};
  double global[3] = {0.0, 0.0, 0.0};
  MPI_Allreduce(local, global, 3, MPI_DOUBLE, MPI_MIN, comm);
  return {global[0], -global[1], int(-global[2])};
}

double global_minimum(double value, MPI_Comm comm) {
  double result = value;
  MPI_Allreduce(&value, &result, 1, MPI_DOUBLE, MPI_MIN, comm);
  return result;
}

long long global_sum(long long value, MPI_Comm comm) {
  long long result = value;
  MPI_Allreduce(&value, &result, 1, MPI_LONG_LONG, MPI_SUM, comm);
  return result;
}

namespace {

// Of the cells the blocks single out, the one of the earliest stage and, within it, first in
// global (k, j, i) order. Collective.
NumericalFailure first_over_blocks(const NumericalFailure& f, const std::array<long, 3>& box_cells,
                                   MPI_Comm comm) {
  const long long cells_in_box = (long long)box_cells[0] * box_cells[1] * box_cells[2];
  const long long none = std::numeric_limits<long long>::max();
  const long long key = f.occurred
                            ? f.stage * cells_in_box +
                                  (f.cell[2] * box_cells[1] + f.cell[1]) * box_cells[0] + f.cell[0]
                            : none;
  long long first = none;
  MPI_Allreduce(&key, &first, 1, MPI_LONG_LONG, MPI_MIN, comm);
  if (first == none) return {};
  int rank = 0;
  MPI_Comm_rank(comm, &rank);
  const int candidate = key == first ? rank : std::numeric_limits<int>::max();
  int owner = 0;
  MPI_Allreduce(&candidate, &owner, 1, MPI_INT, MPI_MIN, comm);
  // Every field as a double (the integers are far below 2^53).
  double payload[10] = {double(f.step),    double(f.stage), double(f.cell[0]), double(f.cell[1]),
                        double(f.cell[2]), f.density,       f.momentum[0],     f.momentum[1],
                        f.momentum[2],     f.energy};
  MPI_Bcast(payload, 10, MPI_DOUBLE, owner, comm);
  NumericalFailure g;
  g.occurred = true;
  g.step = long(payload[0]);
  g.stage = int(payload[1]);
  g.cell = {long(payload[2]), long(payload[3]), long(payload[4])};
  g.density = payload[5];
  g.momentum = {payload[6], payload[7], payload[8]};
  g.energy = payload[9];
  return g;
}

}  // namespace

StepReport combine_step_reports(const StepReport& local, const std::array<long, 3>& box_cells,
                                MPI_Comm comm) {
  StepReport global;
  const long long counts[3] = {local.density_floors, local.pressure_floors, local.fallback_cells};
  long long sums[3] = {0, 0, 0};
  MPI_Allreduce(counts, sums, 3, MPI_LONG_LONG, MPI_SUM, comm);
  global.density_floors = long(sums[0]);
  global.pressure_floors = long(sums[1]);
  global.fallback_cells = long(sums[2]);
  global.failure = first_over_blocks(local.failure, box_cells, comm);
  if (global.density_floors + global.pressure_floors > 0)
    global.first_floored = first_over_blocks(local.first_floored, box_cells, comm);
  return global;
}

}  // namespace brume::solver
