// The words of the command line, sorted into a subcommand, its positional arguments and options.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "io/log.hpp"

namespace brume::app {

struct CommandLine {
  std::string command;                  // "run", "check", ...; empty for --help / --version alone
  std::vector<std::string> positional;  // e.g. the configuration file
  std::vector<std::string> overrides;   // every --set value, in order
  std::optional<std::string> out;       // --out DIR
  std::optional<std::string> restart;   // --restart CHECKPOINT|RUN_FOLDER (run)
  bool help = false;
  bool version = false;
  bool markdown = false;             // --markdown (keys)
  bool json = false;                 // --json (bench, inspect)
  bool configuration = false;        // --configuration (inspect)
  std::optional<std::string> cells;  // --cells N (bench)
  std::optional<std::string> steps;  // --steps N (bench)
  std::optional<std::string> since;  // --since TIME (steadiness)
  io::Verbosity verbosity = io::Verbosity::normal;
};

// Throws UserError for an unknown option, a missing option value or an unknown subcommand.
[[nodiscard]] CommandLine parse_command_line(const std::vector<std::string>& words);

// The subcommands, with one line each, in the order --help shows them.
struct SubcommandInfo {
  const char* name;
  const char* arguments;
  const char* summary;
};
[[nodiscard]] const std::vector<SubcommandInfo>& subcommands();

}  // namespace brume::app
