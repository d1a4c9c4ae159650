#include <cstdio>

#include "app/commands.hpp"
#include "app/user_error.hpp"
#include "problems/problem.hpp"

namespace brume::app {

int problems_command(const CommandLine& line) {
  if (!line.positional.empty()) throw UserError("command line: brume problems takes no argument");
  for (const auto& problem : problems::all_problems()) {
    std::printf("%-24s %s\n", problem.name.c_str(), problem.summary.c_str());
  }
  std::printf("\nparameters of each: brume keys problem.NAME\n");
  return 0;
}

}  // namespace brume::app
