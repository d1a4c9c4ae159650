// A numerical failure on one block must end the step on every block: each rank makes the same
// collective calls whatever happens on its own block (DESIGN.md §4, §6), so a NaN in one block
// neither hangs the others in a halo exchange nor lets them run on. The combined report and the
// states left behind are those of the same step on one rank. Common practice, no source.
#include <gtest/gtest.h>
#include <unistd.h>

#include <bit>
#include <cmath>
#include <cstdint>
#include <limits>
#include <string>
#include <vector>

#include "solver/global_reductions.hpp"
#include "tests/mpi/decomposed_run.hpp"
#include "tests/mpi/global_fields.hpp"

namespace brume::mpi_testing {
namespace {

// A rank that waits for ever in a collective the others skipped would stall the test until the
// CTest time-out; the alarm ends the whole job after 60 s instead (a step takes milliseconds).
class Watchdog {
 public:
  Watchdog() { alarm(60); }
  ~Watchdog() { alarm(0); }
  Watchdog(const Watchdog&) = delete;
  Watchdog& operator=(const Watchdog&) = delete;
};

struct FailedStep {
  solver::StepReport report;  // combined over the blocks
  long step_after = -1;       // state.step after the call, the same on every rank
  bool same_step_everywhere = false;
  GlobalFields before, after;
};

// One step of the decaying box with a NaN in the density of global cell `nan_cell`, set on the
// block that holds it only.
FailedStep step_with_nan(int ranks, const std::array<int, 3>& per_axis,
                         const std::array<long, 3>& nan_cell, const std::string& field) {
  DecomposedRun run = start_decomposed("tests/mpi/decaying_box.yaml", ranks, per_axis, {});
  FailedStep result;
  if (!run.member()) return result;
  solver::State& s = run.state;
  const solver::BlockGeometry& g = s.geometry;
  const MPI_Comm comm = run.decomposition->comm();
  // The step of the clean state, as the run loop agrees on it.
  const double dt = solver::global_minimum(run.integrator->stable_time_step(s), comm);
  std::array<int, 3> local{};
  bool mine = true;
  for (int d = 0; d < 3; ++d) {
    local[d] = int(nan_cell[d] - g.offset[d]);
    mine = mine && local[d] >= 0 && local[d] < g.cells[d];
  }
  if (mine) {
    std::vector<double>& q = field == "density" ? s.density : s.energy;
    q[std::size_t(g.index(local[0], local[1], local[2]))] =
        std::numeric_limits<double>::quiet_NaN();
  }
  result.before = gather(s, *run.decomposition);
  const long step_before = s.step;
  {
    const Watchdog watchdog;
    result.report =
        solver::combine_step_reports(run.integrator->advance(s, dt), run.setup.cells, comm);
  }
  result.step_after = s.step;
  const long changed = s.step != step_before ? 1 : 0;
  long any_changed = 0;
  MPI_Allreduce(&changed, &any_changed, 1, MPI_LONG, MPI_MAX, comm);
  result.same_step_everywhere = any_changed == 0;
  result.after = gather(s, *run.decomposition);
  return result;
}

void expect_agreed_failure(const std::array<long, 3>& nan_cell, const std::string& field,
                           const std::array<long, 3>& first_failed_cell) {
  const FailedStep reference = step_with_nan(1, {1, 1, 1}, nan_cell, field);
  const std::vector<std::pair<int, std::array<int, 3>>> layouts{
      {2, {2, 1, 1}}, {2, {1, 1, 2}}, {4, {2, 2, 1}}, {4, {4, 1, 1}}, {4, {1, 2, 2}}};
  for (const auto& [ranks, per_axis] : layouts) {
    if (ranks > world_size()) continue;
    const FailedStep run = step_with_nan(ranks, per_axis, nan_cell, field);
    if (world_rank() != 0) continue;
    const std::string layout = layout_name(ranks, per_axis);
    ASSERT_FALSE(run.report.ok()) << layout;
    EXPECT_EQ(run.report.failure.stage, reference.report.failure.stage) << layout;
    EXPECT_EQ(run.report.failure.cell, reference.report.failure.cell) << layout;
    EXPECT_EQ(std::bit_cast<std::uint64_t>(run.report.failure.energy),
              std::bit_cast<std::uint64_t>(reference.report.failure.energy))
        << layout;
    EXPECT_EQ(run.report.density_floors, reference.report.density_floors) << layout;
    EXPECT_EQ(run.report.pressure_floors, reference.report.pressure_floors) << layout;
    EXPECT_EQ(run.report.fallback_cells, reference.report.fallback_cells) << layout;
    EXPECT_TRUE(run.same_step_everywhere) << layout;
    EXPECT_EQ(run.step_after, 0) << layout;
    // Every block is left as the single block is: the start of the step after a predictor
    // failure, the unfloored corrector result after a corrector failure.
    EXPECT_EQ(first_difference(reference.after, run.after), "") << layout;
  }
  if (world_rank() != 0) return;
  ASSERT_FALSE(reference.report.ok());
  EXPECT_EQ(reference.report.failure.stage, 1);
  EXPECT_EQ(reference.report.failure.cell, first_failed_cell);
  EXPECT_EQ(reference.step_after, 0);
  // A predictor failure leaves the state as it was (only the half-step state failed).
  EXPECT_EQ(first_difference(reference.before, reference.after), "");
}

// Global cell (12, 4, 4) of the 16³ box lies inside one block, away from its faces, in every
// layout but 4 × 1 × 1 (where it lies on a block face). The donor-cell predictor spreads the NaN
// to the face neighbours only, so only that block fails in stage 1 while the others would go on;
// the first failed cell in k, j, i order is (12, 4, 3).
TEST(MpiFailureAgreement, NanInOneBlockEndsTheStepOnEveryBlock) {
  expect_agreed_failure({12, 4, 4}, "density", {12, 4, 3});
}

// The same with the NaN in the energy of a cell of the last block along x and z.
TEST(MpiFailureAgreement, NanEnergyInTheLastBlockEndsTheStepOnEveryBlock) {
  expect_agreed_failure({13, 5, 13}, "energy", {13, 5, 12});
}

}  // namespace
}  // namespace brume::mpi_testing
