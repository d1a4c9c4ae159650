#include "io/config/key.hpp"

#include <utility>

#include "io/config/number_text.hpp"
#include "solver/units/unit_table.hpp"

namespace brume::config {

Key& Key::three() {
  count = Count::three;
  return *this;
}

Key& Key::with_default(std::string yaml_text) {
  fallback = std::move(yaml_text);
  return *this;
}

Key& Key::above(double value) {
  range.lower = Bound{value, false};
  return *this;
}

Key& Key::at_least(double value) {
  range.lower = Bound{value, true};
  return *this;
}

Key& Key::below(double value) {
  range.upper = Bound{value, false};
  return *this;
}

Key& Key::at_most(double value) {
  range.upper = Bound{value, true};
  return *this;
}

namespace {

Key make_key(std::string name, Kind kind, std::string description) {
  Key key;
  key.name = std::move(name);
  key.kind = kind;
  key.description = std::move(description);
  return key;
}

bool starts_with_article(const std::string& text) {
  return text.starts_with("a ") || text.starts_with("an ");
}

bool starts_with_vowel(const std::string& text) {
  return !text.empty() && std::string_view("aeiou").find(text.front()) != std::string_view::npos;
}

}  // namespace

Key integer_key(std::string name, std::string description) {
  return make_key(std::move(name), Kind::integer, std::move(description));
}

Key real_key(std::string name, std::string description) {
  return make_key(std::move(name), Kind::real, std::move(description));
}

Key flag_key(std::string name, std::string description) {
  return make_key(std::move(name), Kind::boolean, std::move(description));
}

Key text_key(std::string name, std::string description) {
  return make_key(std::move(name), Kind::text, std::move(description));
}

Key choice_key(std::string name, std::vector<Choice> choices, std::string description) {
  Key key = make_key(std::move(name), Kind::choice, std::move(description));
  key.choices = std::move(choices);
  return key;
}

Key quantity_key(std::string name, units::Dimension dimension, std::string unit,
                 std::string description) {
  Key key = make_key(std::move(name), Kind::quantity, std::move(description));
  key.dimension = dimension;
  key.unit = std::move(unit);
  return key;
}

std::string dimension_phrase(units::Dimension dimension) {
  if (dimension.dimensionless()) return "a plain number";
  std::string words = units::describe(dimension);
  if (words == dimension.to_string()) return "a quantity in " + words;
  if (starts_with_article(words)) return words;
  return (starts_with_vowel(words) ? "an " : "a ") + words;
}

std::string expectation(const Key& key) {
  switch (key.kind) {
    case Kind::integer:
      return "an integer";
    case Kind::real:
      return "a number";
    case Kind::boolean:
      return "true or false";
    case Kind::text:
      return "a text";
    case Kind::choice: {
      std::string list;
      for (const Choice& choice : key.choices) {
        if (!list.empty()) list += ", ";
        list += choice.name;
      }
      return "one of " + list;
    }
    case Kind::quantity:
      return dimension_phrase(key.dimension) + " such as " + key.unit;
  }
  return "a value";
}

std::string range_text(const Key& key) {
  const Range& range = key.range;
  const std::string unit = key.kind == Kind::quantity ? " " + key.unit : "";
  if (range.lower && range.upper) {
    return "within " + std::string(range.lower->inclusive ? "[" : "(") +
           format_number(range.lower->value) + ", " + format_number(range.upper->value) +
           (range.upper->inclusive ? "]" : ")") + unit;
  }
  if (range.lower) {
    return (range.lower->inclusive ? ">= " : "> ") + format_number(range.lower->value) + unit;
  }
  if (range.upper) {
    return (range.upper->inclusive ? "<= " : "< ") + format_number(range.upper->value) + unit;
  }
  return "";
}

std::string type_name(const Key& key) {
  std::string name;
  switch (key.kind) {
    case Kind::integer:
      name = "integer";
      break;
    case Kind::real:
      name = "real";
      break;
    case Kind::boolean:
      name = "boolean";
      break;
    case Kind::text:
      name = "text";
      break;
    case Kind::choice:
      name = "choice";
      break;
    case Kind::quantity: {
      name = dimension_phrase(key.dimension);
      name.erase(0, name.find(' ') + 1);  // drop the article
      break;
    }
  }
  return key.count == Count::three ? name + " ×3" : name;
}

}  // namespace brume::config
