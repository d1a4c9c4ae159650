#include "app/bench_options.hpp"

#include <algorithm>
#include <exception>

#include "app/user_error.hpp"

namespace brume::app {

int positive_count(const std::optional<std::string>& text, const char* option, int fallback) {
  if (!text) return fallback;
  std::size_t used = 0;
  int value = 0;
  try {
    value = std::stoi(*text, &used);
  } catch (const std::exception&) {
    used = 0;
  }
  if (used != text->size() || value < 1) {
    throw UserError(std::string("command line: ") + option +
                    " expects a positive integer, found '" + *text + "'");
  }
  return value;
}

int default_steps(int cells) {
  const double per_step = double(cells) * cells * cells;
  return std::max(3, int(2.7e6 / per_step));
}

}  // namespace brume::app
