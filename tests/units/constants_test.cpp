// Every constant in constants.hpp against the published value, typed in from the named source.
#include "solver/units/constants.hpp"

#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

namespace brume::units {
namespace {

// Relative difference |a - b| / |b|.
double relative(double a, double b) {
  return std::abs(a - b) / std::abs(b);
}

// Values typed in with all their published digits and stored unchanged must match to the last bit
// but for the decimal-to-binary rounding, which EXPECT_DOUBLE_EQ (4 ulp) covers.
TEST(Constants, Codata2018ExactValues) {
  EXPECT_DOUBLE_EQ(cgs::speed_of_light, 2.99792458e10);   // CODATA 2018: c = 299792458 m/s
  EXPECT_DOUBLE_EQ(cgs::boltzmann, 1.380649e-16);         // CODATA 2018: 1.380649e-23 J/K
  EXPECT_DOUBLE_EQ(cgs::planck, 6.62607015e-27);          // CODATA 2018: 6.62607015e-34 J s
  EXPECT_DOUBLE_EQ(cgs::electron_volt, 1.602176634e-12);  // CODATA 2018: 1.602176634e-19 J
  EXPECT_DOUBLE_EQ(cgs::avogadro, 6.02214076e23);         // CODATA 2018: 6.02214076e23 /mol
  EXPECT_DOUBLE_EQ(cgs::elementary_charge_coulomb, 1.602176634e-19);  // CODATA 2018
}

TEST(Constants, Codata2018MeasuredValues) {
  EXPECT_DOUBLE_EQ(cgs::gravitational_constant, 6.67430e-8);  // CODATA 2018: 6.67430(15)e-11 SI
  EXPECT_DOUBLE_EQ(cgs::proton_mass, 1.67262192369e-24);      // CODATA 2018: 1.67262192369e-27 kg
  EXPECT_DOUBLE_EQ(cgs::electron_mass, 9.1093837015e-28);     // CODATA 2018: 9.1093837015e-31 kg
  EXPECT_DOUBLE_EQ(cgs::atomic_mass_constant, 1.66053906660e-24);  // CODATA 2018: ...e-27 kg
  EXPECT_DOUBLE_EQ(cgs::thomson_cross_section, 6.6524587321e-25);  // CODATA 2018: ...e-29 m^2
  EXPECT_DOUBLE_EQ(cgs::stefan_boltzmann, 5.670374419e-5);         // CODATA 2018: 5.670374419e-8 SI
}

// Consistency checks that would catch a mistyped digit in the values above.
TEST(Constants, Codata2018Consistency) {
  // σ = 2π^5 k^4 / (15 h^3 c^2) (Stefan–Boltzmann law, textbook); CODATA 2018 prints σ to 10
  // digits, so the exact k, h, c reproduce it to the rounding of the 10th digit: tolerance 1e-9.
  const double pi = std::numbers::pi;
  const double sigma = 2.0 * std::pow(pi, 5) * std::pow(cgs::boltzmann, 4) /
                       (15.0 * std::pow(cgs::planck, 3) * std::pow(cgs::speed_of_light, 2));
  EXPECT_LT(relative(sigma, cgs::stefan_boltzmann), 1e-9);
  // CODATA 2018 proton and electron masses in u: 1.007276466621(53) and 5.48579909065(16)e-4
  // (from memory). Products agree within the quoted uncertainties (3e-10 relative): tolerance 1e-9.
  EXPECT_LT(relative(1.007276466621 * cgs::atomic_mass_constant, cgs::proton_mass), 1e-9);
  EXPECT_LT(relative(5.48579909065e-4 * cgs::atomic_mass_constant, cgs::electron_mass), 1e-9);
  // CODATA 2018 electron volt–kelvin relationship: 1 eV / k = 1.160451812e4 K (exact, printed to
  // 10 digits): tolerance 1e-9.
  EXPECT_LT(relative(cgs::electron_volt / cgs::boltzmann, 1.160451812e4), 1e-9);
  // Elementary charge in esu: 4.80320471e-10 (from memory; = e c / 10), 9 digits: tolerance 1e-8.
  EXPECT_LT(relative(cgs::elementary_charge, 4.80320471e-10), 1e-8);
  // Radiation constant a = 4σ/c = 7.565733e-15 erg cm^-3 K^-4 (from memory), 7 digits: 1e-6.
  EXPECT_LT(relative(cgs::radiation_constant, 7.565733e-15), 1e-6);
  // ħ = 1.054571817e-27 erg s (CODATA 2018, exact, printed to 10 digits): tolerance 1e-9.
  EXPECT_LT(relative(cgs::reduced_planck, 1.054571817e-27), 1e-9);
}

TEST(Constants, HydrogenMass) {
  // 1.00784 u (IUPAC standard atomic weight of hydrogen, lower bound of [1.00784, 1.00811]) times
  // m_u (CODATA 2018) = 1.6735577e-24 g; the product is one rounding: tolerance 1e-15.
  EXPECT_DOUBLE_EQ(cgs::hydrogen_atomic_weight, 1.00784);
  EXPECT_LT(relative(cgs::hydrogen_mass, 1.00784 * 1.66053906660e-24), 1e-15);
  // m_H lies between m_p and m_p + m_e + 0.1% (binding energy is negligible; the standard atomic
  // weight includes deuterium): a physical sanity bound, common practice, no source.
  EXPECT_GT(cgs::hydrogen_mass, cgs::proton_mass + cgs::electron_mass);
  EXPECT_LT(cgs::hydrogen_mass, 1.001 * (cgs::proton_mass + cgs::electron_mass));
}

TEST(Constants, IauLengths) {
  // IAU 2012 Resolution B2: 1 au = 149597870700 m exactly.
  EXPECT_DOUBLE_EQ(cgs::astronomical_unit, 1.495978707e13);
  // IAU 2015 Resolution B2: 1 pc = (648000/π) au = 3.085677581491367e18 cm (16 digits). The
  // derived value carries two roundings (division, product): tolerance 4 ulp (EXPECT_DOUBLE_EQ).
  EXPECT_DOUBLE_EQ(cgs::parsec, 3.085677581491367e18);
  EXPECT_DOUBLE_EQ(cgs::kiloparsec, 3.085677581491367e21);
  EXPECT_DOUBLE_EQ(cgs::megaparsec, 3.085677581491367e24);
  // 1 pc = 206264.806247 au (648000/π, arcseconds per radian; from memory). 12 digits round at
  // 2.4e-12 relative: tolerance 5e-12.
  EXPECT_LT(relative(cgs::parsec / cgs::astronomical_unit, 206264.806247), 5e-12);
  // IAU 2015 Resolution B3: nominal solar radius 6.957e8 m.
  EXPECT_DOUBLE_EQ(cgs::solar_radius, 6.957e10);
}

TEST(Constants, SolarMass) {
  // IAU 2015 Resolution B3: (GM)_sun^N = 1.3271244e20 m^3 s^-2.
  EXPECT_DOUBLE_EQ(cgs::solar_mass_parameter, 1.3271244e26);
  // M_sun = (GM)_sun^N / G(CODATA 2018) = 1.3271244e26 / 6.67430e-8 = 1.98840987e33 g (division
  // done on an independent calculator to 9 digits; IAU 2015 B3 leaves M_sun to the G in use).
  // 9 digits round at 5e-9 relative: tolerance 1e-8.
  EXPECT_LT(relative(cgs::solar_mass, 1.98840987e33), 1e-8);
  // M_sun ≈ 1.989e33 g (from memory), 4 digits: tolerance 5e-4.
  EXPECT_LT(relative(cgs::solar_mass, 1.989e33), 5e-4);
  // IAU 2015 Resolution B3: nominal solar luminosity 3.828e26 W.
  EXPECT_DOUBLE_EQ(cgs::solar_luminosity, 3.828e33);
}

TEST(Constants, Times) {
  // Julian year: 365.25 d × 86400 s = 31557600 s (IAU definition).
  EXPECT_DOUBLE_EQ(cgs::julian_year, 31557600.0);
  EXPECT_DOUBLE_EQ(cgs::kiloyear, 3.15576e10);
  EXPECT_DOUBLE_EQ(cgs::megayear, 3.15576e13);
  EXPECT_DOUBLE_EQ(cgs::gigayear, 3.15576e16);
  EXPECT_DOUBLE_EQ(cgs::minute, 60.0);
  EXPECT_DOUBLE_EQ(cgs::hour, 3600.0);
  EXPECT_DOUBLE_EQ(cgs::day, 86400.0);
}

TEST(Constants, CgsDefinitions) {
  // Definitions of the cgs system: 1 m = 100 cm, 1 kg = 1000 g, 1 J = 1e7 erg, 1 km = 1e5 cm;
  // erg, dyne and gauss are cgs base units (1).
  EXPECT_DOUBLE_EQ(cgs::metre, 1e2);
  EXPECT_DOUBLE_EQ(cgs::kilogram, 1e3);
  EXPECT_DOUBLE_EQ(cgs::joule, 1e7);
  EXPECT_DOUBLE_EQ(cgs::kilometre, 1e5);
  EXPECT_DOUBLE_EQ(cgs::erg, 1.0);
  EXPECT_DOUBLE_EQ(cgs::dyne, 1.0);
  EXPECT_DOUBLE_EQ(cgs::gauss, 1.0);
  EXPECT_DOUBLE_EQ(cgs::microgauss, 1e-6);
  EXPECT_DOUBLE_EQ(cgs::milligauss, 1e-3);
  EXPECT_DOUBLE_EQ(cgs::nanogauss, 1e-9);
  EXPECT_DOUBLE_EQ(cgs::kiloelectron_volt, 1.602176634e-9);
}

}  // namespace
}  // namespace brume::units
