// The cases `brume bench scaling` measures and how it turns their rates into efficiencies.
#include "app/bench_scaling_plan.hpp"

#include <gtest/gtest.h>

#include "app/bench_scaling_efficiency.hpp"
#include "app/user_error.hpp"

namespace brume::app {
namespace {

// Rank counts double up to the job's size (common practice, no source).
TEST(BenchScalingPlan, RankCountsArePowersOfTwoUpToTheJob) {
  EXPECT_EQ(scaling_rank_counts(1), (std::vector<int>{1}));
  EXPECT_EQ(scaling_rank_counts(2), (std::vector<int>{1, 2}));
  EXPECT_EQ(scaling_rank_counts(6), (std::vector<int>{1, 2, 4}));
  EXPECT_EQ(scaling_rank_counts(8), (std::vector<int>{1, 2, 4, 8}));
}

// A weak-scaling box of n blocks has n blocks, split along z first, as close to a cube as
// doubling allows (common practice, no source).
TEST(BenchScalingPlan, WeakLayoutsMultiplyToTheRanks) {
  EXPECT_EQ(weak_ranks_per_axis(1), (std::array<int, 3>{1, 1, 1}));
  EXPECT_EQ(weak_ranks_per_axis(2), (std::array<int, 3>{1, 1, 2}));
  EXPECT_EQ(weak_ranks_per_axis(4), (std::array<int, 3>{1, 2, 2}));
  EXPECT_EQ(weak_ranks_per_axis(8), (std::array<int, 3>{2, 2, 2}));
  EXPECT_EQ(weak_ranks_per_axis(32), (std::array<int, 3>{2, 4, 4}));
}

TEST(BenchScalingPlan, StrongBoxesStayFixedAndWeakBoxesGrowWithTheRanks) {
  ScalingSizes sizes;
  sizes.strong_boxes = {16, 32};
  sizes.weak_block = 8;
  const std::vector<ScalingCase> plan = scaling_plan(sizes, 4);
  // Two schemes × (two strong boxes + one weak series) × ranks 1, 2, 4.
  ASSERT_EQ(plan.size(), 2u * 3u * 3u);
  int mhd = 0, hydro = 0;
  for (const ScalingCase& c : plan) {
    const auto& box = c.work.box_cells;
    const BenchCase& s = c.work.scheme;
    (s.physics == "mhd" ? mhd : hydro) += 1;
    EXPECT_EQ(s.reconstruction, "plm");
    EXPECT_EQ(s.riemann, s.physics == "mhd" ? "hlld" : "hllc");
    if (c.series == "strong") {
      EXPECT_EQ(box, (std::array<long, 3>{s.cells, s.cells, s.cells}));
      EXPECT_EQ(c.work.ranks_per_axis, (std::array<int, 3>{0, 0, 0}));  // as brume run chooses
    } else {
      ASSERT_EQ(c.series, "weak");
      const std::array<int, 3> p = weak_ranks_per_axis(c.ranks);
      EXPECT_EQ(c.work.ranks_per_axis, p);
      EXPECT_EQ(box, (std::array<long, 3>{8L * p[0], 8L * p[1], 8L * p[2]}));
    }
  }
  EXPECT_EQ(mhd, 9);
  EXPECT_EQ(hydro, 9);
}

TEST(BenchScalingPlan, StepsDefaultToTheSizeOfTheSeriesOrFollowTheOption) {
  ScalingSizes sizes;
  sizes.strong_boxes = {64};
  sizes.weak_block = 32;
  for (const ScalingCase& c : scaling_plan(sizes, 2)) {
    // default_steps: ≈ 2.7 million cell-updates per case, at least 3 steps (bench_options.cpp).
    EXPECT_EQ(c.work.scheme.steps, c.series == "strong" ? 10 : 82);
  }
  sizes.steps = 2;
  for (const ScalingCase& c : scaling_plan(sizes, 2))
    EXPECT_EQ(c.work.scheme.steps, 2);
}

// PLM needs 2 ghost layers, so a block needs 2 cells along a split axis: a 4³ box fits 8 ranks
// (2 × 2 × 2 blocks of 2³) but not 16 (it would need 4 ranks along one axis).
TEST(BenchScalingPlan, RefusesStrongBoxesTooSmallForTheRanks) {
  ScalingSizes sizes;
  sizes.strong_boxes = {4};
  sizes.weak_block = 4;
  EXPECT_NO_THROW((void)scaling_plan(sizes, 8));
  try {
    (void)scaling_plan(sizes, 16);
    FAIL() << "a 4³ box over 16 ranks was accepted";
  } catch (const UserError& error) {
    EXPECT_NE(std::string(error.what()).find("4³ box of strong scaling does not fit 16 ranks"),
              std::string::npos)
        << error.what();
  }
}

ScalingEntry entry(const char* series, int cells, int ranks, double rate, double best) {
  ScalingEntry e;
  e.series = series;
  e.result.step.setup = {"mhd", "plm", "hlld", cells, 3};
  e.result.step.ranks = ranks;
  e.result.step.cell_updates_per_second_per_core = rate;
  e.result.step.best_cell_updates_per_second_per_core = best;
  return e;
}

// Efficiency = per-core rate at n ranks / per-core rate at 1 rank of the same series
// (common practice, no source).
TEST(BenchScalingEfficiency, DividesByTheOneRankEntryOfTheSameSeries) {
  std::vector<ScalingEntry> entries{
      entry("strong", 64, 1, 4e6, 5e6),  entry("strong", 64, 2, 3e6, 4e6),
      entry("strong", 128, 1, 2e6, 2e6), entry("strong", 128, 4, 1e6, 1.5e6),
      entry("weak", 64, 2, 2e6, 2e6),    entry("weak", 64, 1, 8e6, 8e6)};
  set_efficiencies(entries);
  EXPECT_EQ(entries[0].efficiency, 1.0);
  EXPECT_EQ(entries[1].efficiency, 0.75);
  EXPECT_EQ(entries[1].best_step_efficiency, 0.8);
  EXPECT_EQ(entries[2].efficiency, 1.0);
  EXPECT_EQ(entries[3].efficiency, 0.5);
  EXPECT_EQ(entries[3].best_step_efficiency, 0.75);
  EXPECT_EQ(entries[4].efficiency, 0.25);  // its one-rank entry comes later in the list
}

TEST(BenchScalingEfficiency, IsZeroWithoutAOneRankEntry) {
  std::vector<ScalingEntry> entries{entry("weak", 64, 2, 2e6, 2e6),
                                    entry("strong", 64, 1, 1e6, 1e6)};
  set_efficiencies(entries);
  EXPECT_EQ(entries[0].efficiency, 0.0);
  EXPECT_EQ(entries[1].efficiency, 1.0);
}

}  // namespace
}  // namespace brume::app
