// The brume command: parses the command line, runs the subcommand, turns errors into exit codes.
#pragma once

namespace brume::app {

[[nodiscard]] int brume_main(int argc, char** argv);

}  // namespace brume::app
