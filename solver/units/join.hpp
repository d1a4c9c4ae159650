// Concatenation of message pieces. (Building messages with `"..." + std::string` trips a false
// -Wrestrict in g++ 12 at -O2 and above, so brume's units code builds them through this.)
#pragma once

#include <initializer_list>
#include <string>
#include <string_view>

namespace brume::units {

[[nodiscard]] inline std::string join(std::initializer_list<std::string_view> parts) {
  std::size_t size = 0;
  for (const auto part : parts)
    size += part.size();
  std::string text;
  text.reserve(size);
  for (const auto part : parts)
    text += part;
  return text;
}

}  // namespace brume::units
