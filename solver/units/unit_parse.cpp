// parse_unit: unit expressions such as "km/s", "erg cm^3 s^-1", "cm⁻³" into a factor and dimension.
#include <array>
#include <charconv>
#include <cmath>
#include <cstdlib>
#include <optional>

#include "solver/units/join.hpp"
#include "solver/units/nearest_spelling.hpp"
#include "solver/units/unit_table.hpp"

namespace brume::units {

namespace {

// UTF-8 spellings the parser accepts besides ASCII.
constexpr std::array<std::string_view, 10> superscript_digits{
    "\u2070", "\u00b9", "\u00b2", "\u00b3", "\u2074",
    "\u2075", "\u2076", "\u2077", "\u2078", "\u2079"};
constexpr std::string_view superscript_minus = "\u207b";
constexpr std::string_view superscript_plus = "\u207a";
constexpr std::string_view minus_sign = "\u2212";
constexpr std::array<std::string_view, 3> product_signs{"*", "\u00b7", "\u22c5"};  // * · ⋅

constexpr int largest_power = 99;

bool is_space(char c) {
  return c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\f' || c == '\v';
}

struct Cursor {
  std::string_view text;
  std::size_t pos = 0;

  [[nodiscard]] bool done() const { return pos >= text.size(); }
  [[nodiscard]] std::string_view rest() const { return text.substr(pos); }
  bool eat(std::string_view token) {
    if (!rest().starts_with(token)) return false;
    pos += token.size();
    return true;
  }
  void skip_spaces() {
    while (!done() && is_space(text[pos]))
      ++pos;
  }
  [[nodiscard]] std::size_t product_sign_length() const {
    for (const auto sign : product_signs)
      if (rest().starts_with(sign)) return sign.size();
    return 0;
  }
  [[nodiscard]] bool at_superscript() const {
    if (rest().starts_with(superscript_minus) || rest().starts_with(superscript_plus)) return true;
    for (const auto digit : superscript_digits)
      if (rest().starts_with(digit)) return true;
    return false;
  }
  // End of a factor: end of text, whitespace or a separator.
  [[nodiscard]] bool at_boundary() const {
    return done() || is_space(text[pos]) || text[pos] == '/' || product_sign_length() > 0;
  }
  // Inside a symbol: anything that cannot start a power, separator or bracket.
  [[nodiscard]] bool in_symbol() const {
    return !at_boundary() && text[pos] != '^' && text[pos] != '(' && text[pos] != ')' &&
           !at_superscript();
  }
};

std::optional<int> eat_superscript_digit(Cursor& cursor) {
  for (std::size_t d = 0; d < superscript_digits.size(); ++d)
    if (cursor.eat(superscript_digits[d])) return static_cast<int>(d);
  return std::nullopt;
}

// Reads the power after a symbol ("^-3", "^2", "⁻³", "²" or nothing = 1); nothing on malformed.
std::optional<int> read_power(Cursor& cursor) {
  int sign = 1;
  std::string digits;
  if (cursor.eat("^")) {
    if (cursor.eat("-") || cursor.eat(minus_sign)) {
      sign = -1;
    } else {
      cursor.eat("+");
    }
    while (!cursor.done() && cursor.text[cursor.pos] >= '0' && cursor.text[cursor.pos] <= '9')
      digits += cursor.text[cursor.pos++];
  } else if (cursor.at_superscript()) {
    if (cursor.eat(superscript_minus)) {
      sign = -1;
    } else {
      cursor.eat(superscript_plus);
    }
    while (const auto digit = eat_superscript_digit(cursor))
      digits += static_cast<char>('0' + *digit);
  } else {
    return 1;
  }
  int magnitude = 0;
  const auto [end, error] =
      std::from_chars(digits.data(), digits.data() + digits.size(), magnitude);
  if (digits.empty() || error != std::errc{} || end != digits.data() + digits.size() ||
      magnitude > largest_power || !cursor.at_boundary())
    return std::nullopt;
  return sign * magnitude;
}

std::optional<Unit> find_symbol(std::string_view symbol) {
  if (symbol == "1") return Unit{};
  for (const auto& named : named_units())
    if (named.symbol == symbol) return named.unit;
  return std::nullopt;
}

std::string unknown_symbol_message(std::string_view symbol) {
  std::vector<std::string_view> symbols;
  for (const auto& named : named_units())
    symbols.push_back(named.symbol);
  std::string message = join({"unknown unit '", symbol, "'"});
  if (const auto suggestion = nearest_spelling(symbol, symbols))
    message += join({" (did you mean '", *suggestion, "'?)"});
  return message;
}

UnitParse failure(std::string message) {
  return {false, {}, std::move(message)};
}

std::string quoted(std::string_view text) {
  return join({"'", text, "'"});
}

enum class Last { start, factor, product, division };

}  // namespace

UnitParse parse_unit(std::string_view text) {
  const std::string whole = quoted(text);
  Cursor cursor{text};
  Unit result;
  Last last = Last::start;
  while (true) {
    cursor.skip_spaces();
    if (cursor.done()) break;
    const std::size_t start = cursor.pos;
    const std::size_t product_length = cursor.product_sign_length();
    const char c = text[start];
    if (c == '/' || product_length > 0) {
      const std::string_view sign = text.substr(start, c == '/' ? 1 : product_length);
      if (last != Last::factor)
        return failure(join({"empty factor before '", sign, "' in ", whole,
                             last == Last::start ? "" : " (two separators in a row)"}));
      last = c == '/' ? Last::division : Last::product;
      cursor.pos += sign.size();
      continue;
    }
    if (c == '(' || c == ')')
      return failure(join({"parentheses are not supported in ", whole,
                           ": '/' divides by the next factor only, so write e.g. 'erg/s/cm^3' or "
                           "'erg s^-1 cm^-3'"}));
    if (!cursor.in_symbol())
      return failure(join({"malformed power in ", whole, ": a power must follow a unit symbol"}));
    while (cursor.in_symbol())
      ++cursor.pos;
    const std::string_view symbol = text.substr(start, cursor.pos - start);
    const auto unit = find_symbol(symbol);
    if (!unit) return failure(unknown_symbol_message(symbol));
    const auto power = read_power(cursor);
    if (!power) {
      while (!cursor.at_boundary())
        ++cursor.pos;
      const std::string limit = std::to_string(largest_power);
      return failure(join({"malformed power in ", quoted(text.substr(start, cursor.pos - start)),
                           " (a power is a whole number from -", limit, " to ", limit,
                           ", e.g. 'cm^-3' or 'cm\u207b\u00b3')"}));
    }
    const int exponent = last == Last::division ? -*power : *power;
    result.to_cgs *= std::pow(unit->to_cgs, exponent);
    result.dimension = result.dimension * unit->dimension.pow(exponent);
    last = Last::factor;
  }
  if (last == Last::division)
    return failure(join({"trailing '/' in ", whole, ": nothing to divide by"}));
  if (last == Last::product) return failure(join({"empty factor after the last '*' in ", whole}));
  if (!std::isnormal(result.to_cgs))
    return failure(join({"the factor of unit ", whole, " to cgs is outside the range of double"}));
  return {true, result, {}};
}

}  // namespace brume::units
