#include "tests/cli/run_brume.hpp"

#include <sys/wait.h>

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <stdexcept>

namespace brume::testing {

std::string file_bytes(const std::filesystem::path& path) {
  std::ifstream in(path, std::ios::binary);
  std::stringstream text;
  text << in.rdbuf();
  return text.str();
}

std::string fresh_folder(const std::string& stem) {
  std::string pattern = (std::filesystem::temp_directory_path() / (stem + "-XXXXXX")).string();
  if (mkdtemp(pattern.data()) == nullptr) throw std::runtime_error("mkdtemp failed for " + pattern);
  return pattern;
}

CommandResult run_brume(const std::string& arguments) {
  const std::filesystem::path folder = fresh_folder("brume-cli");
  const auto out = folder / "out.txt";
  const auto err = folder / "err.txt";
  const std::string command =
      std::string("OMPI_ALLOW_RUN_AS_ROOT=1 OMPI_ALLOW_RUN_AS_ROOT_CONFIRM=1 '") + BRUME_BINARY +
      "' " + arguments + " >'" + out.string() + "' 2>'" + err.string() + "' </dev/null";
  const int status = std::system(command.c_str());
  CommandResult result;
  result.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
  result.out = file_bytes(out);
  result.err = file_bytes(err);
  std::filesystem::remove_all(folder);
  return result;
}

}  // namespace brume::testing
