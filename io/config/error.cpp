#include "io/config/error.hpp"

#include <utility>

namespace brume::config {

namespace {

std::string compose(const std::string& file, int line, int column, const std::string& key_path,
                    const std::string& detail) {
  // Appended piece by piece: g++ 12 warns falsely (-Wrestrict) on ":" + std::to_string(...).
  std::string text = file;
  if (line > 0) text.append(":").append(std::to_string(line));
  if (column > 0) text.append(":").append(std::to_string(column));
  text.append(": ");
  if (!key_path.empty()) text.append(key_path).append(": ");
  return text.append(detail);
}

}  // namespace

Error::Error(std::string file, int line, int column, std::string key_path, std::string detail)
    : std::runtime_error(compose(file, line, column, key_path, detail)),
      file_(std::move(file)),
      line_(line),
      column_(column),
      key_path_(std::move(key_path)),
      detail_(std::move(detail)) {}

}  // namespace brume::config
