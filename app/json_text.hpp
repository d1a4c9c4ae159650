// The few pieces of JSON that `--json` output needs (RFC 8259): strings and numbers.
#pragma once

#include <string>

namespace brume::app {

// A quoted JSON string: quote, backslash and control characters escaped.
[[nodiscard]] std::string json_string(const std::string& text);

// A JSON number that reads back to the same double (%.17g); null for NaN and infinities, which
// JSON cannot hold.
[[nodiscard]] std::string json_number(double value);

}  // namespace brume::app
