#include "tests/mpi/decomposed_run.hpp"

#include <filesystem>

#include "app/schema.hpp"
#include "app/scheme_choice.hpp"
#include "io/config/load.hpp"

namespace brume::mpi_testing {

DecomposedRun start_decomposed(const std::string& input, int ranks,
                               const std::array<int, 3>& per_axis,
                               const std::vector<std::string>& overrides) {
  DecomposedRun run{
      std::make_unique<SubCommunicator>(ranks),
      config::load(app::brume_schema(), std::filesystem::path(BRUME_SOURCE_DIR) / input, overrides),
      {},
      {},
      nullptr,
      {},
      nullptr,
      nullptr};
  if (!run.sub->member()) return run;
  run.setup = app::make_run_setup(run.config);
  run.options = app::scheme_options(run.config, run.setup);
  const solver::BoxBoundaries boundaries = app::box_boundaries(run.config);
  std::array<bool, 3> periodic{};
  for (int d = 0; d < 3; ++d)
    periodic[d] = boundaries.lower[d] == solver::BoundaryKind::periodic;
  const int ghost_layers = solver::required_ghost_layers(run.options);
  run.decomposition = std::make_unique<solver::Decomposition>(run.sub->comm(), run.setup.cells,
                                                              per_axis, periodic, ghost_layers);
  std::array<double, 3> upper{};
  for (int d = 0; d < 3; ++d)
    upper[d] = run.setup.lower[d] + run.setup.size[d];
  const std::array<int, 3> cells{int(run.setup.cells[0]), int(run.setup.cells[1]),
                                 int(run.setup.cells[2])};
  const solver::BlockGeometry block = run.decomposition->block(
      solver::whole_box_geometry(cells, run.setup.lower, upper, ghost_layers));
  run.state = solver::make_state(block, run.setup.magnetic, run.setup.isothermal);
  run.setup.problem->set_up(app::setup_context(run.config, run.setup), run.state);
  run.ghosts = std::make_shared<solver::HaloExchange>(*run.decomposition, boundaries, block,
                                                      run.setup.magnetic, run.setup.isothermal);
  run.ghosts->fill(run.state);
  run.integrator = solver::make_integrator(run.options, block, run.ghosts);
  return run;
}

std::string layout_name(int ranks, const std::array<int, 3>& per_axis) {
  return std::to_string(per_axis[0]) + "×" + std::to_string(per_axis[1]) + "×" +
         std::to_string(per_axis[2]) + " on " + std::to_string(ranks) + " ranks";
}

}  // namespace brume::mpi_testing
