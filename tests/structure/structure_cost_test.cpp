// The cost of one measurement of a 64³ box on one rank, printed for docs/structure-functions.md
// (measured, never asserted), on a field whose answer is known so that the run checks itself:
// v_x = A sin(2π x / N) gives S_2 = 2A² sin²(πℓ/N) along x (see structure_analytic_test.cpp for
// the derivation; tolerance 1e-11 relative for sums of 64³ rounded terms).
#include <gtest/gtest.h>

#include <chrono>
#include <cmath>
#include <cstdio>
#include <ctime>
#include <numbers>

#include "tests/structure/structure_test_support.hpp"

namespace brume::testing {
namespace {

void time_and_check(physics::StructureSettings settings, const char* label) {
  constexpr long n = 64;
  constexpr double a = 1.3;
  constexpr double pi = std::numbers::pi;
  const auto sine = [&](long i, long, long k) {
    SyntheticCell c;
    c.velocity = {a * std::sin(2.0 * pi * double(i) / double(n)), 0.0, 0.0};
    c.temperature = k < n / 2 ? 100.0 : 8000.0;
    return c;
  };
  const physics::CellQuantities q = synthetic_block({n, n, n}, {1, 1, 1}, {0, 0, 0}, 1.0, sine);
  const physics::StructureFunctions diagnostic(settings);
  // Wall time, and processor time, which a loaded machine inflates less.
  const auto start = std::chrono::steady_clock::now();
  const std::clock_t start_cpu = std::clock();
  const io::Measurement m = diagnostic.measure(q, one_rank_context({n, n, n}));
  const double cpu = double(std::clock() - start_cpu) / CLOCKS_PER_SEC;
  const double seconds =
      std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
  const auto& lags = array_named(m, "lag_cells");
  const auto& s2 = array_named(m, "longitudinal_order_2_per_axis");
  for (std::size_t l = 0; l < lags.values.size(); ++l) {
    const double s = std::sin(pi * lags.values[l] / double(n));
    EXPECT_NEAR(on_axis(s2, 0, l), 2 * a * a * s * s, 1e-11 * 2 * a * a * s * s);
  }
  std::printf(
      "structure functions, 64^3, one rank, %s, p <= %d, %zu lags: %.3f s wall, %.3f s cpu\n",
      label, settings.max_order, lags.values.size(), seconds, cpu);
}

TEST(StructureCost, EveryLagAt64Cubed) {
  time_and_check(every_lag_settings(), "every_cell");
}

TEST(StructureCost, LogarithmicLagsAt64Cubed) {
  physics::StructureSettings s;
  s.lag_set = physics::StructureLagSet::logarithmic;
  s.lags_per_octave = 4;
  time_and_check(s, "logarithmic 4 per octave");
  s.lags_per_octave = 2;
  time_and_check(s, "logarithmic 2 per octave");
}

}  // namespace
}  // namespace brume::testing
