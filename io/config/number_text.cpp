#include "io/config/number_text.hpp"

#include <algorithm>
#include <cctype>
#include <charconv>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <system_error>

namespace brume::config {

namespace {

bool is_digit(char c) {
  return c >= '0' && c <= '9';
}

// Length of the decimal-number grammar at the start of text: [+-]? (d+ (. d*)? | . d+)
// ([eE][+-]?d+)?
std::size_t scan_decimal(std::string_view text) {
  std::size_t i = 0;
  if (i < text.size() && (text[i] == '+' || text[i] == '-')) ++i;
  std::size_t digits = 0;
  while (i < text.size() && is_digit(text[i]))
    ++i, ++digits;
  if (i < text.size() && text[i] == '.') {
    ++i;
    while (i < text.size() && is_digit(text[i]))
      ++i, ++digits;
  }
  if (digits == 0) return 0;
  if (i < text.size() && (text[i] == 'e' || text[i] == 'E')) {
    std::size_t j = i + 1;
    if (j < text.size() && (text[j] == '+' || text[j] == '-')) ++j;
    std::size_t exponent_digits = 0;
    while (j < text.size() && is_digit(text[j]))
      ++j, ++exponent_digits;
    if (exponent_digits > 0) i = j;
  }
  return i;
}

std::string lower(std::string_view text) {
  std::string out(text);
  std::transform(out.begin(), out.end(), out.begin(),
                 [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
  return out;
}

}  // namespace

std::string format_number(double value) {
  char buffer[64];
  const auto result = std::to_chars(buffer, buffer + sizeof buffer, value);
  return std::string(buffer, result.ptr);
}

std::string format_digits(double value, int digits) {
  char buffer[64];
  std::snprintf(buffer, sizeof buffer, "%.*g", digits, value);
  return buffer;
}

std::size_t number_prefix_length(std::string_view text) {
  return scan_decimal(text);
}

std::optional<double> parse_number(std::string_view text) {
  if (text.empty() || scan_decimal(text) != text.size()) return std::nullopt;
  if (text.front() == '+') text.remove_prefix(1);
  const double value = std::strtod(std::string(text).c_str(), nullptr);  // grammar checked above
  if (!std::isfinite(value)) return std::nullopt;
  return value;
}

std::optional<long long> parse_integer(std::string_view text) {
  if (!text.empty() && text.front() == '+') text.remove_prefix(1);
  if (text.empty()) return std::nullopt;
  long long value = 0;
  const auto result = std::from_chars(text.data(), text.data() + text.size(), value);
  if (result.ec != std::errc{} || result.ptr != text.data() + text.size()) return std::nullopt;
  return value;
}

bool non_finite(std::string_view text) {
  std::string word = lower(text);
  if (!word.empty() && (word.front() == '+' || word.front() == '-')) word.erase(0, 1);
  if (!word.empty() && word.front() == '.') word.erase(0, 1);
  if (word == "inf" || word == "infinity" || word == "nan") return true;
  if (!text.empty() && scan_decimal(text) == text.size()) {
    // Grammatically a number: non-finite only if it overflows.
    return !std::isfinite(std::strtod(std::string(text).c_str(), nullptr));
  }
  return false;
}

}  // namespace brume::config
