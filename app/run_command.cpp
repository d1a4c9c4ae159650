#include <mpi.h>

#include <cstdio>
#include <filesystem>
#include <functional>
#include <stdexcept>
#include <string>

#include "app/commands.hpp"
#include "app/on_rank_zero.hpp"
#include "app/run_restart.hpp"
#include "app/run_session.hpp"
#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/user_error.hpp"
#include "io/atomic_file.hpp"
#include "io/config/load.hpp"
#include "io/provenance.hpp"
#include "io/run_folder.hpp"
#include "physics/cooling_resolution.hpp"

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
  if (line.restart) return restart_run(line, log_in, mpi);
  if (line.positional.size() != 1) {
    throw UserError("command line: brume run takes one configuration file, found " +
                    std::to_string(line.positional.size()) +
                    " (brume run CONFIG [--set ...], or brume run --restart CHECKPOINT)");
  }
  RunSession session =
      make_session(config::load(brume_schema(), line.positional.front(), line.overrides));
  const config::ResolvedConfig& config = session.config;
  const fs::path folder = run_folder(line, config);
  on_rank_zero(session.decomposition->comm(), [&] {
    try {
      io::create_run_folder(folder);
    } catch (const io::RunFolderError& error) {
      throw UserError(std::string("brume run: ") + error.what());
    }
    io::write_file_atomically(folder / "config.yaml", resolved_configuration_file(config));
  });
  io::Log log = log_in;
  log.copy_to(folder / "run.log");  // rank 0 only: the others do not speak
  log.info("brume: run folder " + folder.string());
  log_ranks(log, mpi, session);
  if (const auto check = physics::field_length_check(config, largest_cell_edge(session.setup));
      check && !check->resolved)
    log.warning(physics::field_length_text(*check));
  session.setup.problem->set_up(setup_context(config, session.setup), session.state);
  session.ghosts->fill(session.state);
  return drive_run(session, folder, log, std::nullopt);
}

}  // namespace brume::app
