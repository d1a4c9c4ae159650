// The Jeans diagnostic on synthetic blocks (cells set to chosen values so that the fractions are
// known exactly), its lengths against the Jeans length computed in cgs from the CODATA 2018 G,
// and the multi-free-fall integral against scipy.integrate.quad (distributions_reference.py).
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>
#include <sstream>
#include <string>
#include <vector>

#include "physics/jeans_diagnostic.hpp"
#include "physics/jeans_star_formation.hpp"
#include "solver/units/constants.hpp"
#include "tests/physics/distributions_test_support.hpp"
#include "tests/physics/measurement_lookup.hpp"
#include "tests/support/run_python.hpp"

namespace brume::physics {
namespace {

using testing::CellValues;
using testing::number_named;
namespace cgs = units::cgs;

bool any_warning(const io::Measurement& m, const std::string& text) {
  for (const std::string& w : m.warnings) {
    if (w.find(text) != std::string::npos) return true;
  }
  return false;
}

// 8 × 4 × 4 cells of 1 pc; x < 4 dense (1e4 m_H cm^-3), the rest 1 m_H cm^-3; c_s = 1 km/s
// (one code velocity) everywhere; `b` code field along x, `vy` code velocity along y.
io::Measurement two_densities(const JeansSettings& s, double b, double vy) {
  const RunContext c = testing::synthetic_context({8, 4, 4}, true);
  const CellQuantities q =
      testing::synthetic_cells({8, 4, 4}, {0, 0, 0}, {8, 4, 4}, [&](long i, long, long) {
        CellValues v;
        v.density = i < 4 ? 1e4 : 1.0;
        v.pressure = v.density;                          // c_s² = p/ρ = 1
        v.field = {b * std::sqrt(v.density), 0.0, 0.0};  // v_A = b
        v.velocity = {0.0, i % 2 == 0 ? vy : -vy, 0.0};
        return v;
      });
  return JeansDiagnostic(s).measure(q, c);
}

// λ_J = sqrt(π c_s² / (G ρ)) (Jeans 1902; Truelove et al. 1997, ApJ 489, L179, eq. 1; from
// memory) in cgs: c_s = 1e5 cm/s, ρ = 1e4 m_H cm^-3, G of CODATA 2018.
double jeans_length_pc(double sound_speed_cm_s, double number_density) {
  const double rho = number_density * cgs::hydrogen_mass;
  return std::sqrt(std::numbers::pi * sound_speed_cm_s * sound_speed_cm_s /
                   (cgs::gravitational_constant * rho)) /
         cgs::parsec;
}

TEST(Jeans, FractionsBelowFourCellsAreExact) {
  const io::Measurement m = two_densities(JeansSettings{}, 0.0, 0.0);
  // λ_J(1e4) ≈ 1.7 pc < 4 pc; λ_J(1) ≈ 172 pc: half the volume, the dense half's mass.
  EXPECT_EQ(number_named(m, "volume_fraction_below_truelove"), 0.5);
  EXPECT_NEAR(number_named(m, "mass_fraction_below_truelove"), 1e4 / (1e4 + 1.0), 1e-15);
  EXPECT_EQ(number_named(m, "volume_fraction_below_length"), 0.5);
  EXPECT_EQ(number_named(m, "resolution_length"), 4.0);
  // Code units chain (G ρ_u t_u²) against the cgs formula: a few roundings, 1e-14.
  EXPECT_NEAR(number_named(m, "smallest_jeans_length") / jeans_length_pc(1e5, 1e4), 1.0, 1e-14);
  EXPECT_TRUE(any_warning(m, "UNDER-RESOLVED: 100 % of the mass"));
  EXPECT_TRUE(any_warning(m, "no self-gravity"));
}

TEST(Jeans, PhysicalLengthReplacesCells) {
  JeansSettings s;
  s.length = 100.0 * cgs::parsec;  // between the two Jeans lengths (1.7 pc, 172 pc)
  io::Measurement m = two_densities(s, 0.0, 0.0);
  EXPECT_EQ(number_named(m, "volume_fraction_below_length"), 0.5);
  EXPECT_NEAR(number_named(m, "resolution_length"), 100.0, 1e-12);
  s.length = 200.0 * cgs::parsec;
  m = two_densities(s, 0.0, 0.0);
  EXPECT_EQ(number_named(m, "volume_fraction_below_length"), 1.0);
  EXPECT_EQ(number_named(m, "mass_fraction_below_length"), 1.0);
  // The 4-cell fraction is reported whatever the chosen length.
  EXPECT_EQ(number_named(m, "volume_fraction_below_truelove"), 0.5);
}

// v_A² = 3 c_s²: the magnetosonic speed is 2 c_s, so the Jeans length doubles (definition).
TEST(Jeans, MagneticSupportUsesTheMagnetosonicSpeed) {
  JeansSettings s;
  const double thermal =
      number_named(two_densities(s, std::sqrt(3.0), 0.0), "smallest_jeans_length");
  s.magnetic_support = true;
  const io::Measurement m = two_densities(s, std::sqrt(3.0), 0.0);
  EXPECT_NEAR(number_named(m, "smallest_jeans_length") / thermal, 2.0, 1e-14);
  // 2 × 1.7 pc is still below 4 pc: the dense half stays under-resolved.
  EXPECT_EQ(number_named(m, "volume_fraction_below_truelove"), 0.5);
}

TEST(Jeans, StaticBoxHasNoCriticalDensity) {
  const io::Measurement m = two_densities(JeansSettings{}, 0.0, 0.0);
  EXPECT_TRUE(std::isnan(number_named(m, "star_formation_rate_per_free_fall")));
  EXPECT_TRUE(any_warning(m, "critical density is undefined"));
}

TEST(Jeans, MovingBoxHasMachNumberAndRate) {
  // v_y = ±3 c_s: σ_v = 3 (zero mean momentum), c̄_s = 1, M = 3 (definitions in docs/jeans.md).
  JeansSettings s;
  io::Measurement m = two_densities(s, 0.0, 3.0);
  EXPECT_NEAR(number_named(m, "mach_number"), 3.0, 1e-14);
  // With the default φ_x, s_crit ≈ 3.2 lies above the dense half's s = ln(2e4/10001) ≈ 0.69.
  EXPECT_GT(number_named(m, "critical_log_density"), 0.7);
  EXPECT_EQ(number_named(m, "star_formation_rate_per_free_fall"), 0.0);
  EXPECT_TRUE(any_warning(m, "no gas above the critical density"));
  // φ_x = 0.1 moves s_crit by 2 ln(0.1/1.12) ≈ −4.8, below the dense half but above the rest
  // (s ≈ −8.5): half the volume above, and the rate of the bin holding s = 0.69.
  s.critical_density_factor = 0.1;
  m = two_densities(s, 0.0, 3.0);
  EXPECT_EQ(number_named(m, "volume_fraction_above_critical"), 0.5);
  EXPECT_GT(number_named(m, "star_formation_rate_per_free_fall"), 0.0);
  EXPECT_FALSE(any_warning(m, "no gas above"));
  // A PDF range that misses both densities: all of it left out, and a warning says so.
  s.pdf_lowest = -0.1;
  s.pdf_highest = 0.1;
  m = two_densities(s, 0.0, 3.0);
  EXPECT_TRUE(any_warning(m, "100 % of the volume lies outside the PDF bins"));
  EXPECT_EQ(number_named(m, "multi_free_fall_integral"), 0.0);
}

// One bin [0, 1] holding all the volume, s_crit = 0.5: (2/3)(e^{3/2} − e^{3/4}) exactly
// (integral of e^{3s/2}; a few roundings, 1e-15).
TEST(Jeans, IntegralOverOneBin) {
  const double expected = 2.0 / 3.0 * (std::exp(1.5) - std::exp(0.75));
  EXPECT_NEAR(multi_free_fall_integral({1.0}, 0.0, 1.0, 0.5) / expected, 1.0, 1e-15);
  EXPECT_EQ(multi_free_fall_integral({1.0}, 0.0, 1.0, 2.0), 0.0);
}

// A lognormal volume PDF of σ_s = 1.5 (mean −σ²/2), binned exactly (erf differences) in 4000
// bins over [−20, 20], against scipy.integrate.quad of e^{3s/2} p(s) from s_crit. The binned
// integral treats p as constant in each bin of width Δs = 0.01: a relative error of order
// Δs² times the curvature of ln p (≈ 1/σ²), ~1e-5; 1e-4 is the tolerance.
TEST(Jeans, BinnedIntegralOfALognormalMatchesQuad) {
  const double sigma = 1.5, mean = -0.5 * sigma * sigma, s_crit = 2.3;
  const std::size_t bins = 4000;
  std::vector<double> f(bins);
  auto cdf = [&](double s) { return 0.5 * std::erfc(-(s - mean) / (sigma * std::sqrt(2.0))); };
  for (std::size_t k = 0; k < bins; ++k)
    f[k] = cdf(-20.0 + 40.0 * double(k + 1) / double(bins)) -
           cdf(-20.0 + 40.0 * double(k) / double(bins));
  const double binned = multi_free_fall_integral(f, -20.0, 20.0, s_crit);
  const auto reference = brume::testing::run_python(
      brume::testing::source_script("tests/physics/distributions_reference.py"),
      {"lognormal_rate", "1.5", "2.3"});
  ASSERT_EQ(reference.exit_code, 0) << reference.output;
  std::istringstream in(reference.output);
  double quad = 0.0;
  ASSERT_TRUE(in >> quad);
  std::printf("[multi-ff lognormal] binned %.12g, quad %.12g, relative %.3g\n", binned, quad,
              binned / quad - 1.0);
  EXPECT_NEAR(binned / quad, 1.0, 1e-4);
}

// s_crit = ln[(π²/5) φ_x² α_vir M² / (1 + 1/β)] (Federrath & Klessen 2012, Table 1, KM; from
// memory): the formula as documented, NaN without turbulence.
TEST(Jeans, KrumholzMcKeeCriticalDensity) {
  const double pi2 = std::numbers::pi * std::numbers::pi;
  EXPECT_NEAR(km_critical_log_density(1.12, 2.0, 10.0, 1.0),
              std::log(pi2 / 5.0 * 1.12 * 1.12 * 2.0 * 100.0 / 2.0), 1e-14);
  EXPECT_NEAR(km_critical_log_density(1.0, 1.0, 1.0, std::numeric_limits<double>::infinity()),
              std::log(pi2 / 5.0), 1e-15);
  EXPECT_TRUE(std::isnan(km_critical_log_density(1.12, 1.0, 0.0, 1.0)));
}

}  // namespace
}  // namespace brume::physics
