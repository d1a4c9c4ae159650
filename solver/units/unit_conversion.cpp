// factor_to and describe: checking a parsed unit against the dimension a quantity needs.
#include <array>
#include <utility>

#include "solver/units/constants.hpp"
#include "solver/units/unit_table.hpp"

namespace brume::units {

namespace {

// P/k_B, the pressure written as a temperature times a number density (K cm^-3).
constexpr Dimension pressure_over_boltzmann = dim::temperature * dim::number_density;

constexpr std::array<std::pair<Dimension, std::string_view>, 27> dimension_names{{
    {dim::none, "dimensionless"},
    {dim::length, "length"},
    {dim::length * dim::length, "area"},
    {dim::length.pow(3), "volume"},
    {dim::time, "time"},
    {dim::time.pow(-1), "rate"},
    {dim::mass, "mass"},
    {dim::temperature, "temperature"},
    {dim::velocity, "velocity"},
    {dim::velocity / dim::time, "acceleration"},
    {dim::number_density, "number density"},
    {dim::length.pow(-2), "column density"},
    {dim::mass_density, "mass density"},
    {dim::mass / dim::length.pow(2), "surface density"},
    {dim::mass / dim::time, "mass rate"},
    {dim::mass * dim::velocity, "momentum"},
    {dim::energy / dim::length, "force"},
    {dim::energy, "energy"},
    {dim::velocity * dim::velocity, "specific energy"},
    {dim::power, "power"},
    {dim::pressure, "pressure"},
    {dim::pressure / dim::time, "volumetric heating or cooling rate"},
    {pressure_over_boltzmann, "pressure over k_B"},
    {dim::magnetic_field, "magnetic field"},
    {dim::cooling_rate, "cooling function"},
    {dim::conductivity, "thermal conductivity"},
    {dim::diffusivity, "diffusivity"},
}};

}  // namespace

std::optional<double> factor_to(const Unit& given, Dimension wanted) {
  if (given.dimension == wanted) return given.to_cgs;
  if (wanted == dim::pressure && given.dimension == pressure_over_boltzmann)
    return given.to_cgs * cgs::boltzmann;
  return std::nullopt;
}

std::string describe(Dimension dimension) {
  for (const auto& [known, name] : dimension_names)
    if (known == dimension) return std::string(name);
  return dimension.to_string();
}

}  // namespace brume::units
