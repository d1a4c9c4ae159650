// Reading one key's value from a YAML node: type, count, unit, range and choice checks. The same
// reader serves input files, --set arguments and schema defaults.
#pragma once

#include <optional>
#include <string>

#include <yaml-cpp/yaml.h>

#include "io/config/key.hpp"
#include "io/config/value.hpp"

namespace brume::config {

struct ReadFailure {
  YAML::Mark mark;          // where in the node's text the problem is
  std::string path_suffix;  // "[1]" when one element of a list is wrong, else empty
  std::string detail;       // "found 2.5, expected an integer"
};

struct ReadResult {
  std::optional<Value> value;  // set on success
  ReadFailure failure;         // meaningful when !value
};

// Factor from the key's unit to cgs (1 for keys that are not quantities). Throws
// std::logic_error when the schema unit is unknown or of another dimension.
[[nodiscard]] double unit_factor(const Key& key);

// Read node as a value of key. key_mark is used for an empty (null) node, which has no position
// of its own.
[[nodiscard]] ReadResult read_value(const Key& key, const YAML::Node& node,
                                    const YAML::Mark& key_mark);

}  // namespace brume::config
