#include <cstdio>
#include <filesystem>
#include <stdexcept>

#include "app/commands.hpp"
#include "app/exit_codes.hpp"
#include "app/run_loop.hpp"
#include "app/run_report.hpp"
#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/scheme_choice.hpp"
#include "app/user_error.hpp"
#include "io/atomic_file.hpp"
#include "io/config/load.hpp"
#include "io/provenance.hpp"
#include "io/run_folder.hpp"
#include "solver/box_boundaries.hpp"
#include "solver/units/constants.hpp"

namespace brume::app {

namespace fs = std::filesystem;

namespace {

fs::path run_folder(const CommandLine& line, const config::ResolvedConfig& config) {
  if (line.out) return *line.out;
  if (!config.text("output.folder").empty()) return config.text("output.folder");
  return fs::path("runs") / fs::path(line.positional.front()).stem();
}

std::string resolved_configuration_file(const config::ResolvedConfig& config) {
  std::string text = "# Written by brume from " + config.file_name() + "\n";
  for (const auto& [name, value] : io::provenance())
    text += "#   " + name + ": " + value + "\n";
  return text + config.to_yaml(true);
}

}  // namespace

int run_command(const CommandLine& line, const io::Log& log_in, const MpiSession& mpi) {
  if (line.positional.size() != 1) {
    throw UserError("command line: brume run takes one configuration file, found " +
                    std::to_string(line.positional.size()) + " (brume run CONFIG [--set ...])");
  }
  if (mpi.size() > 1) {
    throw UserError(
        "brume run: this build advances one block on one rank; run it without "
        "mpiexec (domain decomposition over ranks is not available yet)");
  }
  const config::ResolvedConfig config =
      config::load(brume_schema(), line.positional.front(), line.overrides);
  const RunSetup setup = make_run_setup(config);
  const solver::SchemeOptions options = scheme_options(config, setup);

  const fs::path folder = run_folder(line, config);
  try {
    io::create_run_folder(folder);
  } catch (const io::RunFolderError& error) {
    throw UserError(std::string("brume run: ") + error.what());
  }
  io::write_file_atomically(folder / "config.yaml", resolved_configuration_file(config));
  io::Log log = log_in;
  log.copy_to(folder / "run.log");
  log.info("brume: run folder " + folder.string());

  std::array<double, 3> upper{};
  for (int d = 0; d < 3; ++d)
    upper[d] = setup.lower[d] + setup.size[d];
  const solver::BlockGeometry geometry = solver::whole_box_geometry(
      {static_cast<int>(setup.cells[0]), static_cast<int>(setup.cells[1]),
       static_cast<int>(setup.cells[2])},
      setup.lower, upper, solver::required_ghost_layers(options));
  solver::State state = solver::make_state(geometry, setup.magnetic, setup.isothermal);
  setup.problem->set_up(setup_context(config, setup), state);
  auto ghosts = std::make_shared<solver::BoxGhostFiller>(box_boundaries(config));
  ghosts->fill(state);

  std::unique_ptr<solver::Integrator> integrator;
  try {
    integrator = solver::make_integrator(options, geometry, ghosts);
  } catch (const std::invalid_argument& error) {
    throw UserError(config.file_name() + ": scheme: " + error.what());
  }

  RunLimits limits;
  limits.stop_time = config.real("clock.stop_time") / setup.code_units.time();
  limits.max_steps = config.integer("clock.max_steps");
  limits.wall_budget = config.real("clock.wall_budget");
  limits.progress_interval = config.real("output.progress_interval");
  limits.time_unit = units::cgs::megayear / setup.code_units.time();
  const RunTotals before = totals(state);
  const RunSummary summary = run_loop(*integrator, state, limits, log);
  const std::string report = run_report(summary, before, totals(state), state, limits);
  log.info(report);
  io::write_file_atomically(folder / "summary.txt", report + "\n");
  if (summary.end == RunEnd::numerical_failure || summary.end == RunEnd::time_step_collapse) {
    return exit_numerical_failure;
  }
  return exit_success;
}

}  // namespace brume::app
