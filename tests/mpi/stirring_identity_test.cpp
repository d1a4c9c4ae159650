// The stirring gives bitwise the same force field, the same evolved state and the same work on
// 1, 2 and 4 ranks in several decompositions (DESIGN.md §4: forcing modes from global coordinates,
// exact global sums). Tolerance: none (every bit).
#include <gtest/gtest.h>

#include <string>
#include <vector>

#include "app/run_loop.hpp"
#include "app/source_terms.hpp"
#include "app/split_integrator.hpp"
#include "physics/stirring_term.hpp"
#include "tests/mpi/decomposed_run.hpp"
#include "tests/mpi/global_fields.hpp"

namespace brume::mpi_testing {
namespace {

const std::vector<std::pair<int, std::array<int, 3>>> layouts{
    {2, {2, 1, 1}}, {2, {1, 2, 1}}, {2, {1, 1, 2}}, {4, {2, 2, 1}}, {4, {1, 2, 2}}, {4, {4, 1, 1}}};

struct Result {
  GlobalFields fields;
  double work = 0.0;
  long steps = 0;
};

std::unique_ptr<physics::StirringTerm> stirring(const DecomposedRun& run) {
  return std::make_unique<physics::StirringTerm>(
      physics::stirring_settings(run.config, run.setup.code_units),
      app::run_context(run.setup, run.decomposition->comm(), run.ghosts));
}

// One kick of the stirring on the initial state (gas at rest): the momenta are ρ (a − ā) dt.
Result kicked(int ranks, const std::array<int, 3>& per_axis) {
  DecomposedRun run = start_decomposed("tests/mpi/driven_box.yaml", ranks, per_axis, {});
  Result result;
  if (!run.member()) return result;
  auto term = stirring(run);
  term->advance(run.state, 0.01);
  result.work = term->work();
  result.fields = gather(run.state, *run.decomposition);
  return result;
}

// 12 steps of the whole split step (stirring, ideal MHD, stirring).
Result driven(int ranks, const std::array<int, 3>& per_axis) {
  DecomposedRun run = start_decomposed("tests/mpi/driven_box.yaml", ranks, per_axis, {});
  Result result;
  if (!run.member()) return result;
  std::vector<std::unique_ptr<physics::SourceTerm>> terms;
  terms.push_back(stirring(run));
  const physics::StirringTerm* term = static_cast<const physics::StirringTerm*>(terms[0].get());
  app::SplitIntegrator integrator(std::move(run.integrator), std::move(terms), run.ghosts);
  app::RunLimits limits;
  limits.stop_time = 1e9;
  limits.max_steps = 12;
  limits.progress_interval = 1e9;
  const io::Log quiet(io::Verbosity::quiet, false);
  const app::RunSummary summary =
      app::run_loop(integrator, run.state, limits, quiet, *run.decomposition);
  result.steps = summary.steps;
  result.work = term->work();
  result.fields = gather(run.state, *run.decomposition);
  return result;
}

TEST(StirringIdentity, ForceFieldIsBitwiseTheSameOnAnyRankCount) {
  const Result reference = kicked(1, {1, 1, 1});
  for (const auto& [ranks, per_axis] : layouts) {
    if (ranks > world_size()) continue;
    const Result run = kicked(ranks, per_axis);
    if (world_rank() != 0) continue;
    const std::string layout = layout_name(ranks, per_axis);
    EXPECT_NE(reference.work, 0.0);
    EXPECT_EQ(first_difference(reference.fields, run.fields), "") << layout;
    EXPECT_EQ(run.work, reference.work) << layout;
  }
}

TEST(StirringIdentity, DrivenRunIsBitwiseTheSameOnAnyRankCount) {
  const Result reference = driven(1, {1, 1, 1});
  for (const auto& [ranks, per_axis] : layouts) {
    if (ranks > world_size()) continue;
    const Result run = driven(ranks, per_axis);
    if (world_rank() != 0) continue;
    const std::string layout = layout_name(ranks, per_axis);
    EXPECT_EQ(run.steps, 12) << layout;
    EXPECT_EQ(first_difference(reference.fields, run.fields), "") << layout;
    EXPECT_EQ(run.work, reference.work) << layout;
  }
}

}  // namespace
}  // namespace brume::mpi_testing
