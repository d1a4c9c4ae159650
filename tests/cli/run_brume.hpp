// Runs the brume binary as a user would and captures what it prints and its exit code.
#pragma once

#include <filesystem>
#include <string>

namespace brume::testing {

struct CommandResult {
  int exit_code = -1;
  std::string out;  // standard output
  std::string err;  // standard error
};

// `arguments` is appended to the binary's path as shell words, e.g. "check 'my file.yaml'".
CommandResult run_brume(const std::string& arguments);

// The bytes of a file; empty when it cannot be read.
std::string file_bytes(const std::filesystem::path& path);

// A fresh empty folder under the system's temporary directory.
std::string fresh_folder(const std::string& stem);

}  // namespace brume::testing
