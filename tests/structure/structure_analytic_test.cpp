// Structure functions of fields whose increments are known in closed form.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>
#include <vector>

#include "tests/structure/structure_test_support.hpp"

namespace brume::testing {
namespace {

constexpr double pi = std::numbers::pi;

// The larger of |a| and |b| times a relative tolerance.
double scaled(double a, double b, double relative) {
  return relative * std::max(std::fabs(a), std::fabs(b));
}

// v_x = A sin(θ + 0.3), v_y = B cos θ, θ = 2π x / N. Along x, δv_x = 2A sin(φ/2) cos(θ + 0.3 +
// φ/2) with φ = 2πℓ/N (sin a − sin b = 2 cos((a+b)/2) sin((a−b)/2), a handbook identity, e.g.
// Abramowitz & Stegun 1964, 4.3.37 — number from memory). The grid means of cos², cos⁴, cos⁶
// are 1/2, 3/8, 5/16 when 6k ≢ 0 mod N (power reduction cos⁴ = (3 + 4 cos 2θ + cos 4θ)/8,
// cos⁶ = (10 + 15 cos 2θ + 6 cos 4θ + cos 6θ)/32, and Σ_x cos(2π m x/N + c) = 0 for m ≢ 0 mod N:
// common practice, no source). So S_2 = 2A² s², S_4 = 6A⁴ s⁴, S_6 = 20A⁶ s⁶ with s = sin(πℓ/N);
// the transverse mean over v_y and v_z (= 0) is half of B's: S_2 = B² s², S_4 = 3B⁴ s⁴.
// Tolerance 1e-12 relative: sums of N³ = 4096 rounded terms (≤ ~1e-13 expected).
TEST(StructureAnalytic, SineModeAlongX) {
  constexpr long n = 16;
  constexpr double a = 1.7, b = 0.6;
  const io::Measurement m =
      measure_one_block(every_lag_settings(), {n, n, n}, [&](long i, long, long) {
        SyntheticCell c;
        const double theta = 2.0 * pi * double(i) / double(n);
        c.velocity = {a * std::sin(theta + 0.3), b * std::cos(theta), 0.0};
        return c;
      });
  const auto& lon2 = array_named(m, "longitudinal_order_2_per_axis");
  const auto& lon4 = array_named(m, "longitudinal_order_4_per_axis");
  const auto& lon6 = array_named(m, "longitudinal_order_6_per_axis");
  const auto& tra2 = array_named(m, "transverse_order_2_per_axis");
  const auto& tra4 = array_named(m, "transverse_order_4_per_axis");
  const auto& mean2 = array_named(m, "longitudinal_order_2");
  const auto& lags = array_named(m, "lag_cells");
  ASSERT_EQ(lags.values.size(), std::size_t(n / 2));
  for (std::size_t l = 0; l < lags.values.size(); ++l) {
    const double s = std::sin(pi * lags.values[l] / double(n));
    const double expected2 = 2 * a * a * s * s;
    EXPECT_NEAR(on_axis(lon2, 0, l), expected2, scaled(expected2, 0, 1e-12)) << "lag " << l + 1;
    EXPECT_NEAR(on_axis(lon4, 0, l), 6 * std::pow(a * s, 4), 1e-12 * 6 * std::pow(a * s, 4));
    EXPECT_NEAR(on_axis(lon6, 0, l), 20 * std::pow(a * s, 6), 1e-12 * 20 * std::pow(a * s, 6));
    EXPECT_NEAR(on_axis(tra2, 0, l), b * b * s * s, 1e-12 * b * b * s * s);
    EXPECT_NEAR(on_axis(tra4, 0, l), 3 * std::pow(b * s, 4), 1e-12 * 3 * std::pow(b * s, 4));
    // Nothing varies along y and z: every increment there is exactly 0.
    for (std::size_t d = 1; d < 3; ++d) {
      EXPECT_EQ(on_axis(lon2, d, l), 0.0);
      EXPECT_EQ(on_axis(tra2, d, l), 0.0);
    }
    EXPECT_NEAR(mean2.values[l], expected2 / 3, scaled(expected2, 0, 1e-12));
  }
}

// v_x = S y (y = j Δ): along y, a pair that does not wrap has δv_x = S Δ ℓ, and the ℓ of N that
// wrap have δv_x = −S Δ (N − ℓ) (direct count of the pairs, common practice, no source). Mean over
// the two transverse components (v_x and v_z = 0): S_p = [(N − ℓ)(SΔℓ)^p + ℓ (SΔ(N − ℓ))^p] / 2N.
// Tolerance 1e-12 relative (rounded sums, as above).
TEST(StructureAnalytic, LinearShearWrapsAroundTheBox) {
  constexpr long n = 12;
  constexpr double shear = 0.8, spacing = 0.5;
  const io::Measurement m = measure_one_block(
      every_lag_settings(), {6, n, 4},
      [&](long, long j, long) {
        SyntheticCell c;
        c.velocity = {shear * spacing * double(j), 0.0, 0.0};
        return c;
      },
      spacing);
  const auto& lags = array_named(m, "lag_cells");
  ASSERT_EQ(lags.values.size(), 2u);  // the fewest cells (4, along z) limit the lags to 1, 2
  const auto& length = array_named(m, "lag_length");
  for (std::size_t l = 0; l < 2; ++l) {
    const double ell = lags.values[l];
    EXPECT_EQ(on_axis(length, 1, l), ell * spacing);
    for (int p = 1; p <= 6; ++p) {
      const auto& t = array_named(m, "transverse_order_" + std::to_string(p) + "_per_axis");
      const auto& lon = array_named(m, "longitudinal_order_" + std::to_string(p) + "_per_axis");
      const double expected = ((double(n) - ell) * std::pow(shear * spacing * ell, p) +
                               ell * std::pow(shear * spacing * (double(n) - ell), p)) /
                              (2.0 * double(n));
      EXPECT_NEAR(on_axis(t, 1, l), expected, 1e-12 * expected) << "p " << p << " lag " << ell;
      EXPECT_EQ(on_axis(t, 0, l), 0.0);
      EXPECT_EQ(on_axis(t, 2, l), 0.0);
      EXPECT_EQ(on_axis(lon, 1, l), 0.0);
    }
  }
}

// Cold cells where x < N/2: along x a pair is cold for N/2 − ℓ starts per line (no wrapped pair:
// ℓ ≤ N/2); along y and z every start in the cold half is (N³/2). Direct count of pairs
// (common practice, no source); exact integers.
TEST(StructureAnalytic, ColdPairsOfHalfTheBox) {
  constexpr long n = 8;
  physics::StructureSettings settings = every_lag_settings();
  settings.cold_temperature = 300.0;
  const io::Measurement m = measure_one_block(settings, {n, n, n}, [&](long i, long, long) {
    SyntheticCell c;
    c.temperature = i < n / 2 ? 100.0 : 5000.0;
    return c;
  });
  const auto& lags = array_named(m, "lag_cells");
  const auto& pairs = array_named(m, "cold_pair_count_per_axis");
  const auto& pooled = array_named(m, "cold_pair_count");
  for (std::size_t l = 0; l < lags.values.size(); ++l) {
    const double along_x = (double(n) / 2 - lags.values[l]) * double(n * n);
    EXPECT_EQ(on_axis(pairs, 0, l), along_x);
    EXPECT_EQ(on_axis(pairs, 1, l), double(n * n * n) / 2);
    EXPECT_EQ(on_axis(pairs, 2, l), double(n * n * n) / 2);
    EXPECT_EQ(pooled.values[l], along_x + double(n * n * n));
  }
}

// A flat box (one cell along z): the lags stop at half the smaller active axis (8 / 2), z has no
// value (NaN) and the axis mean is over x and y only. v_x = A sin(2πx/16): S_2 = 2A² sin²(πℓ/16)
// along x (as above), 0 along y. Tolerance 1e-12 relative, as above.
TEST(StructureAnalytic, FlatBoxAveragesTheActiveAxes) {
  constexpr long n = 16;
  constexpr double a = 0.9;
  const io::Measurement m =
      measure_one_block(every_lag_settings(), {n, 8, 1}, [&](long i, long, long) {
        SyntheticCell c;
        c.velocity = {a * std::sin(2.0 * pi * double(i) / double(n)), 0.0, 0.0};
        return c;
      });
  const auto& lags = array_named(m, "lag_cells");
  ASSERT_EQ(lags.values, (std::vector<double>{1, 2, 3, 4}));
  const auto& per_axis = array_named(m, "longitudinal_order_2_per_axis");
  const auto& mean = array_named(m, "longitudinal_order_2");
  for (std::size_t l = 0; l < 4; ++l) {
    const double s = std::sin(pi * lags.values[l] / double(n));
    const double along_x = 2 * a * a * s * s;
    EXPECT_NEAR(on_axis(per_axis, 0, l), along_x, 1e-12 * along_x);
    EXPECT_EQ(on_axis(per_axis, 1, l), 0.0);
    EXPECT_TRUE(std::isnan(on_axis(per_axis, 2, l)));
    EXPECT_NEAR(mean.values[l], along_x / 2, 1e-12 * along_x);
  }
}

}  // namespace
}  // namespace brume::testing
