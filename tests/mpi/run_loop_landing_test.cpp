// The run loop lands on the stop time exactly: a step clamped to it sets the time to it, even
// where t + (t_stop − t) rounds to one ulp short of t_stop, which would otherwise cost a sliver
// step of 1e-16 (the rounding case found with Python floats, which are IEEE doubles).
#include <gtest/gtest.h>

#include "app/run_loop.hpp"
#include "tests/mpi/decomposed_run.hpp"

namespace brume::mpi_testing {
namespace {

// A step that only moves the clock, with a stable step longer than what is left.
class ClockOnly : public solver::Integrator {
 public:
  [[nodiscard]] double stable_time_step(const solver::State&) const override { return 10.0; }
  solver::StepReport advance(solver::State& state, double dt) override {
    state.time += dt;
    state.step += 1;
    return {};
  }
};

TEST(RunLoop, LandsOnTheStopTimeWithoutASliverStep) {
  DecomposedRun run = start_decomposed("tests/mpi/decaying_box.yaml", 1, {1, 1, 1}, {});
  if (!run.member()) return;
  const double start = 2.010102951009863;
  const double stop = 6.136224176723256;
  ASSERT_LT(start + (stop - start), stop);  // the rounding case
  run.state.time = start;
  app::RunLimits limits;
  limits.stop_time = stop;
  limits.progress_interval = 1e9;
  const io::Log quiet(io::Verbosity::quiet, false);
  ClockOnly clock;
  const app::RunSummary summary =
      app::run_loop(clock, run.state, limits, quiet, *run.decomposition);
  EXPECT_EQ(summary.end, app::RunEnd::stop_time);
  EXPECT_EQ(summary.steps, 1);
  EXPECT_EQ(run.state.time, stop);
}

}  // namespace
}  // namespace brume::mpi_testing
