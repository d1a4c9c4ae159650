// A value written back as YAML text in the key's own unit: "[64, 64, 64]", "20 pc", "plm",
// "\"runs/a b\"", with numbers in their shortest round-trip form.
#pragma once

#include <string>

#include "io/config/key.hpp"
#include "io/config/value.hpp"

namespace brume::config {

[[nodiscard]] std::string value_text(const Key& key, const Value& value);

// text as a YAML double-quoted scalar.
[[nodiscard]] std::string quoted(const std::string& text);

}  // namespace brume::config
