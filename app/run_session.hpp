// A run once its configuration is known: the decomposition over the ranks, this rank's block,
// its ghost filler and integrator — the same for a new run and a restart — and the drive that
// advances it with its outputs (snapshots, checkpoints, the closing report).
#pragma once

#include <filesystem>
#include <memory>
#include <optional>

#include "app/mpi_session.hpp"
#include "app/run_setup.hpp"
#include "app/split_integrator.hpp"
#include "io/config/resolved.hpp"
#include "io/log.hpp"
#include "io/run_record.hpp"
#include "solver/box_boundaries.hpp"
#include "solver/decomposition.hpp"
#include "solver/halo_exchange.hpp"
#include "solver/integrator.hpp"
#include "solver/state.hpp"

namespace brume::app {

struct RunSession {
  config::ResolvedConfig config;
  RunSetup setup;
  std::unique_ptr<solver::Decomposition> decomposition;
  solver::State state;  // this rank's block, not yet set
  std::shared_ptr<solver::HaloExchange> ghosts;
  std::unique_ptr<SplitIntegrator> integrator;  // the ideal step with the source terms
};

// The decomposition of the box over the ranks and this rank's block. Collective. Throws UserError
// for a box that does not divide over the ranks.
struct BlockLayout {
  std::unique_ptr<solver::Decomposition> decomposition;
  solver::BlockGeometry geometry;
  solver::BoxBoundaries boundaries;
};
[[nodiscard]] BlockLayout block_layout(const config::ResolvedConfig& config, const RunSetup& setup,
                                       int ghost_layers);

// Collective. Throws UserError for a box that does not divide over the ranks or impossible
// scheme options.
[[nodiscard]] RunSession make_session(config::ResolvedConfig config);

// Where a restarted run resumes: the checkpoint's record and the number its next checkpoint takes.
struct Resumption {
  io::RunRecord record;
  int next_checkpoint = 0;
};

// Advances the session's state (set, ghosts filled) to its end, writing snapshots, checkpoints
// and summary.txt into `folder`; returns the exit code. Collective.
[[nodiscard]] int drive_run(RunSession& session, const std::filesystem::path& folder,
                            const io::Log& log, const std::optional<Resumption>& resumed);

// "brume: 2 ranks, 2 × 1 × 1 blocks of 32 × 64 × 64 cells"
void log_ranks(const io::Log& log, const MpiSession& mpi, const RunSession& session);

}  // namespace brume::app
