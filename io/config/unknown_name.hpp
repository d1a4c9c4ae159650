// Messages for names the schema does not know, with a "did you mean" when one is likely.
#pragma once

#include <string>

#include "io/config/schema.hpp"

namespace brume::config {

// For an unknown entry `name` met inside section `section_path` ("" at the top level): the
// message, suggesting a close name of that section, else the full path of a key or section of
// that name elsewhere, else listing what the section holds.
[[nodiscard]] std::string unknown_entry_message(const Schema& schema,
                                                const std::string& section_path,
                                                const std::string& name);

// For an unknown full key path given with --set.
[[nodiscard]] std::string unknown_path_message(const Schema& schema, const std::string& path);

}  // namespace brume::config
