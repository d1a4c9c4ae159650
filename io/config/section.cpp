#include "io/config/section.hpp"

namespace brume::config {

const Key* Section::find(std::string_view key_name) const {
  for (const Key& key : keys) {
    if (key.name == key_name) return &key;
  }
  return nullptr;
}

std::string Section::leaf() const {
  const auto dot = path.rfind('.');
  return dot == std::string::npos ? path : path.substr(dot + 1);
}

std::string Section::parent() const {
  const auto dot = path.rfind('.');
  return dot == std::string::npos ? "" : path.substr(0, dot);
}

}  // namespace brume::config
