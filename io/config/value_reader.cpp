#include "io/config/value_reader.hpp"

#include <cmath>
#include <stdexcept>
#include <variant>

#include "io/config/number_text.hpp"
#include "solver/units/nearest_spelling.hpp"
#include "solver/units/unit_table.hpp"

namespace brume::config {

namespace {

// A single value before it is placed into a Value: one of long long, double, bool, string.
using Single = std::variant<long long, double, bool, std::string>;

struct SingleResult {
  std::optional<Single> value;
  std::string detail;  // on failure
};

SingleResult fail(std::string detail) {
  return {std::nullopt, std::move(detail)};
}

// How the text is quoted back in a message: numbers bare, anything else in single quotes.
std::string shown(const std::string& text) {
  if (parse_number(text)) return text;
  return "'" + text + "'";
}

std::string trimmed(std::string_view text) {
  const auto first = text.find_first_not_of(" \t");
  if (first == std::string_view::npos) return "";
  const auto last = text.find_last_not_of(" \t");
  return std::string(text.substr(first, last - first + 1));
}

bool in_range(const Range& range, double value) {
  if (range.lower) {
    if (range.lower->inclusive ? value < range.lower->value : value <= range.lower->value) {
      return false;
    }
  }
  if (range.upper) {
    if (range.upper->inclusive ? value > range.upper->value : value >= range.upper->value) {
      return false;
    }
  }
  return true;
}

// A dimensionless number written with a unit: report it as such if the text parses that way.
bool has_unit_suffix(const std::string& text) {
  if (number_prefix_length(text) == 0) return false;
  const units::QuantityParse parse = units::parse_quantity(text);
  return parse.ok && parse.has_unit;
}

SingleResult read_integer(const Key& key, const std::string& text) {
  if (const auto value = parse_integer(text)) return {Single{*value}, ""};
  if (parse_number(text) || non_finite(text)) {
    return fail("found " + shown(text) + ", expected " + expectation(key) + " (a whole number)");
  }
  if (has_unit_suffix(text)) {
    return fail("found " + shown(text) + ", expected " + expectation(key) + " without a unit");
  }
  return fail("found " + shown(text) + ", expected " + expectation(key));
}

SingleResult read_real(const Key& key, const std::string& text) {
  if (non_finite(text)) return fail("found " + shown(text) + ", expected a finite number");
  if (const auto value = parse_number(text)) return {Single{*value}, ""};
  if (has_unit_suffix(text)) {
    return fail("found " + shown(text) + ", expected a plain number: " + key.name +
                " is dimensionless and takes no unit");
  }
  return fail("found " + shown(text) + ", expected " + expectation(key));
}

SingleResult read_quantity(const Key& key, const std::string& text) {
  if (non_finite(text)) return fail("found " + shown(text) + ", expected a finite number");
  if (const auto bare = parse_number(text)) return {Single{*bare}, ""};  // in the key's unit
  const std::size_t number_length = number_prefix_length(text);
  if (number_length == 0) return fail("found " + shown(text) + ", expected " + expectation(key));
  const units::QuantityParse parse = units::parse_quantity(text);
  if (!parse.ok) return fail("in " + shown(text) + ": " + parse.error);
  if (!std::isfinite(parse.number)) {
    return fail("found " + shown(text) + ", expected a finite number");
  }
  if (!parse.has_unit) return {Single{parse.number}, ""};
  const auto given = units::factor_to(parse.unit, key.dimension);
  if (!given) {
    const std::string written = trimmed(std::string_view(text).substr(number_length));
    return fail("found " + dimension_phrase(parse.unit.dimension) + " (" + written +
                "), expected " + expectation(key));
  }
  const double own = unit_factor(key);
  // Same factor: keep the number exactly as written so that values round-trip bit for bit.
  const double value = *given == own ? parse.number : parse.number * (*given / own);
  if (!std::isfinite(value)) return fail("found " + shown(text) + ", expected a finite number");
  return {Single{value}, ""};
}

SingleResult read_choice(const Key& key, const std::string& text) {
  std::vector<std::string> names;
  for (const Choice& choice : key.choices) {
    if (choice.name == text) return {Single{text}, ""};
    names.push_back(choice.name);
  }
  std::string detail = "found " + shown(text) + ", expected " + expectation(key);
  if (const auto guess = units::nearest_name(text, names))
    detail += " (did you mean '" + *guess + "'?)";
  return fail(detail);
}

SingleResult read_single(const Key& key, const std::string& text) {
  switch (key.kind) {
    case Kind::integer:
      return read_integer(key, text);
    case Kind::real:
      return read_real(key, text);
    case Kind::quantity:
      return read_quantity(key, text);
    case Kind::boolean:
      if (text == "true") return {Single{true}, ""};
      if (text == "false") return {Single{false}, ""};
      return fail("found " + shown(text) + ", expected true or false");
    case Kind::text:
      return {Single{text}, ""};
    case Kind::choice:
      return read_choice(key, text);
  }
  return fail("unsupported kind");
}

// Range check of a number read for key; empty string when inside.
std::string range_problem(const Key& key, const std::string& text, double value) {
  if (in_range(key.range, value)) return "";
  std::string found = text;
  if (key.kind == Kind::quantity) {
    const std::string in_unit = format_number(value) + " " + key.unit;
    if (parse_number(text)) {
      found = in_unit;
    } else if (trimmed(text) != in_unit) {
      found += " = " + in_unit;
    }
  }
  return "found " + found + ", expected a value " + range_text(key);
}

double as_double(const Single& single) {
  if (const auto* integer = std::get_if<long long>(&single)) return static_cast<double>(*integer);
  return std::get<double>(single);
}

bool is_numeric(Kind kind) {
  return kind == Kind::integer || kind == Kind::real || kind == Kind::quantity;
}

// Read and range-check one scalar node.
SingleResult read_scalar(const Key& key, const YAML::Node& node) {
  const std::string text = node.Scalar();
  SingleResult result = read_single(key, text);
  if (result.value && is_numeric(key.kind)) {
    const std::string problem = range_problem(key, text, as_double(*result.value));
    if (!problem.empty()) return fail(problem);
  }
  return result;
}

std::string node_kind_phrase(const YAML::Node& node) {
  if (node.IsSequence()) return "a list of " + std::to_string(node.size()) + " values";
  if (node.IsMap()) return "a mapping";
  return "nothing (an empty value)";
}

Value to_value(const Key& key, const std::array<Single, 3>& singles) {
  if (key.count == Count::scalar) {
    return std::visit([](const auto& v) -> Value { return v; }, singles[0]);
  }
  if (key.kind == Kind::integer) {
    return std::array<long long, 3>{std::get<long long>(singles[0]),
                                    std::get<long long>(singles[1]),
                                    std::get<long long>(singles[2])};
  }
  if (key.kind == Kind::real || key.kind == Kind::quantity) {
    return std::array<double, 3>{std::get<double>(singles[0]), std::get<double>(singles[1]),
                                 std::get<double>(singles[2])};
  }
  throw std::logic_error("configuration key '" + key.name +
                         "': only integer, real and quantity keys may hold three values");
}

}  // namespace

double unit_factor(const Key& key) {
  if (key.kind != Kind::quantity) return 1.0;
  const units::UnitParse parse = units::parse_unit(key.unit);
  if (!parse.ok) {
    throw std::logic_error("configuration key '" + key.name + "': bad unit: " + parse.error);
  }
  const auto factor = units::factor_to(parse.unit, key.dimension);
  if (!factor) {
    throw std::logic_error("configuration key '" + key.name + "': unit '" + key.unit + "' is not " +
                           dimension_phrase(key.dimension));
  }
  return *factor;
}

ReadResult read_value(const Key& key, const YAML::Node& node, const YAML::Mark& key_mark) {
  const std::string wanted_count =
      key.count == Count::three ? "3 values [x, y, z] or one value for all three" : "";
  if (!node.IsScalar() && !node.IsSequence()) {
    const std::string wanted = key.count == Count::three ? wanted_count : expectation(key);
    return {std::nullopt,
            {key_mark, "", "found " + node_kind_phrase(node) + ", expected " + wanted}};
  }
  std::array<Single, 3> singles;
  if (node.IsScalar()) {
    SingleResult single = read_scalar(key, node);
    if (!single.value) return {std::nullopt, {node.Mark(), "", single.detail}};
    singles.fill(*single.value);
    return {to_value(key, singles), {}};
  }
  if (key.count == Count::scalar) {
    return {std::nullopt,
            {node.Mark(), "",
             "found " + node_kind_phrase(node) + ", expected a single value: " + expectation(key)}};
  }
  if (node.size() != 3) {
    return {std::nullopt,
            {node.Mark(), "", "found " + node_kind_phrase(node) + ", expected " + wanted_count}};
  }
  for (std::size_t i = 0; i < 3; ++i) {
    const YAML::Node element = node[i];
    const std::string suffix = std::string("[").append(std::to_string(i)).append("]");
    if (!element.IsScalar()) {
      return {std::nullopt,
              {element.IsNull() ? node.Mark() : element.Mark(), suffix,
               "found " + node_kind_phrase(element) + ", expected " + expectation(key)}};
    }
    SingleResult single = read_scalar(key, element);
    if (!single.value) return {std::nullopt, {element.Mark(), suffix, single.detail}};
    singles[i] = *single.value;
  }
  return {to_value(key, singles), {}};
}

}  // namespace brume::config
