// The same MHD run (decaying turbulence, PLM + HLLD + CT, 16³ cells, 16 steps) on 1, 2 and 4 ranks
// in several decompositions must give bitwise the same final state: DESIGN.md §4 asks results to
// be bitwise identical whatever the number of ranks. Tolerance: none (every bit).
#include <gtest/gtest.h>

#include <filesystem>
#include <string>
#include <vector>

#include "app/run_loop.hpp"
#include "app/run_report.hpp"
#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/scheme_choice.hpp"
#include "io/config/load.hpp"
#include "solver/halo_exchange.hpp"
#include "tests/mpi/global_fields.hpp"
#include "tests/mpi/sub_communicator.hpp"

namespace brume::mpi_testing {
namespace {

struct RunResult {
  GlobalFields fields;
  app::RunSummary summary;
  app::RunTotals totals;
};

// Runs the configuration on the first `ranks` ranks with `per_axis` ranks along x, y, z; the
// result is filled on world rank 0.
RunResult run_on(int ranks, const std::array<int, 3>& per_axis,
                 const std::vector<std::string>& overrides) {
  const config::ResolvedConfig config = config::load(
      app::brume_schema(), std::filesystem::path(BRUME_SOURCE_DIR) / "tests/mpi/decaying_box.yaml",
      overrides);
  SubCommunicator sub(ranks);
  RunResult result;
  if (!sub.member()) return result;
  const app::RunSetup setup = app::make_run_setup(config);
  const solver::SchemeOptions options = app::scheme_options(config, setup);
  const solver::BoxBoundaries boundaries = app::box_boundaries(config);
  std::array<bool, 3> periodic{};
  for (int d = 0; d < 3; ++d)
    periodic[d] = boundaries.lower[d] == solver::BoundaryKind::periodic;
  const int ghost_layers = solver::required_ghost_layers(options);
  const solver::Decomposition decomposition(sub.comm(), setup.cells, per_axis, periodic,
                                            ghost_layers);
  std::array<double, 3> upper{};
  for (int d = 0; d < 3; ++d)
    upper[d] = setup.lower[d] + setup.size[d];
  const solver::BlockGeometry block = decomposition.block(
      solver::whole_box_geometry({int(setup.cells[0]), int(setup.cells[1]), int(setup.cells[2])},
                                 setup.lower, upper, ghost_layers));
  solver::State state = solver::make_state(block, setup.magnetic, setup.isothermal);
  setup.problem->set_up(app::setup_context(config, setup), state);
  auto ghosts = std::make_shared<solver::HaloExchange>(decomposition, boundaries, block,
                                                       setup.magnetic, setup.isothermal);
  ghosts->fill(state);
  auto integrator = solver::make_integrator(options, block, ghosts);
  app::RunLimits limits;
  limits.stop_time = config.real("clock.stop_time") / setup.code_units.time();
  limits.max_steps = config.integer("clock.max_steps");
  limits.progress_interval = 1e9;
  const io::Log quiet(io::Verbosity::quiet, false);
  result.summary = app::run_loop(*integrator, state, limits, quiet, decomposition);
  result.totals = app::totals(state, decomposition.comm());
  result.fields = gather(state, decomposition);
  return result;
}

void expect_identical_over_rank_counts(const std::vector<std::string>& overrides) {
  const RunResult reference = run_on(1, {1, 1, 1}, overrides);
  const std::vector<std::pair<int, std::array<int, 3>>> layouts{
      {2, {2, 1, 1}}, {2, {1, 1, 2}}, {4, {4, 1, 1}}, {4, {2, 2, 1}},
      {4, {1, 2, 2}}, {4, {2, 1, 2}}, {4, {0, 0, 0}}};
  for (const auto& [ranks, per_axis] : layouts) {
    if (ranks > world_size()) continue;
    const RunResult run = run_on(ranks, per_axis, overrides);
    if (world_rank() != 0) continue;
    const std::string layout = std::to_string(per_axis[0]) + "×" + std::to_string(per_axis[1]) +
                               "×" + std::to_string(per_axis[2]) + " on " + std::to_string(ranks) +
                               " ranks";
    // The run must have done the work it is compared on (not stopped early on a failure).
    EXPECT_EQ(run.summary.end, app::RunEnd::step_limit) << layout;
    EXPECT_EQ(run.summary.steps, 16) << layout;
    EXPECT_EQ(run.fields.shared_face_mismatches, 0) << layout;
    EXPECT_EQ(first_difference(reference.fields, run.fields), "") << layout;
    // The totals of the run report come from exact sums: the same bits on any rank count.
    EXPECT_EQ(run.totals.mass, reference.totals.mass) << layout;
    EXPECT_EQ(run.totals.energy, reference.totals.energy) << layout;
    for (int d = 0; d < 3; ++d)
      EXPECT_EQ(run.totals.momentum[d], reference.totals.momentum[d]) << layout;
    EXPECT_EQ(run.summary.fallback_cells, reference.summary.fallback_cells) << layout;
  }
  if (world_rank() == 0) {
    EXPECT_EQ(reference.summary.steps, 16);
    // The first-order fallback is not decomposition-independent yet across block boundaries;
    // this box must not need it, or the comparison above tests something else.
    EXPECT_EQ(reference.summary.fallback_cells, 0);
  }
}

TEST(MpiRankCountIdentity, PeriodicBoxIsBitwiseIdenticalOn1To4Ranks) {
  expect_identical_over_rank_counts({});
}

TEST(MpiRankCountIdentity, ReflectingZWallsAreBitwiseIdenticalOn1To4Ranks) {
  expect_identical_over_rank_counts(
      {"box.boundaries.z_lower=reflecting", "box.boundaries.z_upper=reflecting"});
}

TEST(MpiRankCountIdentity, OutflowYFacesAreBitwiseIdenticalOn1To4Ranks) {
  expect_identical_over_rank_counts(
      {"box.boundaries.y_lower=outflow", "box.boundaries.y_upper=outflow"});
}

TEST(MpiRankCountIdentity, IsothermalMhdWithPpmIsBitwiseIdenticalOn1To4Ranks) {
  expect_identical_over_rank_counts(
      {"gas.equation_of_state=isothermal", "gas.sound_speed=8 km/s", "scheme.reconstruction=ppm"});
}

TEST(MpiRankCountIdentity, HydrodynamicsWithHllcIsBitwiseIdenticalOn1To4Ranks) {
  expect_identical_over_rank_counts({"gas.magnetized=false", "scheme.riemann_solver=hllc",
                                     "box.boundaries.x_lower=outflow",
                                     "box.boundaries.x_upper=outflow"});
}

}  // namespace
}  // namespace brume::mpi_testing
