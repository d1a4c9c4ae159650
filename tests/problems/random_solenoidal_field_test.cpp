#include "problems/random_solenoidal_field.hpp"

#include <gtest/gtest.h>

#include <cmath>

using brume::problems::RandomSolenoidalField;

namespace {

// Volume average of |v|² at the centres of an n³ grid over the unit box.
double mean_square(const RandomSolenoidalField& field, int n) {
  double sum = 0.0;
  for (int k = 0; k < n; ++k) {
    for (int j = 0; j < n; ++j) {
      for (int i = 0; i < n; ++i) {
        const auto v = field((i + 0.5) / n, (j + 0.5) / n, (k + 0.5) / n);
        sum += v[0] * v[0] + v[1] * v[1] + v[2] * v[2];
      }
    }
  }
  return sum / (double(n) * n * n);
}

}  // namespace

TEST(RandomSolenoidalField, GridAverageOfTheSquareIsTheSetRms) {
  // Distinct Fourier modes with |k| < n/2 are orthogonal on an n-point periodic grid and each
  // sin² averages to 1/2 (discrete orthogonality; common practice, no source), so the grid mean
  // of |v|² equals rms² up to round-off.
  const RandomSolenoidalField field({1, 1, 1}, {true, true, true}, 1, 3, 2.5, 7);
  EXPECT_NEAR(mean_square(field, 16), 2.5 * 2.5, 1e-11);
}

TEST(RandomSolenoidalField, EveryModeIsTransverse) {
  // A field Σ a sin(k·x + φ) is divergence-free exactly when each a ⟂ k (common practice).
  const RandomSolenoidalField field({2, 1, 3}, {true, true, true}, 1, 2, 1.0, 11);
  ASSERT_GT(field.modes().size(), 10u);
  for (const auto& m : field.modes()) {
    double dot = 0.0, kk = 0.0, aa = 0.0;
    const double size[3] = {2, 1, 3};
    for (int d = 0; d < 3; ++d) {
      const double k = m.wave_number[d] / size[d];
      dot += k * m.amplitude[d];
      kk += k * k;
      aa += m.amplitude[d] * m.amplitude[d];
    }
    EXPECT_LT(std::fabs(dot), 1e-14 * std::sqrt(kk * aa));
  }
}

TEST(RandomSolenoidalField, ModesAreInTheShellAndOnePerPair) {
  // Shell 1 ≤ |k| ≤ 2 in 3D holds 6 + 12 + 8 + 6 = 32 integer vectors of |k|² = 1, 2, 3, 4, i.e.
  // 16 ±k pairs (counted by hand; common practice, no source).
  const RandomSolenoidalField field({1, 1, 1}, {true, true, true}, 1, 2, 1.0, 3);
  EXPECT_EQ(field.modes().size(), 16u);
  // In 2D (no z extent) only k_z = 0: |k|² = 1, 2, 4 give 4 + 4 + 4 = 12 vectors, 6 pairs.
  const RandomSolenoidalField flat({1, 1, 1}, {true, true, false}, 1, 2, 1.0, 3);
  EXPECT_EQ(flat.modes().size(), 6u);
  for (const auto& m : flat.modes())
    EXPECT_EQ(m.wave_number[2], 0);
}

TEST(RandomSolenoidalField, SeedDeterminesTheField) {
  const RandomSolenoidalField a({1, 1, 1}, {true, true, true}, 1, 2, 1.0, 42);
  const RandomSolenoidalField b({1, 1, 1}, {true, true, true}, 1, 2, 1.0, 42);
  const RandomSolenoidalField c({1, 1, 1}, {true, true, true}, 1, 2, 1.0, 43);
  EXPECT_EQ(a(0.3, 0.6, 0.1), b(0.3, 0.6, 0.1));
  EXPECT_NE(a(0.3, 0.6, 0.1), c(0.3, 0.6, 0.1));
}
