#include "io/atomic_file.hpp"

#include <fcntl.h>
#include <unistd.h>

#include <cerrno>
#include <cstring>
#include <stdexcept>
#include <string>

namespace brume::io {

namespace {

[[noreturn]] void fail(const std::filesystem::path& path, const char* step, int error,
                       const std::string& temporary) {
  if (!temporary.empty()) ::unlink(temporary.c_str());
  throw std::runtime_error("cannot write " + path.string() + ": " + step + ": " +
                           std::strerror(error));
}

}  // namespace

void write_file_atomically(const std::filesystem::path& path, std::string_view text) {
  const std::string temporary =
      path.string() + ".partial-" + std::to_string(static_cast<long>(::getpid()));
  const int fd = ::open(temporary.c_str(), O_WRONLY | O_CREAT | O_TRUNC | O_CLOEXEC, 0644);
  if (fd < 0) fail(path, "open", errno, "");
  std::size_t written = 0;
  while (written < text.size()) {
    const ssize_t n = ::write(fd, text.data() + written, text.size() - written);
    if (n < 0) {
      if (errno == EINTR) continue;
      const int error = errno;
      ::close(fd);
      fail(path, "write", error, temporary);
    }
    written += static_cast<std::size_t>(n);
  }
  if (::fsync(fd) != 0) {
    const int error = errno;
    ::close(fd);
    fail(path, "fsync", error, temporary);
  }
  if (::close(fd) != 0) fail(path, "close", errno, temporary);
  if (::rename(temporary.c_str(), path.c_str()) != 0) fail(path, "rename", errno, temporary);
}

bool flush_to_disk(const std::string& path) {
  const int fd = ::open(path.c_str(), O_RDONLY | O_CLOEXEC);
  if (fd < 0) return false;
  const bool ok = ::fsync(fd) == 0;
  return ::close(fd) == 0 && ok;
}

}  // namespace brume::io
