#include "app/brume_main.hpp"

#include <mpi.h>

#include <cstdio>
#include <string>
#include <vector>

#include "app/commands.hpp"
#include "app/exit_codes.hpp"
#include "app/help_text.hpp"
#include "app/user_error.hpp"
#include "io/config/error.hpp"

namespace brume::app {

namespace {

int dispatch(const CommandLine& line, const io::Log& log, const MpiSession& mpi) {
  if (line.version) {
    if (log.speaks()) std::fputs(version_text().c_str(), stdout);
    return exit_success;
  }
  if (line.command.empty()) {
    if (log.speaks()) std::fputs(help_text().c_str(), line.help ? stdout : stderr);
    return line.help ? exit_success : exit_user_error;
  }
  if (line.command == "check") return check_command(line, log);
  if (line.command == "keys") return log.speaks() ? keys_command(line) : exit_success;
  if (line.command == "problems") return log.speaks() ? problems_command(line) : exit_success;
  if (line.command == "bench") return bench_command(line, log);
  if (line.command == "inspect") return log.speaks() ? inspect_command(line) : exit_success;
  if (line.command == "analyze") return analyze_command(line, log);
  if (line.command == "plot") return log.speaks() ? plot_command(line) : exit_success;
  if (line.command == "steadiness") {
    return log.speaks() ? steadiness_command(line) : exit_success;
  }
  return run_command(line, log, mpi);
}

void report(const io::Log& log, const char* kind, const char* message) {
  if (log.speaks()) std::fprintf(stderr, "brume: %s: %s\n", kind, message);
}

}  // namespace

int brume_main(int argc, char** argv) {
  MpiSession mpi(argc, argv);
  io::Log log(io::Verbosity::normal, mpi.rank() == 0);
  try {
    const std::vector<std::string> words(argv + 1, argv + argc);
    const CommandLine line = parse_command_line(words);
    log = io::Log(line.verbosity, mpi.rank() == 0);
    return dispatch(line, log, mpi);
  } catch (const config::Error& error) {
    report(log, "error", error.what());
    return exit_user_error;
  } catch (const UserError& error) {
    report(log, "error", error.what());
    return exit_user_error;
  } catch (const std::exception& error) {
    // Internal errors may strike one rank only: take the others down with it.
    std::fprintf(stderr, "brume: internal error on rank %d: %s\n", mpi.rank(), error.what());
    if (mpi.size() > 1) MPI_Abort(MPI_COMM_WORLD, exit_internal_error);
    return exit_internal_error;
  }
}

}  // namespace brume::app
