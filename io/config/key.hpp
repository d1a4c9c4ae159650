// The specification of one configuration key: its kind, count, unit, default, range, choices and
// description. Keys are built with the *_key() functions and refined with the chained modifiers:
//   quantity_key("size", units::dim::length, "pc", "Edge lengths").three().with_default("1 pc")
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "solver/units/dimension.hpp"

namespace brume::config {

enum class Kind { integer, real, boolean, text, choice, quantity };

// A key holds one value, or exactly three (x, y, z); a single value given for three is broadcast.
enum class Count { scalar, three };

struct Bound {
  double value = 0.0;
  bool inclusive = true;
};

// Allowed interval, in the key's unit. Missing ends are unbounded.
struct Range {
  std::optional<Bound> lower;
  std::optional<Bound> upper;
};

struct Choice {
  std::string name;
  std::string description;
};

struct Key {
  std::string name;
  Kind kind = Kind::real;
  Count count = Count::scalar;
  units::Dimension dimension;           // quantities only
  std::string unit;                     // quantities only: unit of bare numbers and of display
  std::optional<std::string> fallback;  // default as YAML text; none means required
  Range range;
  std::vector<Choice> choices;  // choice keys only
  std::string description;

  Key& three();
  Key& with_default(std::string yaml_text);
  Key& above(double value);     // > value
  Key& at_least(double value);  // >= value
  Key& below(double value);     // < value
  Key& at_most(double value);   // <= value

  [[nodiscard]] bool required() const { return !fallback.has_value(); }
};

[[nodiscard]] Key integer_key(std::string name, std::string description);
[[nodiscard]] Key real_key(std::string name, std::string description);
[[nodiscard]] Key flag_key(std::string name, std::string description);
[[nodiscard]] Key text_key(std::string name, std::string description);
[[nodiscard]] Key choice_key(std::string name, std::vector<Choice> choices,
                             std::string description);
[[nodiscard]] Key quantity_key(std::string name, units::Dimension dimension, std::string unit,
                               std::string description);

// "a length", "a velocity", "a dimensionless number", ... with its article.
[[nodiscard]] std::string dimension_phrase(units::Dimension dimension);

// What a single value of the key must be, e.g. "an integer", "true or false",
// "one of donor, plm, ppm", "a length such as pc".
[[nodiscard]] std::string expectation(const Key& key);

// The range in words with the unit, e.g. "> 0 pc", "within (1, 3]"; empty when unbounded.
[[nodiscard]] std::string range_text(const Key& key);

// Short type name for documentation: "integer", "real", "boolean", "text", "choice", or the
// dimension of a quantity ("length"); "×3" is appended for three-valued keys.
[[nodiscard]] std::string type_name(const Key& key);

}  // namespace brume::config
