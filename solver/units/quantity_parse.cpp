// parse_quantity: "20 pc", "1.5e4K", "-3" into a number and an optional unit.
#include <charconv>
#include <cmath>

#include "solver/units/join.hpp"
#include "solver/units/unit_table.hpp"

namespace brume::units {

namespace {

bool is_space(char c) {
  return c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\f' || c == '\v';
}

std::string_view trimmed(std::string_view text) {
  while (!text.empty() && is_space(text.front()))
    text.remove_prefix(1);
  while (!text.empty() && is_space(text.back()))
    text.remove_suffix(1);
  return text;
}

// Characters that, right after a number, mean the number itself is malformed ("1.2.3", "1,5").
bool continues_number(char c) {
  return (c >= '0' && c <= '9') || c == '.' || c == ',' || c == '+' || c == '-';
}

QuantityParse failure(std::string message) {
  QuantityParse parse;
  parse.error = std::move(message);
  return parse;
}

}  // namespace

QuantityParse parse_quantity(std::string_view text) {
  const std::string_view value = trimmed(text);
  if (value.empty()) return failure("empty value: expected a number with an optional unit");
  // std::from_chars reads C-locale numbers but not a leading '+'.
  const std::size_t skip = (value.size() > 1 && value[0] == '+' && value[1] != '-') ? 1 : 0;
  const char* first = value.data() + skip;
  const char* last = value.data() + value.size();
  double number = 0.0;
  const auto [end, error] = std::from_chars(first, last, number);
  const std::string quoted = join({"'", value, "'"});
  if (error == std::errc::invalid_argument)
    return failure(join({"expected a number at the start of ", quoted}));
  if (error == std::errc::result_out_of_range)
    return failure(join({"the number in ", quoted, " is outside the range of double"}));
  if (!std::isfinite(number)) return failure(join({"the number in ", quoted, " is not finite"}));
  if (end != last && continues_number(*end)) {
    const char* word_end = end;
    while (word_end != last && !is_space(*word_end))
      ++word_end;
    return failure(join({"malformed number '", std::string_view(value.data(), word_end),
                         "' (a number is written like 12, -0.5 or 1.5e4, with '.' as decimal "
                         "point)"}));
  }
  QuantityParse parse;
  parse.number = number;
  const std::string_view unit_text = trimmed(std::string_view(end, last));
  if (unit_text.empty()) {
    parse.ok = true;
    return parse;
  }
  UnitParse unit = parse_unit(unit_text);
  if (!unit.ok) return failure(std::move(unit.error));
  parse.ok = true;
  parse.has_unit = true;
  parse.unit = unit.unit;
  return parse;
}

}  // namespace brume::units
