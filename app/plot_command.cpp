// brume plot RUN_FOLDER [--out DIR]: the figures of a run folder, drawn by scripts/brume_plot.py
// (matplotlib) with the Python fixed at configure time; its exit code is brume's (docs/plots.md).
#include <spawn.h>
#include <sys/wait.h>

#include <cerrno>
#include <cstdio>
#include <cstring>
#include <filesystem>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

#include "app/commands.hpp"
#include "app/exit_codes.hpp"
#include "app/user_error.hpp"

extern char** environ;

namespace brume::app {

namespace {

namespace fs = std::filesystem;

// Runs `words` (the program first) and waits for it; its exit code, or 1 if a signal ended it.
int spawn_and_wait(std::vector<std::string> words) {
  std::vector<char*> argv;
  for (std::string& w : words)
    argv.push_back(w.data());
  argv.push_back(nullptr);
  pid_t child = 0;
  const int failed = posix_spawn(&child, argv[0], nullptr, nullptr, argv.data(), environ);
  if (failed != 0) {
    throw std::runtime_error("brume plot: cannot start " + words[0] + ": " + std::strerror(failed));
  }
  int status = 0;
  while (waitpid(child, &status, 0) < 0) {
    if (errno != EINTR) throw std::runtime_error("brume plot: waitpid failed");
  }
  return WIFEXITED(status) ? WEXITSTATUS(status) : exit_internal_error;
}

}  // namespace

int plot_command(const CommandLine& line) {
  if (line.positional.size() != 1) {
    throw UserError("command line: brume plot takes one run folder, found " +
                    std::to_string(line.positional.size()) +
                    " (brume plot RUN_FOLDER [--out DIR])");
  }
  if (!line.overrides.empty()) {
    throw UserError("command line: brume plot takes no --set (brume plot RUN_FOLDER [--out DIR])");
  }
  const std::string folder = line.positional.front();
  if (!fs::is_directory(folder)) throw UserError(folder + ": no such run folder");
  const std::string script = BRUME_PLOT_SCRIPT;
  if (!fs::exists(script)) {
    throw std::runtime_error("brume plot: the plotting script " + script +
                             " is missing (it is found in the source tree brume was built from)");
  }
  std::vector<std::string> words = {BRUME_PLOT_PYTHON, script, folder};
  if (line.out) {
    words.emplace_back("--out");
    words.push_back(*line.out);
  }
  std::fflush(stdout);
  std::fflush(stderr);
  return spawn_and_wait(std::move(words));
}

}  // namespace brume::app
