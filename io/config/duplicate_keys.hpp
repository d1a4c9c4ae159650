// yaml-cpp keeps both entries of a mapping that repeats a key; brume refuses such input.
#pragma once

#include <string>

#include <yaml-cpp/yaml.h>

namespace brume::config {

// Throws config::Error at the second occurrence of the first repeated key found in document
// order (in any mapping of the tree), naming the line of the first.
void reject_duplicate_keys(const YAML::Node& root, const std::string& file);

}  // namespace brume::config
