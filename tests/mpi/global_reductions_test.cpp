// Reductions of the run loop: the time step is the exact minimum over blocks, the step reports
// are summed and the failure reported is the one a single block spanning the box finds first
// (earliest stage, then global k, j, i order). Common practice, no source.
#include <gtest/gtest.h>

#include "solver/global_reductions.hpp"
#include "tests/mpi/sub_communicator.hpp"

namespace brume::mpi_testing {
namespace {

TEST(MpiGlobalReductions, TimeStepIsTheMinimumAndWallTheMaximum) {
  const int rank = world_rank();
  const solver::StepAgreement a =
      solver::agree_on_step(1.0 + 0.25 * (world_size() - 1 - rank), 10.0 * rank, MPI_COMM_WORLD);
  EXPECT_EQ(a.time_step, 1.0);
  EXPECT_EQ(a.wall_seconds, 10.0 * (world_size() - 1));
  EXPECT_EQ(solver::global_minimum(-double(rank), MPI_COMM_WORLD), -double(world_size() - 1));
  EXPECT_EQ(solver::global_sum(rank + 1, MPI_COMM_WORLD),
            (long long)world_size() * (world_size() + 1) / 2);
}

TEST(MpiGlobalReductions, StepReportsAreSummedAndTheFirstFailureWins) {
  const int rank = world_rank(), size = world_size();
  const std::array<long, 3> box{8, 8, 8};
  solver::StepReport local;
  local.density_floors = rank;
  local.pressure_floors = 2 * rank;
  local.fallback_cells = 1;
  // Every rank fails in stage 2 at a cell further down in z the higher its rank; the last rank
  // also fails in stage 1 at the far corner: stage 1 comes first.
  local.failure.occurred = true;
  local.failure.stage = 2;
  local.failure.cell = {7, 0, rank};
  local.failure.density = -double(rank);
  if (rank == size - 1) {
    local.failure.stage = 1;
    local.failure.cell = {7, 7, 7};
  }
  const solver::StepReport global = solver::combine_step_reports(local, box, MPI_COMM_WORLD);
  EXPECT_EQ(global.density_floors, long(size) * (size - 1) / 2);
  EXPECT_EQ(global.pressure_floors, long(size) * (size - 1));
  EXPECT_EQ(global.fallback_cells, size);
  ASSERT_TRUE(global.failure.occurred);
  EXPECT_EQ(global.failure.stage, 1);
  EXPECT_EQ(global.failure.cell, (std::array<long, 3>{7, 7, 7}));
  EXPECT_EQ(global.failure.density, -double(size - 1));

  // Without stage-1 failures: the smallest global index, (7, 0, 0) before (7, 0, 1) …
  if (rank == size - 1) {
    local.failure.stage = 2;
    local.failure.cell = {7, 0, rank};
  }
  const solver::StepReport second = solver::combine_step_reports(local, box, MPI_COMM_WORLD);
  EXPECT_EQ(second.failure.cell, (std::array<long, 3>{7, 0, 0}));
  EXPECT_EQ(second.failure.density, 0.0);

  // … and no failure anywhere: none reported.
  local.failure = {};
  EXPECT_FALSE(solver::combine_step_reports(local, box, MPI_COMM_WORLD).failure.occurred);
}

TEST(MpiGlobalReductions, TheFirstFlooredCellIsTheOneASingleBlockFindsFirst) {
  const int rank = world_rank(), size = world_size();
  const std::array<long, 3> box{8, 8, 8};
  solver::StepReport local;
  // Ranks above 0 floor a cell in stage 2, lower in y the higher the rank; rank 0 floors none.
  if (rank > 0) {
    local.pressure_floors = 1;
    local.first_floored.occurred = true;
    local.first_floored.stage = 2;
    local.first_floored.cell = {0, 8 - rank, 0};
    local.first_floored.energy = double(rank);
  }
  const solver::StepReport global = solver::combine_step_reports(local, box, MPI_COMM_WORLD);
  EXPECT_EQ(global.pressure_floors, size - 1);
  EXPECT_TRUE(global.ok()) << "a floored cell is not a failure";
  if (size == 1) {
    EXPECT_FALSE(global.first_floored.occurred);
    return;
  }
  ASSERT_TRUE(global.first_floored.occurred);
  EXPECT_EQ(global.first_floored.cell, (std::array<long, 3>{0, 8 - (size - 1), 0}));
  EXPECT_EQ(global.first_floored.energy, double(size - 1));
}

}  // namespace
}  // namespace brume::mpi_testing
