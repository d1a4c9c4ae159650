// The Ornstein–Uhlenbeck process of the stirred modes: its measured autocorrelation time and
// stationary variance, the shell's mode count, the random numbers, and a bitwise continuation
// from saved amplitudes.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <vector>

#include "physics/stirring_modes.hpp"
#include "physics/stirring_process.hpp"
#include "physics/stirring_random.hpp"

namespace brume::physics {
namespace {

const std::array<double, 3> unit_box{1.0, 1.0, 1.0};
const std::array<bool, 3> all_axes{true, true, true};

TEST(StirringModes, ShellOneToThreeHoldsSixtyOnePairs) {
  // Integer vectors with 1 ≤ |n|² ≤ 9: r₃(m) = 6, 12, 8, 6, 24, 24, 0, 12, 30 for m = 1..9, 122
  // in all (the sums of three squares, OEIS A005875 — from memory; the same count by hand), so
  // 61 ± pairs.
  EXPECT_EQ(stirring_modes(1, 3, StirringProfile::flat, 1.0, unit_box, all_axes).size(), 61u);
  // Parabolic: |n| = 1 and 3 have weight zero and are dropped: 122 − 6 − 30 = 86 → 43 pairs.
  const auto parabolic = stirring_modes(1, 3, StirringProfile::parabolic, 1.0, unit_box, all_axes);
  EXPECT_EQ(parabolic.size(), 43u);
  for (const auto& m : parabolic) {
    const double n = std::sqrt(double(m.n[0] * m.n[0] + m.n[1] * m.n[1] + m.n[2] * m.n[2]));
    EXPECT_DOUBLE_EQ(m.weight, 1.0 - (n - 2.0) * (n - 2.0));  // the profile's definition
  }
  // A 2D box stirs only n_z = 0: vectors with 1 ≤ n_x² + n_y² ≤ 9 are 28 (r₂ = 4, 4, 0, 4, 8, 0,
  // 0, 4, 4 — from memory, checked by hand), 14 pairs.
  EXPECT_EQ(stirring_modes(1, 3, StirringProfile::flat, 1.0, unit_box, {true, true, false}).size(),
            14u);
}

TEST(StirringModes, ProjectionIsSolenoidalOrCompressive) {
  // Federrath et al. 2010, A&A 512, A81, eq. 9 (from memory): ζ = 1 leaves k·P = 0, ζ = 0 leaves
  // P = k kᵀ/k². Round-off tolerance: 1e-15 on entries of order 1.
  const std::array<double, 3> box{2.0, 1.0, 0.5};
  const std::array<int, 3> n{1, -2, 3};
  const std::array<double, 3> k{0.5, -2.0, 6.0};  // n_d / L_d
  const auto solenoidal = helmholtz_projection(n, box, 1.0);
  const auto compressive = helmholtz_projection(n, box, 0.0);
  const double k2 = 0.25 + 4.0 + 36.0;
  for (std::size_t j = 0; j < 3; ++j) {
    double kp = 0.0;
    for (std::size_t i = 0; i < 3; ++i) {
      kp += k[i] * solenoidal[3 * i + j];
      EXPECT_NEAR(compressive[3 * i + j], k[i] * k[j] / k2, 1e-15);
    }
    EXPECT_NEAR(kp, 0.0, 1e-15);
  }
}

TEST(StirringRandom, NormalNumbersHaveUnitVariance) {
  // Box & Muller 1958, Ann. Math. Stat. 29, 610: standard normal pairs. With 2·10⁶ numbers the
  // standard error of the mean is 7e-4 and of the variance 1e-3; tolerances are 5 of them.
  double sum = 0.0, squares = 0.0, fourth = 0.0;
  const std::uint64_t pairs = 1000000;
  for (std::uint64_t p = 0; p < pairs; ++p) {
    const NormalPair z = stirring_normal_pair(42, p);
    for (double x : {z.first, z.second}) {
      sum += x;
      squares += x * x;
      fourth += x * x * x * x;
    }
  }
  const double count = 2.0 * double(pairs);
  EXPECT_NEAR(sum / count, 0.0, 3.5e-3);
  EXPECT_NEAR(squares / count, 1.0, 5e-3);
  EXPECT_NEAR(fourth / count, 3.0, 0.03);  // the normal kurtosis (handbook value)
  // Different seeds give different streams.
  EXPECT_NE(stirring_normal_pair(1, 0).first, stirring_normal_pair(2, 0).first);
}

// Normalized autocorrelation of every real amplitude component at the given lags, from a long
// series of the process with step dt.
std::vector<double> autocorrelation(StirringProcess& process, double dt, int steps,
                                    const std::vector<int>& lags) {
  const std::size_t width = process.amplitudes().size();
  int longest = 0;
  for (int lag : lags)
    longest = std::max(longest, lag);
  std::vector<std::vector<double>> window(std::size_t(longest) + 1, std::vector<double>(width));
  std::vector<double> products(lags.size(), 0.0);
  double variance = 0.0;
  long samples = 0;
  for (int s = 0; s < steps; ++s) {
    process.advance(dt);
    window[std::size_t(s % (longest + 1))] = process.amplitudes();
    if (s < longest) continue;
    const auto& now = window[std::size_t(s % (longest + 1))];
    for (std::size_t l = 0; l < lags.size(); ++l) {
      const auto& then = window[std::size_t((s - lags[l]) % (longest + 1))];
      for (std::size_t c = 0; c < width; ++c)
        products[l] += now[c] * then[c];
    }
    for (std::size_t c = 0; c < width; ++c)
      variance += now[c] * now[c];
    ++samples;
  }
  for (double& p : products)
    p /= variance;
  return products;
}

TEST(StirringProcess, MeasuredCorrelationTimeIsTheSetOne) {
  // The OU process has the autocorrelation exp(−τ/T) (Uhlenbeck & Ornstein 1930, Phys. Rev. 36,
  // 823; Gillespie 1996, Phys. Rev. E 54, 2084, eq. 1.3 — from memory). 61 modes × 6 components
  // (366 series, 244 independent with ζ = 1) over 4000 T: the relative standard error of the
  // correlation at lag T is about sqrt(2 / (244 · 4000)) / e^{-1} ≈ 0.4 %, so 5 % on T (the
  // brief's tolerance) is far outside chance.
  const double T = 0.7;
  const double dt = T / 10.0;
  StirringProcess process(stirring_modes(1, 3, StirringProfile::flat, 1.0, unit_box, all_axes), T,
                          1.0, 3);
  process.start();
  const std::vector<int> lags{5, 10, 20};
  const auto rho = autocorrelation(process, dt, 40000, lags);
  for (std::size_t l = 0; l < lags.size(); ++l) {
    const double tau = lags[l] * dt;
    const double measured = -tau / std::log(rho[l]);
    std::printf("[stirring OU] lag %.3f: correlation %.5f, measured T / set T = %.4f\n", tau,
                rho[l], measured / T);
    EXPECT_NEAR(measured / T, 1.0, 0.05) << "lag " << tau << ", correlation " << rho[l];
  }
  // The integral time Σ ρ(τ) dτ up to 20 lags is tested through the three lags above; a process
  // with a wrong decay factor (e.g. exp(−dt/2T)) measures 2 T and fails.
}

TEST(StirringProcess, StationaryVarianceMatchesTheNormalization) {
  // ⟨|a|²⟩ = σ² Σ_m 4 w_m² tr(P Pᵀ) (the normalization of stirring_process.hpp; tr(P Pᵀ) =
  // 1 − 2ζ + 3ζ², the factor of Federrath et al. 2010 — from memory). Tolerance 3 %: the mean of
  // 43 modes' |â|² over 20000 steps of T/5 (4000 T, about 2000 independent samples of a sum of
  // ~170 squared normals) has a relative standard error under 0.3 %.
  for (double zeta : {1.0, 0.0, 0.4}) {
    const auto modes = stirring_modes(1, 3, StirringProfile::parabolic, zeta, unit_box, all_axes);
    const double sigma = 0.3;
    StirringProcess process(modes, 1.0, sigma, 5);
    process.start();
    double mean_square = 0.0;
    const int steps = 20000;
    for (int s = 0; s < steps; ++s) {
      process.advance(0.2);
      double sum = 0.0;  // volume average of |a|² = Σ_m 2 |â_m|²
      for (double x : process.amplitudes())
        sum += 2.0 * x * x;
      mean_square += sum / steps;
    }
    const double expected = sigma * sigma * stirring_mean_square_per_variance(modes);
    std::printf("[stirring OU] zeta %.1f: measured <|a|^2> / normalization = %.4f\n", zeta,
                mean_square / expected);
    EXPECT_NEAR(mean_square / expected, 1.0, 0.03) << "zeta " << zeta;
    double trace_expected = 0.0;
    for (const auto& m : modes)
      trace_expected += 4.0 * m.weight * m.weight * (1.0 - 2.0 * zeta + 3.0 * zeta * zeta);
    EXPECT_NEAR(stirring_mean_square_per_variance(modes) / trace_expected, 1.0, 1e-14);
  }
}

TEST(StirringProcess, ContinuesBitwiseFromSavedAmplitudesAndCounter) {
  // A checkpoint holds the amplitudes and the counter: continuing from them must give the same
  // bits as never stopping (DESIGN.md §4). Tolerance: none.
  const auto modes = stirring_modes(1, 3, StirringProfile::parabolic, 0.7, unit_box, all_axes);
  StirringProcess straight(modes, 1.0, 1.0, 9), first(modes, 1.0, 1.0, 9);
  straight.start();
  first.start();
  for (int s = 0; s < 50; ++s) {
    straight.advance(0.01 * (s + 1));
    first.advance(0.01 * (s + 1));
  }
  StirringProcess resumed(modes, 1.0, 1.0, 9);
  resumed.restore(first.amplitudes(), first.next_pair());
  for (int s = 0; s < 50; ++s) {
    straight.advance(0.03);
    resumed.advance(0.03);
  }
  EXPECT_EQ(straight.amplitudes(), resumed.amplitudes());
  EXPECT_EQ(straight.next_pair(), resumed.next_pair());
  EXPECT_THROW(resumed.restore({1.0, 2.0}, 0), std::invalid_argument);
}

}  // namespace
}  // namespace brume::physics
