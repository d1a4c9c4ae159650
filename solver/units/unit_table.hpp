// Unit expressions as the field writes them ("pc", "km/s", "cm^-3", "μG", "erg cm^3 s^-1") turned
// into a factor to cgs and a dimension, from a built-in table of named units.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "solver/units/dimension.hpp"

namespace brume::units {

struct Unit {
  double to_cgs = 1.0;  // multiply a value in this unit by to_cgs to get cgs
  Dimension dimension;
};

struct NamedUnit {
  std::string_view symbol;  // as written in input files, e.g. "M_sun"
  Unit unit;
  std::string_view meaning;  // e.g. "solar mass (IAU 2015 nominal)"
};

// Every symbol the parser knows, in a fixed order (used for docs and "did you mean").
[[nodiscard]] const std::vector<NamedUnit>& named_units();

struct UnitParse {
  bool ok = false;
  Unit unit;
  std::string error;  // when !ok: what is wrong, e.g. "unknown unit 'pcc' (did you mean 'pc'?)"
};

// Parse a unit expression: symbols joined by spaces, '*' or '/', each with an optional integer
// power "^-3" (or Unicode superscripts ⁻³, ², ³). "/" divides by the next factor only:
// "erg/s/cm^3" is erg s^-1 cm^-3. "1" or "" is dimensionless.
[[nodiscard]] UnitParse parse_unit(std::string_view text);

struct QuantityParse {
  bool ok = false;
  double number = 0.0;    // the number as written
  bool has_unit = false;  // false for a bare number
  Unit unit;              // parsed unit when has_unit
  std::string error;      // when !ok
};

// Split "20 pc", "1.5e4K", "-3", "2e-26 erg/s" into a number and an optional unit expression.
[[nodiscard]] QuantityParse parse_quantity(std::string_view text);

// Factor that turns a value in unit `given` into cgs of dimension `wanted`, or nothing if the
// dimensions differ. One equivalence is built in: a pressure may be written as P/k_B in K cm^-3.
[[nodiscard]] std::optional<double> factor_to(const Unit& given, Dimension wanted);

// The name of a common dimension in words ("velocity", "number density", "magnetic field", ...),
// or Dimension::to_string() when it has none.
[[nodiscard]] std::string describe(Dimension dimension);

}  // namespace brume::units
