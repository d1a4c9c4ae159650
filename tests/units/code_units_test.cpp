// Code units for L = 1 pc, v = 1 km/s, n = 1 cm^-3, μ = 1.27, and their derived units.
#include "solver/units/code_units.hpp"

#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

#include "solver/units/constants.hpp"

namespace brume::units {
namespace {

constexpr double mu = 1.27;

CodeUnits parsec_kms_units() {
  return code_units_from_number_density(cgs::parsec, cgs::kilometre, 1.0, mu);
}

double relative(double a, double b) {
  return std::abs(a - b) / std::abs(b);
}

TEST(CodeUnits, BaseUnitsFromNumberDensity) {
  const CodeUnits units = parsec_kms_units();
  EXPECT_DOUBLE_EQ(units.length, 3.085677581491367e18);  // IAU 2015 B2 parsec
  EXPECT_DOUBLE_EQ(units.velocity, 1e5);
  // ρ_u = μ m_H n, m_H = 1.00784 u (IUPAC) × m_u (CODATA 2018): one or two roundings, 4 ulp.
  EXPECT_DOUBLE_EQ(units.density, mu * 1.00784 * 1.66053906660e-24);
}

TEST(CodeUnits, TimeIsAboutOneMyr) {
  // t_u = pc / (km/s) = 3.0857e13 s = 0.97779 Myr (derived from the IAU parsec and Julian year in
  // constants.hpp; "1 km/s ≈ 1.0227 pc/Myr" from memory). Recomputed here to 4 ulp, and against
  // the 5-digit figure 0.97779 with tolerance 1e-5 (its rounding).
  const CodeUnits units = parsec_kms_units();
  EXPECT_DOUBLE_EQ(units.time(), 3.085677581491367e18 / 1e5);
  EXPECT_LT(relative(units.time() / cgs::megayear, 0.97779), 1e-5);
  EXPECT_LT(relative(cgs::megayear / units.time(), 1.0227), 1e-4);  // from memory, 5 digits
}

TEST(CodeUnits, MassPressureEnergy) {
  // Dimensional analysis (common practice, no source): M_u = ρ_u L³, P_u = ρ_u v², E_u = P_u L³.
  const CodeUnits units = parsec_kms_units();
  const double rho = units.density;
  const double length = units.length;
  EXPECT_LT(relative(units.mass(), rho * std::pow(length, 3)), 1e-15);
  EXPECT_LT(relative(units.pressure(), rho * 1e10), 1e-15);
  EXPECT_LT(relative(units.energy(), rho * 1e10 * std::pow(length, 3)), 1e-15);
  // M_u ≈ 0.03140 M_sun for 1.27 m_H cm^-3 in 1 pc³ (independent calculator, 4 digits): 2e-4.
  EXPECT_LT(relative(units.mass() / cgs::solar_mass, 0.03140), 2e-4);
}

TEST(CodeUnits, MagneticFieldUnit) {
  // B_u = sqrt(4π ρ_u v_u²) = sqrt(4π · 1.27 m_H · 1 cm^-3) · 1e5 cm/s (the convention of
  // code_units.hpp), recomputed from the formula: tolerance 1e-15.
  const CodeUnits units = parsec_kms_units();
  const double expected = std::sqrt(4.0 * std::numbers::pi * mu * cgs::hydrogen_mass) * 1e5;
  EXPECT_LT(relative(units.magnetic_field(), expected), 1e-15);
  // Cross-check: B_u is the field whose Alfvén speed is v_u. From memory (NRL Plasma Formulary):
  // v_A = 2.18e11 cm/s · (m_i/m_p)^-1/2 · (n_i/cm^-3)^-1/2 · (B/G), so B_u = 1e5 sqrt(1.27)/2.18e11
  // G = 0.517 μG. The formulary's 3 digits round at 2.3e-3 and it uses m_p, not m_H (0.08%):
  // tolerance 3e-3.
  EXPECT_LT(relative(units.magnetic_field(), 1e5 * std::sqrt(mu) / 2.18e11), 3e-3);
}

TEST(CodeUnits, TemperatureUnit) {
  // T_u = μ m_H v_u² / k_B = 1.27 · 1.6735577e-24 g · 1e10 cm²/s² / 1.380649e-16 erg/K = 153.94 K
  // (independent calculator, 5 digits): tolerance 1e-4.
  const CodeUnits units = parsec_kms_units();
  EXPECT_LT(relative(units.temperature(mu), 153.94), 1e-4);
  EXPECT_LT(relative(units.temperature(mu), mu * cgs::hydrogen_mass * 1e10 / cgs::boltzmann),
            1e-15);
  // Cross-check, from memory: the isothermal sound speed of molecular gas (μ = 2.33) at 10 K is
  // 0.19 km/s. c_s = v_u sqrt(T / T_u(μ)); 2 digits round at 2.7%: tolerance 3e-2.
  const double sound_speed = units.velocity * std::sqrt(10.0 / units.temperature(2.33));
  EXPECT_LT(relative(sound_speed, 0.19e5), 3e-2);
}

TEST(CodeUnits, DefaultsAreCgs) {
  // All-ones base units make every derived unit one except B_u = sqrt(4π) (Gaussian units).
  const CodeUnits units;
  EXPECT_DOUBLE_EQ(units.time(), 1.0);
  EXPECT_DOUBLE_EQ(units.mass(), 1.0);
  EXPECT_DOUBLE_EQ(units.pressure(), 1.0);
  EXPECT_DOUBLE_EQ(units.energy(), 1.0);
  EXPECT_DOUBLE_EQ(units.magnetic_field(), std::sqrt(4.0 * std::numbers::pi));
}

}  // namespace
}  // namespace brume::units
