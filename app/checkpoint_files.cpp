#include "app/checkpoint_files.hpp"

#include <algorithm>
#include <cstdio>
#include <string>
#include <system_error>

#include "app/user_error.hpp"

namespace brume::app {

namespace fs = std::filesystem;

fs::path checkpoint_name(int number) {
  char name[32];
  std::snprintf(name, sizeof name, "checkpoint-%04d.h5", number);
  return name;
}

std::optional<int> output_number(const fs::path& file, const std::string& stem) {
  const std::string name = file.filename().string();
  const std::string prefix = stem + "-", suffix = ".h5";
  if (name.size() <= prefix.size() + suffix.size() || name.rfind(prefix, 0) != 0 ||
      name.compare(name.size() - suffix.size(), suffix.size(), suffix) != 0) {
    return std::nullopt;
  }
  const std::string digits =
      name.substr(prefix.size(), name.size() - prefix.size() - suffix.size());
  if (digits.size() > 9 ||
      !std::all_of(digits.begin(), digits.end(), [](char c) { return c >= '0' && c <= '9'; })) {
    return std::nullopt;
  }
  return std::stoi(digits);
}

std::vector<fs::path> list_checkpoints(const fs::path& folder) {
  std::vector<std::pair<int, fs::path>> found;
  std::error_code error;
  for (const auto& entry : fs::directory_iterator(folder, error)) {
    if (!entry.is_regular_file()) continue;
    if (const auto n = checkpoint_number(entry.path())) found.emplace_back(*n, entry.path());
  }
  std::sort(found.begin(), found.end());
  std::vector<fs::path> files;
  for (auto& [n, file] : found)
    files.push_back(std::move(file));
  return files;
}

fs::path restart_file(const fs::path& path) {
  fs::path folder = path;
  if (path.filename() == "latest") {
    folder = path.parent_path().empty() ? fs::path(".") : path.parent_path();
  } else if (!fs::is_directory(path)) {
    if (!fs::exists(path)) throw UserError("--restart: " + path.string() + ": no such file");
    return path;
  }
  if (!fs::is_directory(folder))
    throw UserError("--restart: " + folder.string() + ": no such run folder");
  const std::vector<fs::path> files = list_checkpoints(folder);
  if (files.empty()) {
    throw UserError("--restart: " + folder.string() +
                    " holds no checkpoint (expected checkpoint-NNNN.h5)");
  }
  return files.back();
}

void prune_checkpoints(const fs::path& folder, int keep) {
  const std::vector<fs::path> files = list_checkpoints(folder);
  for (std::size_t i = 0; i + std::size_t(std::max(keep, 1)) < files.size(); ++i) {
    std::error_code ignored;  // a checkpoint that cannot be removed is only kept
    fs::remove(files[i], ignored);
  }
}

}  // namespace brume::app
