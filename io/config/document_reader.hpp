// Walking a parsed input file against the schema: every section and key it holds is known, of the
// right shape and passes its key's checks; the values are collected with their positions.
#pragma once

#include <string>

#include <yaml-cpp/yaml.h>

#include "io/config/found_settings.hpp"
#include "io/config/schema.hpp"

namespace brume::config {

// root is the document (already checked for duplicate keys). Throws config::Error.
[[nodiscard]] FoundSettings read_document(const Schema& schema, const YAML::Node& root,
                                          const std::string& file);

}  // namespace brume::config
