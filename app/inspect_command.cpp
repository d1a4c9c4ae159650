// brume inspect FILE: what a snapshot holds and whether it is sound. It only reads the file.
#include <mpi.h>

#include <cstdio>

#include "app/commands.hpp"
#include "app/exit_codes.hpp"
#include "app/inspect_report.hpp"
#include "app/user_error.hpp"
#include "io/snapshot_integrity.hpp"
#include "io/snapshot_reader.hpp"

namespace brume::app {

int inspect_command(const CommandLine& line) {
  if (line.positional.size() != 1) {
    throw UserError("command line: brume inspect takes one snapshot file, found " +
                    std::to_string(line.positional.size()) +
                    " (brume inspect FILE [--json] [--configuration])");
  }
  const std::string file = line.positional.front();
  std::vector<std::string> problems;
  try {
    // One rank reads: inspecting is not worth a decomposition.
    const io::SnapshotReader reader(file, MPI_COMM_SELF);
    const io::SnapshotIntegrity integrity = io::check_integrity(reader);
    const std::string report = line.json ? inspect_json(reader, integrity)
                                         : inspect_text(reader, integrity, line.configuration);
    std::fputs(report.c_str(), stdout);
    std::fflush(stdout);
    problems = integrity_problems(integrity);
  } catch (const io::SnapshotFileError& error) {
    throw UserError(error.what());
  }
  if (problems.empty()) return exit_success;
  std::string message = file + ": not sound: " + problems.front();
  for (std::size_t n = 1; n < problems.size(); ++n)
    message += "; " + problems[n];
  throw UserError(message);
}

}  // namespace brume::app
