// The diagnostic against a direct evaluation in this file: every cell, every axis, the partner
// cell found by modular indexing, every quantity summed in plain loops. A random field with
// random density and temperature in a box of unequal sides.
#include <gtest/gtest.h>

#include <cmath>
#include <string>
#include <vector>

#include "physics/structure_fit.hpp"
#include "tests/structure/structure_test_support.hpp"

namespace brume::testing {
namespace {

constexpr std::array<long, 3> box{8, 12, 10};
constexpr double cold_temperature = 300.0;

SyntheticCell random_cell(long i, long j, long k) {
  SyntheticCell c;
  c.density = 1.0 + 0.5 * hashed_uniform(i, j, k, 1);
  c.velocity = {hashed_uniform(i, j, k, 2), 2.0 * hashed_uniform(i, j, k, 3),
                0.5 * hashed_uniform(i, j, k, 4)};
  c.temperature = 550.0 + 500.0 * hashed_uniform(i, j, k, 5);  // a quarter below 300 K
  return c;
}

// Sums over the pairs of one axis and lag, with Σ|term| for the tolerance of signed sums.
struct Direct {
  std::array<double, 7> longitudinal{}, transverse{};
  double flux = 0.0, flux_magnitude = 0.0, cold_square = 0.0;
  long long cold_pairs = 0;
};

Direct direct(int axis, long lag) {
  Direct r;
  const auto a = std::size_t(axis == 0 ? 1 : 0);
  const auto b = std::size_t(axis == 2 ? 1 : 2);
  const auto d = std::size_t(axis);
  for (long k = 0; k < box[2]; ++k) {
    for (long j = 0; j < box[1]; ++j) {
      for (long i = 0; i < box[0]; ++i) {
        std::array<long, 3> there{i, j, k};
        there[d] = (there[d] + lag) % box[d];
        const SyntheticCell p = random_cell(i, j, k);
        const SyntheticCell q = random_cell(there[0], there[1], there[2]);
        std::array<double, 3> dv{};
        for (std::size_t c = 0; c < 3; ++c)
          dv[c] = q.velocity[c] - p.velocity[c];
        for (int order = 1; order <= 6; ++order) {
          r.longitudinal[std::size_t(order)] += std::pow(std::fabs(dv[d]), order);
          r.transverse[std::size_t(order)] +=
              std::pow(std::fabs(dv[a]), order) + std::pow(std::fabs(dv[b]), order);
        }
        const double square = dv[0] * dv[0] + dv[1] * dv[1] + dv[2] * dv[2];
        const double dm = q.density * q.velocity[d] - p.density * p.velocity[d];
        r.flux += dm * square;
        r.flux_magnitude += std::fabs(dm * square);
        if (p.temperature < cold_temperature && q.temperature < cold_temperature) {
          r.cold_square += square;
          ++r.cold_pairs;
        }
      }
    }
  }
  return r;
}

physics::StructureSettings settings() {
  physics::StructureSettings s = every_lag_settings();
  s.cold_temperature = cold_temperature;
  s.fit_lowest_lag = 1;
  s.fit_highest_lag = 4;
  s.minimum_cold_pairs = 10;
  return s;
}

// Tolerance 1e-12 of the sum of magnitudes: the two sides add the same ~1000 terms in different
// orders (pow against repeated products, line by line against cell by cell), each rounding
// error ≤ 1e-16 relative of a term.
TEST(StructureDirect, EveryQuantityMatchesPlainLoops) {
  const io::Measurement m = measure_one_block(settings(), box, random_cell);
  const auto& lags = array_named(m, "lag_cells");
  ASSERT_EQ(lags.values.size(), 4u);
  const double cells = double(box[0] * box[1] * box[2]);
  const auto& flux = array_named(m, "flux_third_order_per_axis");
  const auto& sigma = array_named(m, "cold_velocity_dispersion_per_axis");
  const auto& pairs = array_named(m, "cold_pair_count_per_axis");
  const auto& pooled_sigma = array_named(m, "cold_velocity_dispersion");
  long long all_pairs = 0;
  for (std::size_t l = 0; l < 4; ++l) {
    double pooled_square = 0.0;
    long long pooled_pairs = 0;
    for (int axis = 0; axis < 3; ++axis) {
      const Direct r = direct(axis, long(l) + 1);
      const auto d = std::size_t(axis);
      for (int p = 1; p <= 6; ++p) {
        const double lon =
            on_axis(array_named(m, "longitudinal_order_" + std::to_string(p) + "_per_axis"), d, l);
        const double tra =
            on_axis(array_named(m, "transverse_order_" + std::to_string(p) + "_per_axis"), d, l);
        const double lon_ref = r.longitudinal[std::size_t(p)] / cells;
        const double tra_ref = r.transverse[std::size_t(p)] / (2 * cells);
        EXPECT_NEAR(lon, lon_ref, 1e-12 * lon_ref) << "axis " << axis << " p " << p;
        EXPECT_NEAR(tra, tra_ref, 1e-12 * tra_ref) << "axis " << axis << " p " << p;
      }
      EXPECT_NEAR(on_axis(flux, d, l), r.flux / cells, 1e-12 * r.flux_magnitude / cells);
      EXPECT_EQ(on_axis(pairs, d, l), double(r.cold_pairs));
      ASSERT_GT(r.cold_pairs, 0);
      const double sigma_ref = std::sqrt(r.cold_square / double(r.cold_pairs));
      EXPECT_NEAR(on_axis(sigma, d, l), sigma_ref, 1e-12 * sigma_ref);
      pooled_square += r.cold_square;
      pooled_pairs += r.cold_pairs;
    }
    const double pooled_ref = std::sqrt(pooled_square / double(pooled_pairs));
    EXPECT_NEAR(pooled_sigma.values[l], pooled_ref, 1e-12 * pooled_ref);
    all_pairs += pooled_pairs;
  }
  EXPECT_GT(all_pairs, 100);  // the field has cold pairs at all (else the check above is empty)
  // The slope is the least-squares fit of the lags in [1, 4] (all have ≥ 10 pairs).
  std::vector<double> x, y;
  for (std::size_t l = 0; l < 4; ++l) {
    x.push_back(std::log(lags.values[l]));
    y.push_back(std::log(pooled_sigma.values[l]));
  }
  const physics::SlopeFit fit = physics::least_squares_slope(x, y);
  EXPECT_EQ(number_named(m, "size_linewidth_slope"), fit.slope);
  EXPECT_EQ(number_named(m, "size_linewidth_slope_error"), fit.error);
  EXPECT_EQ(number_named(m, "size_linewidth_fit_lags"), 4.0);
  EXPECT_TRUE(m.warnings.empty());
}

// Fewer orders run a kernel of its own: the same bits for the orders both have.
TEST(StructureDirect, FewerOrdersGiveTheSameValues) {
  physics::StructureSettings three = settings();
  three.max_order = 3;
  const io::Measurement all = measure_one_block(settings(), box, random_cell);
  const io::Measurement some = measure_one_block(three, box, random_cell);
  for (int p = 1; p <= 3; ++p) {
    const std::string name = "transverse_order_" + std::to_string(p) + "_per_axis";
    EXPECT_EQ(array_named(all, name).values, array_named(some, name).values);
  }
  EXPECT_EQ(array_named(all, "flux_third_order").values,
            array_named(some, "flux_third_order").values);
  EXPECT_THROW((void)array_named(some, "longitudinal_order_4"), std::logic_error);
}

// No cold cell: no pair, no dispersion, and a warning that the slope means nothing.
TEST(StructureDirect, NoColdGasWarns) {
  physics::StructureSettings s = settings();
  s.cold_temperature = 10.0;
  const io::Measurement m = measure_one_block(s, box, random_cell);
  EXPECT_EQ(array_named(m, "cold_pair_count").values, std::vector<double>(4, 0.0));
  EXPECT_TRUE(std::isnan(array_named(m, "cold_velocity_dispersion").values[0]));
  EXPECT_TRUE(std::isnan(number_named(m, "size_linewidth_slope")));
  ASSERT_EQ(m.warnings.size(), 1u);
  EXPECT_NE(m.warnings[0].find("not meaningful"), std::string::npos);
}

}  // namespace
}  // namespace brume::testing
