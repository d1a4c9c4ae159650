// One of brume's YAML inputs set up on the first `ranks` ranks of MPI_COMM_WORLD in a chosen
// decomposition, as `brume run` sets it up: the registered problem fills each block, the halo
// exchange fills the ghosts, and the integrator is ready to advance.
#pragma once

#include <array>
#include <memory>
#include <string>
#include <vector>

#include "app/run_setup.hpp"
#include "io/config/resolved.hpp"
#include "solver/decomposition.hpp"
#include "solver/halo_exchange.hpp"
#include "solver/integrator.hpp"
#include "solver/state.hpp"
#include "tests/mpi/sub_communicator.hpp"

namespace brume::mpi_testing {

struct DecomposedRun {
  // Declaration order is destruction order reversed: the communicators outlive their users.
  std::unique_ptr<SubCommunicator> sub;
  config::ResolvedConfig config;
  app::RunSetup setup;
  solver::SchemeOptions options;
  std::unique_ptr<solver::Decomposition> decomposition;  // null on ranks beyond `ranks`
  solver::State state;
  std::shared_ptr<solver::HaloExchange> ghosts;
  std::unique_ptr<solver::Integrator> integrator;
  [[nodiscard]] bool member() const { return decomposition != nullptr; }
};

// `input` relative to the source folder (e.g. "tests/mpi/decaying_box.yaml"), with command-line
// style overrides. Collective over MPI_COMM_WORLD.
[[nodiscard]] DecomposedRun start_decomposed(const std::string& input, int ranks,
                                             const std::array<int, 3>& per_axis,
                                             const std::vector<std::string>& overrides);

// "2×1×1 on 2 ranks", for messages.
[[nodiscard]] std::string layout_name(int ranks, const std::array<int, 3>& per_axis);

}  // namespace brume::mpi_testing
