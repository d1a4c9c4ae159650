// Runs a Python script with Debian's /usr/bin/python3 (BRUME_PYTHON), which sees the reference
// libraries (numpy, h5py), and captures what it prints.
#pragma once

#include <sys/wait.h>
#include <unistd.h>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

namespace brume::testing {

struct PythonResult {
  int exit_code = -1;
  std::string output;  // standard output and error together
};

// `script` is a path; each argument is passed as one word.
inline PythonResult run_python(const std::filesystem::path& script,
                               const std::vector<std::string>& arguments) {
  const std::filesystem::path output =
      std::filesystem::temp_directory_path() /
      ("brume-python-" + std::to_string(static_cast<long>(::getpid())) + ".txt");
  std::string command = std::string(BRUME_PYTHON) + " '" + script.string() + "'";
  for (const std::string& a : arguments)
    command += " '" + a + "'";
  command += " > '" + output.string() + "' 2>&1";
  const int status = std::system(command.c_str());
  PythonResult result;
  result.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
  std::ifstream in(output);
  std::stringstream text;
  text << in.rdbuf();
  result.output = text.str();
  std::filesystem::remove(output);
  return result;
}

// A script in the source tree, e.g. "tests/io/check_xdmf.py".
inline std::filesystem::path source_script(const std::string& relative) {
  return std::filesystem::path(BRUME_SOURCE_DIR) / relative;
}

}  // namespace brume::testing
