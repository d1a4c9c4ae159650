// The whole split step with conduction, viscosity and Ohmic resistivity (RKL2 super-time-stepping,
// ghosts refilled through the halo exchange at every stage) on 1, 2 and 4 ranks must give bitwise
// the same state: DESIGN.md §4. Tolerance: none (every bit). The coefficients make each half step
// span many explicit limits, so that every stage and its ghost fill count.
#include <gtest/gtest.h>

#include <memory>
#include <string>
#include <vector>

#include "app/run_loop.hpp"
#include "app/source_terms.hpp"
#include "app/split_integrator.hpp"
#include "physics/diffusion_term.hpp"
#include "tests/mpi/decomposed_run.hpp"
#include "tests/mpi/global_fields.hpp"

namespace brume::mpi_testing {
namespace {

constexpr long kSteps = 3;

const std::vector<std::string> kDiffusion{
    "diffusion.conduction=power_law",         "diffusion.conductivity=5e9 erg s^-1 cm^-1 K^-1",
    "diffusion.reference_temperature=8000 K", "diffusion.conductivity_exponent=0.5",
    "diffusion.viscosity=4e24 cm^2 s^-1",     "diffusion.resistivity=5e24 cm^2 s^-1"};

struct DiffusedRun {
  GlobalFields fields;
  app::RunSummary summary;
  int stages = 0;
};

DiffusedRun run_on(int ranks, const std::array<int, 3>& per_axis) {
  std::vector<std::string> overrides = kDiffusion;
  overrides.push_back("clock.max_steps=" + std::to_string(kSteps));
  DecomposedRun run = start_decomposed("tests/mpi/decaying_box.yaml", ranks, per_axis, overrides);
  DiffusedRun result;
  if (!run.member()) return result;
  const MPI_Comm comm = run.decomposition->comm();
  app::SplitIntegrator integrator(
      std::move(run.integrator),
      app::make_source_terms(run.config, app::run_context(run.setup, comm, run.ghosts)),
      run.ghosts);
  app::RunLimits limits;
  limits.stop_time = run.config.real("clock.stop_time") / run.setup.code_units.time();
  limits.max_steps = kSteps;
  limits.progress_interval = 1e9;
  const io::Log quiet(io::Verbosity::quiet, false);
  result.summary = app::run_loop(integrator, run.state, limits, quiet, *run.decomposition);
  if (!integrator.terms().empty()) {
    const auto* term = dynamic_cast<const physics::DiffusionTerm*>(integrator.terms()[0].get());
    if (term != nullptr) result.stages = term->last_call().stages;
  }
  result.fields = gather(run.state, *run.decomposition);
  return result;
}

TEST(MpiDiffusionIdentity, DiffusionIsBitwiseIdenticalOn1To4Ranks) {
  const DiffusedRun reference = run_on(1, {1, 1, 1});
  if (world_rank() == 0) {
    EXPECT_EQ(reference.summary.steps, kSteps);
    // Many explicit limits per half step, or the test would not exercise super-time-stepping.
    EXPECT_GE(reference.stages, 5);
    std::printf("[diffusion identity] %d RKL2 stages per half step on one rank\n",
                reference.stages);
  }
  const std::vector<std::pair<int, std::array<int, 3>>> layouts{
      {2, {2, 1, 1}}, {2, {1, 1, 2}}, {4, {2, 2, 1}}, {4, {1, 2, 2}}};
  for (const auto& [ranks, per_axis] : layouts) {
    if (ranks > world_size()) continue;
    const DiffusedRun run = run_on(ranks, per_axis);
    if (world_rank() != 0) continue;
    const std::string layout = layout_name(ranks, per_axis);
    EXPECT_EQ(run.summary.steps, kSteps) << layout;
    EXPECT_EQ(run.stages, reference.stages) << layout;
    EXPECT_EQ(run.fields.shared_face_mismatches, 0) << layout;
    EXPECT_EQ(first_difference(reference.fields, run.fields), "") << layout;
  }
}

}  // namespace
}  // namespace brume::mpi_testing
