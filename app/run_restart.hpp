// `brume run --restart PATH`: continue a run from a checkpoint, in the run folder that holds it,
// with the configuration stored in the checkpoint (clock.* and output.* may be changed by --set).
#pragma once

#include "app/command_line.hpp"
#include "app/mpi_session.hpp"
#include "io/log.hpp"

namespace brume::app {

// Throws UserError (exit code 2) for a path that holds no checkpoint, a file that is not one of
// brume's checkpoints, or --set of a key outside clock and output; nothing is written then.
[[nodiscard]] int restart_run(const CommandLine& line, const io::Log& log, const MpiSession& mpi);

}  // namespace brume::app
