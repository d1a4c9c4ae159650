#include <cstdio>

#include "app/commands.hpp"
#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/user_error.hpp"
#include "io/config/load.hpp"

namespace brume::app {

int check_command(const CommandLine& line, const io::Log& log) {
  if (line.positional.size() != 1) {
    throw UserError("command line: brume check takes one configuration file, found " +
                    std::to_string(line.positional.size()) + " (brume check CONFIG [--set ...])");
  }
  const config::ResolvedConfig config =
      config::load(brume_schema(), line.positional.front(), line.overrides);
  const RunSetup setup = make_run_setup(config);
  if (!log.speaks()) return 0;
  std::string text = "# " + config.file_name() + ": valid. Fully resolved configuration:\n";
  text += config.to_yaml(log.verbosity() != io::Verbosity::quiet);
  text += "\n# Derived quantities\n";
  for (const auto& [name, value] : derived_quantities(config, setup)) {
    text += "#   " + name + ": " + value + "\n";
  }
  std::fputs(text.c_str(), stdout);
  return 0;
}

}  // namespace brume::app
