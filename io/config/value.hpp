// A resolved value of one key. Reals and quantities are held in the key's own unit (the unit in
// which they are shown and range-checked); the cgs value is that times the unit's factor.
#pragma once

#include <array>
#include <string>
#include <variant>

namespace brume::config {

using Value = std::variant<long long,                 // integer
                           double,                    // real, quantity
                           bool,                      // boolean
                           std::string,               // text, choice
                           std::array<long long, 3>,  // integer ×3
                           std::array<double, 3>>;    // real ×3, quantity ×3

}  // namespace brume::config
