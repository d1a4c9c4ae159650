// The exit codes of the brume command (documented in docs/command-line.md).
#pragma once

namespace brume::app {

enum ExitCode : int {
  exit_success = 0,
  exit_internal_error = 1,  // a bug or an unexpected system failure: context is printed
  exit_user_error = 2,  // bad configuration, missing file, impossible parameters, bad command line
  exit_numerical_failure = 3,  // NaN or exhausted floors: a diagnostic snapshot is written
  exit_stopped_early = 4,  // wall budget or stop signal: a checkpoint is written, restart to go on
};

}  // namespace brume::app
