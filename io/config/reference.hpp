// Reference documentation generated from the schema, so that the docs cannot drift from the code.
#pragma once

#include <string>

#include "io/config/schema.hpp"

namespace brume::config {

// A Markdown page with one table per section (key, type, unit, default, allowed values,
// description), sections in schema order with subsections after their parent. Deterministic.
[[nodiscard]] std::string markdown_reference(const Schema& schema);

// Plain text for the terminal, limited to the sections whose path is section_filter or lies
// under it (all sections when empty). An unknown filter throws config::Error.
[[nodiscard]] std::string text_reference(const Schema& schema, const std::string& section_filter);

}  // namespace brume::config
