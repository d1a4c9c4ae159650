#include "io/log.hpp"

#include <stdexcept>

namespace brume::io {

namespace {
void put(std::FILE* stream, std::string_view prefix, std::string_view message) {
  std::fprintf(stream, "%.*s%.*s\n", static_cast<int>(prefix.size()), prefix.data(),
               static_cast<int>(message.size()), message.data());
  std::fflush(stream);
}
}  // namespace

void Log::keep(std::string_view prefix, std::string_view message) const {
  if (file_) put(file_.get(), prefix, message);
}

void Log::info(std::string_view message) const {
  if (!speaks_) return;
  if (verbosity_ != Verbosity::quiet) put(stdout, "", message);
  keep("", message);
}

void Log::detail(std::string_view message) const {
  if (speaks_ && verbosity_ == Verbosity::verbose) put(stdout, "", message);
}

void Log::warning(std::string_view message) const {
  if (!speaks_) return;
  put(stderr, "brume: warning: ", message);
  keep("warning: ", message);
}

void Log::copy_to(const std::filesystem::path& file) {
  if (!speaks_) return;
  std::FILE* stream = std::fopen(file.c_str(), "a");
  if (stream == nullptr) throw std::runtime_error("cannot open " + file.string() + " for writing");
  file_.reset(stream, [](std::FILE* f) { std::fclose(f); });
}

}  // namespace brume::io
