#include "app/help_text.hpp"

#include <cstdio>

#include "app/command_line.hpp"
#include "io/provenance.hpp"

namespace brume::app {

std::string help_text() {
  std::string text =
      "brume: driven, magnetized, multiphase turbulence boxes\n"
      "\n"
      "usage: brume COMMAND [ARGUMENTS] [OPTIONS]\n"
      "       brume --help | --version\n"
      "\n"
      "commands:\n";
  for (const auto& command : subcommands()) {
    char line[256];
    std::snprintf(line, sizeof line, "  %-9s %s\n  %-9s   %s\n", command.name, command.arguments,
                  "", command.summary);
    text += line;
  }
  text +=
      "\n"
      "options:\n"
      "  --set SECTION.KEY=VALUE  override one configuration key (repeatable); the value is\n"
      "                           validated like the file, units allowed: --set box.size=20pc\n"
      "  --out DIR                run folder for `run` (default: output.folder, else runs/NAME);\n"
      "                           `analyze`: the statistics file (default SNAPSHOT-statistics.h5)\n"
      "                           `plot`: the figures' folder (default RUN_FOLDER/figures)\n"
      "  --restart PATH           `run`: continue from a checkpoint file, or from the newest\n"
      "                           checkpoint of a run folder; --set may change clock.* and "
      "output.*\n"
      "  --since TIME             `steadiness`: start of the window judged (default: the second\n"
      "                           half of the time series), e.g. --since 3Myr\n"
      "  --json                   machine-readable output for `bench` and `inspect`\n"
      "  --configuration          `inspect`: also print the resolved configuration in the file\n"
      "  --quiet, -q              only warnings and errors\n"
      "  --verbose, -v            more detail\n"
      "  --help, -h               this text\n"
      "  --version                version, commit, compiler, flags and library versions\n"
      "\n"
      "exit codes: 0 success, 1 internal error, 2 user error (bad input), 3 numerical failure,\n"
      "            4 stopped early with a checkpoint (wall budget or signal): restart to go on\n"
      "in parallel: mpiexec -n RANKS brume run CONFIG  (same input file)\n"
      "documentation: docs/ in the source tree; every key: brume keys\n";
  return text;
}

std::string version_text() {
  std::string text;
  for (const auto& [name, value] : io::provenance()) {
    text += name == "version" ? "brume " + value + "\n" : "  " + name + ": " + value + "\n";
  }
  return text;
}

}  // namespace brume::app
