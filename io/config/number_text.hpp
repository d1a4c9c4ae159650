// Strict conversions between numbers and the text of a configuration value.
#pragma once

#include <optional>
#include <string>
#include <string_view>

namespace brume::config {

// Shortest text that reads back to exactly the same double ("0.3", "1e-08", "1.6666666666666667").
[[nodiscard]] std::string format_number(double value);

// `value` to `digits` significant digits, printf's %g ("5039", "1.84e+04"), for messages.
[[nodiscard]] std::string format_digits(double value, int digits);

// The whole text as a decimal number (optional sign, digits, fraction, exponent); nullopt when
// anything else is present. Infinite and NaN spellings are not numbers here; see non_finite().
[[nodiscard]] std::optional<double> parse_number(std::string_view text);

// The whole text as a decimal integer that fits in long long.
[[nodiscard]] std::optional<long long> parse_integer(std::string_view text);

// True for the spellings of infinity and NaN (YAML ".inf", ".nan", and "inf", "nan", "infinity"),
// with any sign and letter case, and for decimal numbers too large for a double ("1e400").
[[nodiscard]] bool non_finite(std::string_view text);

// Number of leading characters of text that form a decimal number (0 when none).
[[nodiscard]] std::size_t number_prefix_length(std::string_view text);

}  // namespace brume::config
