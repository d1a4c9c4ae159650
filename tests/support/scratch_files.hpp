// Files for tests that write: a fresh folder under the system's temporary directory, and the
// text of a file.
#pragma once

#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>

namespace brume::testing {

// An empty folder TMP/brume-STEM-NAME (emptied when it exists).
inline std::filesystem::path scratch_folder(const std::string& stem, const std::string& name) {
  const std::filesystem::path folder =
      std::filesystem::temp_directory_path() / ("brume-" + stem + "-" + name);
  std::filesystem::remove_all(folder);
  std::filesystem::create_directories(folder);
  return folder;
}

// The whole text of a file; empty when it cannot be read.
inline std::string text_of(const std::filesystem::path& path) {
  std::ifstream in(path);
  std::stringstream text;
  text << in.rdbuf();
  return text.str();
}

}  // namespace brume::testing
