// The subcommands. Each returns an exit code and throws config::Error or UserError for bad input.
#pragma once

#include "app/command_line.hpp"
#include "app/mpi_session.hpp"
#include "io/log.hpp"

namespace brume::app {

[[nodiscard]] int check_command(const CommandLine& line, const io::Log& log);
[[nodiscard]] int keys_command(const CommandLine& line);
[[nodiscard]] int problems_command(const CommandLine& line);
[[nodiscard]] int bench_command(const CommandLine& line, const io::Log& log);
[[nodiscard]] int inspect_command(const CommandLine& line);
[[nodiscard]] int analyze_command(const CommandLine& line, const io::Log& log);
[[nodiscard]] int plot_command(const CommandLine& line);
[[nodiscard]] int steadiness_command(const CommandLine& line);
[[nodiscard]] int run_command(const CommandLine& line, const io::Log& log, const MpiSession& mpi);

}  // namespace brume::app
