// Reading a configuration: an input file (or text) checked against the schema, with command-line
// overrides "section.key=value" applied on top. Every user mistake throws config::Error.
#pragma once

#include <filesystem>
#include <string>
#include <vector>

#include "io/config/error.hpp"
#include "io/config/resolved.hpp"
#include "io/config/schema.hpp"

namespace brume::config {

[[nodiscard]] ResolvedConfig load(const Schema& schema, const std::filesystem::path& file,
                                  const std::vector<std::string>& overrides);

// The same from text already in memory (tests, a configuration stored in a snapshot);
// display_name stands for the file name in messages and provenance.
[[nodiscard]] ResolvedConfig load_text(const Schema& schema, const std::string& yaml,
                                       const std::string& display_name,
                                       const std::vector<std::string>& overrides);

}  // namespace brume::config
