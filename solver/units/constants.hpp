// Physical and astronomical constants in cgs (cm, g, s, K; Gaussian electromagnetic units).
// Each value names its source. "Exact" means exact by definition of the SI since 2019 (CODATA 2018)
// or by IAU resolution; derived values are computed here from the listed ones, never retyped.
#pragma once

#include <numbers>

namespace brume::units::cgs {

// --- cgs base units: the code works in them, so they are 1 -------------------------------------
inline constexpr double centimetre = 1.0;
inline constexpr double gram = 1.0;
inline constexpr double second = 1.0;
inline constexpr double kelvin = 1.0;
inline constexpr double erg = 1.0;    // g cm^2 s^-2
inline constexpr double dyne = 1.0;   // g cm s^-2
inline constexpr double gauss = 1.0;  // g^1/2 cm^-1/2 s^-1 (Gaussian units)

// --- SI units expressed in cgs (definitions of the cgs system) ----------------------------------
inline constexpr double metre = 1.0e2;     // cm
inline constexpr double kilogram = 1.0e3;  // g
inline constexpr double joule = 1.0e7;     // erg

// --- CODATA 2018 recommended values (Tiesinga et al. 2021, Rev. Mod. Phys. 93, 025010) ---------
// Speed of light in vacuum, c = 299792458 m s^-1 (exact).
inline constexpr double speed_of_light = 2.99792458e10;  // cm s^-1
// Newtonian constant of gravitation, G = 6.67430(15)e-11 m^3 kg^-1 s^-2 (relative unc. 2.2e-5).
inline constexpr double gravitational_constant = 6.67430e-8;  // cm^3 g^-1 s^-2
// Boltzmann constant, k = 1.380649e-23 J K^-1 (exact).
inline constexpr double boltzmann = 1.380649e-16;  // erg K^-1
// Planck constant, h = 6.62607015e-34 J s (exact).
inline constexpr double planck = 6.62607015e-27;  // erg s
// Reduced Planck constant, derived: h / (2π).
inline constexpr double reduced_planck = planck / (2.0 * std::numbers::pi);  // erg s
// Elementary charge, e = 1.602176634e-19 C (exact).
inline constexpr double elementary_charge_coulomb = 1.602176634e-19;  // C
// Elementary charge in esu, derived: 1 C = (c / 10 in cm s^-1) statcoulomb = 2997924580 esu.
inline constexpr double elementary_charge = elementary_charge_coulomb * speed_of_light / 10.0;
// Electron volt, 1 eV = 1.602176634e-19 J (exact).
inline constexpr double electron_volt = 1.602176634e-12;  // erg
// Proton mass, m_p = 1.67262192369(51)e-27 kg.
inline constexpr double proton_mass = 1.67262192369e-24;  // g
// Electron mass, m_e = 9.1093837015(28)e-31 kg.
inline constexpr double electron_mass = 9.1093837015e-28;  // g
// Atomic mass constant, m_u = 1.66053906660(50)e-27 kg.
inline constexpr double atomic_mass_constant = 1.66053906660e-24;  // g
// Avogadro constant, N_A = 6.02214076e23 mol^-1 (exact).
inline constexpr double avogadro = 6.02214076e23;  // mol^-1
// Stefan–Boltzmann constant, σ = 5.670374419e-8 W m^-2 K^-4 (exact: from c, h, k).
inline constexpr double stefan_boltzmann = 5.670374419e-5;  // erg cm^-2 s^-1 K^-4
// Radiation density constant, derived: a = 4σ / c.
inline constexpr double radiation_constant =
    4.0 * stefan_boltzmann / speed_of_light;  // erg cm^-3 K^-4
// Thomson cross section, σ_T = 6.6524587321(60)e-29 m^2.
inline constexpr double thomson_cross_section = 6.6524587321e-25;  // cm^2

// --- Hydrogen -----------------------------------------------------------------------------------
// Mass of a hydrogen atom as the standard atomic weight of hydrogen, 1.00784 u: the lower bound of
// the IUPAC (CIAAW 2009) interval [1.00784, 1.00811] (from memory; the abridged "conventional"
// value is 1.008). Times m_u of CODATA 2018.
inline constexpr double hydrogen_atomic_weight = 1.00784;                               // u
inline constexpr double hydrogen_mass = hydrogen_atomic_weight * atomic_mass_constant;  // g

// --- IAU nominal and defined astronomical units -------------------------------------------------
// Astronomical unit: exactly 149597870700 m (IAU 2012 Resolution B2; the au on which IAU 2015
// Resolution B2 builds the parsec).
inline constexpr double astronomical_unit = 1.495978707e13;  // cm
// Parsec: exactly (648000/π) au (IAU 2015 Resolution B2).
inline constexpr double parsec = 648000.0 / std::numbers::pi * astronomical_unit;  // cm
inline constexpr double kiloparsec = 1.0e3 * parsec;                               // cm
inline constexpr double megaparsec = 1.0e6 * parsec;                               // cm
inline constexpr double kilometre = 1.0e5;                                         // cm

// Nominal solar mass parameter (GM)_sun^N = 1.3271244e20 m^3 s^-2 (IAU 2015 Resolution B3).
inline constexpr double solar_mass_parameter = 1.3271244e26;  // cm^3 s^-2
// Solar mass, derived: (GM)_sun^N / G with G of CODATA 2018 (so it carries G's 2.2e-5 uncertainty).
inline constexpr double solar_mass = solar_mass_parameter / gravitational_constant;  // g
// Nominal solar radius R_sun^N = 6.957e8 m (IAU 2015 Resolution B3).
inline constexpr double solar_radius = 6.957e10;  // cm
// Nominal solar luminosity L_sun^N = 3.828e26 W (IAU 2015 Resolution B3).
inline constexpr double solar_luminosity = 3.828e33;  // erg s^-1

// --- Time ---------------------------------------------------------------------------------------
inline constexpr double minute = 60.0;  // s
inline constexpr double hour = 3600.0;  // s
inline constexpr double day = 86400.0;  // s (SI day of 86400 s)
// Julian year: 365.25 d of 86400 s (IAU: the year of Julian epochs, a Julian century being
// 36525 d; from memory).
inline constexpr double julian_year = 365.25 * day;  // s
inline constexpr double kiloyear = 1.0e3 * julian_year;
inline constexpr double megayear = 1.0e6 * julian_year;
inline constexpr double gigayear = 1.0e9 * julian_year;

// --- Derived energies and magnetic fields ------------------------------------------------------
inline constexpr double kiloelectron_volt = 1.0e3 * electron_volt;  // erg
inline constexpr double milligauss = 1.0e-3 * gauss;
inline constexpr double microgauss = 1.0e-6 * gauss;
inline constexpr double nanogauss = 1.0e-9 * gauss;

}  // namespace brume::units::cgs
