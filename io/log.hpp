// Messages to the terminal: only rank 0 speaks, at one of three levels chosen on the command line.
// A run also keeps what was said in its run folder (copy_to).
#pragma once

#include <cstdio>
#include <filesystem>
#include <memory>
#include <string_view>

namespace brume::io {

enum class Verbosity { quiet, normal, verbose };

class Log {
 public:
  // `speaks` is false on every MPI rank but rank 0.
  Log(Verbosity verbosity, bool speaks) : verbosity_(verbosity), speaks_(speaks) {}

  void info(std::string_view message) const;     // normal and verbose
  void detail(std::string_view message) const;   // verbose only
  void warning(std::string_view message) const;  // always, to stderr, prefixed "brume: warning: "
  [[nodiscard]] Verbosity verbosity() const { return verbosity_; }
  [[nodiscard]] bool speaks() const { return speaks_; }

  // From now on every message (at any verbosity but detail) is also appended to `file`.
  void copy_to(const std::filesystem::path& file);

 private:
  void keep(std::string_view prefix, std::string_view message) const;

  Verbosity verbosity_;
  bool speaks_;
  std::shared_ptr<std::FILE> file_;
};

}  // namespace brume::io
