// The table of named units the parser knows. Values come from constants.hpp only.
#include "solver/units/unit_table.hpp"

#include "solver/units/constants.hpp"

namespace brume::units {

const std::vector<NamedUnit>& named_units() {
  using namespace cgs;
  static const std::vector<NamedUnit> table{
      // length
      {"cm", {centimetre, dim::length}, "centimetre (cgs base)"},
      {"m", {metre, dim::length}, "metre"},
      {"km", {kilometre, dim::length}, "kilometre"},
      {"au", {astronomical_unit, dim::length}, "astronomical unit (IAU 2012 B2, exact)"},
      {"pc", {parsec, dim::length}, "parsec, 648000/pi au (IAU 2015 B2)"},
      {"kpc", {kiloparsec, dim::length}, "kiloparsec"},
      {"Mpc", {megaparsec, dim::length}, "megaparsec"},
      {"R_sun", {solar_radius, dim::length}, "nominal solar radius (IAU 2015 B3)"},
      // time
      {"s", {second, dim::time}, "second (cgs base)"},
      {"min", {minute, dim::time}, "minute"},
      {"h", {hour, dim::time}, "hour"},
      {"d", {day, dim::time}, "day of 86400 s"},
      {"yr", {julian_year, dim::time}, "Julian year of 365.25 d"},
      {"kyr", {kiloyear, dim::time}, "thousand Julian years"},
      {"Myr", {megayear, dim::time}, "million Julian years"},
      {"Gyr", {gigayear, dim::time}, "billion Julian years"},
      // mass
      {"g", {gram, dim::mass}, "gram (cgs base)"},
      {"kg", {kilogram, dim::mass}, "kilogram"},
      {"M_sun", {solar_mass, dim::mass}, "solar mass, (GM)_sun (IAU 2015 B3) / G (CODATA 2018)"},
      {"m_H", {hydrogen_mass, dim::mass}, "hydrogen atom mass, 1.00784 u"},
      // temperature
      {"K", {kelvin, dim::temperature}, "kelvin (cgs base)"},
      // magnetic field (Gaussian units)
      {"G", {gauss, dim::magnetic_field}, "gauss (cgs base)"},
      {"mG", {milligauss, dim::magnetic_field}, "milligauss"},
      {"uG", {microgauss, dim::magnetic_field}, "microgauss"},
      {"\u03bcG", {microgauss, dim::magnetic_field}, "microgauss (Greek mu)"},
      {"\u00b5G", {microgauss, dim::magnetic_field}, "microgauss (micro sign)"},
      {"nG", {nanogauss, dim::magnetic_field}, "nanogauss"},
      // energy, power, force
      {"erg", {erg, dim::energy}, "erg (cgs base)"},
      {"J", {joule, dim::energy}, "joule"},
      {"eV", {electron_volt, dim::energy}, "electron volt (CODATA 2018, exact)"},
      {"keV", {kiloelectron_volt, dim::energy}, "kilo-electron volt"},
      {"L_sun", {solar_luminosity, dim::power}, "nominal solar luminosity (IAU 2015 B3)"},
      {"dyn", {dyne, dim::energy / dim::length}, "dyne (cgs base)"},
  };
  return table;
}

}  // namespace brume::units
