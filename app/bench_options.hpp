// The options `brume bench` and `brume bench scaling` share: counts from the command line and the
// default number of timed steps.
#pragma once

#include <optional>
#include <string>

namespace brume::app {

// The value of `option` (e.g. "--cells") as a positive integer, `fallback` when it is absent;
// throws UserError naming the option and the text found.
[[nodiscard]] int positive_count(const std::optional<std::string>& text, const char* option,
                                 int fallback);

// Timed steps of a cells³ block: about 2.7 million cell-updates, at least three steps.
[[nodiscard]] int default_steps(int cells);

}  // namespace brume::app
