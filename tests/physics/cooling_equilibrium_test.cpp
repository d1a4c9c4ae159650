// Thermal-equilibrium tools against scipy.optimize.brentq and against their definitions.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <sstream>
#include <string>
#include <vector>

#include "physics/cooling_equilibrium.hpp"
#include "solver/units/constants.hpp"
#include "tests/support/run_python.hpp"

namespace brume::physics {
namespace {

const NetCooling ki{KoyamaInutsukaFit{}, KoyamaInutsukaFit::reference_heating};

TEST(CoolingEquilibrium, TemperatureMatchesBrentq) {
  const std::vector<double> densities = {1e-2, 0.1, 0.5, 1.0, 2.0, 5.0, 10.0, 100.0, 1e4};
  std::vector<std::string> arguments = {"equilibrium", "2e-26"};
  for (const double n : densities)
    arguments.push_back(std::to_string(n));
  const brume::testing::PythonResult reference = brume::testing::run_python(
      brume::testing::source_script("tests/physics/cooling_reference.py"), arguments);
  ASSERT_EQ(reference.exit_code, 0) << reference.output;
  std::istringstream lines(reference.output);
  for (const double n : densities) {
    double expected = 0.0;
    ASSERT_TRUE(lines >> expected);
    const double t = equilibrium_temperature(ki, n);
    std::printf("[T_eq] n %g: brume %.12g K, brentq %.12g K\n", n, t, expected);
    // Both bisect to ~1e-15; 1e-10 leaves room for the different iterations.
    EXPECT_NEAR(t / expected, 1.0, 1e-10) << "n " << n;
  }
}

TEST(CoolingEquilibrium, UnstableRangeIsWhereTheIsobaricSlopeIsNegative) {
  const UnstableRange r = unstable_range(ki);
  ASSERT_TRUE(r.found);
  std::printf("[unstable range] n %.6g..%.6g cm^-3, T %.6g..%.6g K, P/k_B %.6g..%.6g K cm^-3\n",
              r.n_low, r.n_high, r.t_low, r.t_high, r.p_min / units::cgs::boltzmann,
              r.p_max / units::cgs::boltzmann);
  // Inside: unstable; 1 % outside either end: stable (definition, Field 1965 criterion).
  for (const double f : {1.01, 2.0, 0.99 * r.n_high / r.n_low}) {
    const double n = r.n_low * f;
    EXPECT_LT(isobaric_slope(ki, n, equilibrium_temperature(ki, n)), 0.0) << n;
  }
  for (const double n : {0.99 * r.n_low, 1.01 * r.n_high}) {
    EXPECT_GT(isobaric_slope(ki, n, equilibrium_temperature(ki, n)), 0.0) << n;
  }
  // The unstable branch is where P_eq falls with n: P_max at n_low, P_min at n_high, and every
  // P_eq in between lies within [P_min, P_max] (common practice, no source).
  for (int i = 1; i < 20; ++i) {
    const double n = r.n_low * std::pow(r.n_high / r.n_low, i / 20.0);
    const double p = equilibrium_pressure(ki, n);
    EXPECT_GT(p, r.p_min);
    EXPECT_LT(p, r.p_max);
  }
  // The KI fit's two-phase range is roughly P/k_B ~ 1e3-1e4 K cm^-3 (from memory, e.g. Koyama &
  // Inutsuka 2002, Fig. 1); a loose order-of-magnitude check of the whole chain.
  EXPECT_GT(r.p_min / units::cgs::boltzmann, 500.0);
  EXPECT_LT(r.p_max / units::cgs::boltzmann, 2e4);
}

TEST(CoolingEquilibrium, DensityAtPressureInvertsTheCurve) {
  const UnstableRange r = unstable_range(ki);
  const double p = std::sqrt(r.p_min * r.p_max);
  const double n = unstable_density_at_pressure(ki, r, p);
  EXPECT_NEAR(equilibrium_pressure(ki, n) / p, 1.0, 1e-10);
  EXPECT_TRUE(std::isnan(unstable_density_at_pressure(ki, r, 2.0 * r.p_max)));
}

TEST(CoolingEquilibrium, FieldLengthsScaleAsTheSquareRootOfTheConductivity) {
  const double n = 2.0;
  const double t = equilibrium_temperature(ki, n);
  const double a = field_critical_wavelength(ki, n, t, 1e5);
  const double b = field_critical_wavelength(ki, n, t, 4e5);
  EXPECT_NEAR(b / a, 2.0, 1e-12);  // λ ∝ √κ by definition
  EXPECT_NEAR(field_length(ki, n, t, 4e5) / field_length(ki, n, t, 1e5), 2.0, 1e-12);
  EXPECT_TRUE(std::isnan(field_critical_wavelength(ki, 0.1, equilibrium_temperature(ki, 0.1),
                                                   1e5)));  // stable: no critical length
}

}  // namespace
}  // namespace brume::physics
