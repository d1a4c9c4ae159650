// The Orszag–Tang vortex (Orszag & Tang 1979, J. Fluid Mech. 90, 129) in the periodic unit square:
// conservation to round-off, the point symmetry of the problem, and div B.
#include <gtest/gtest.h>

#include <chrono>
#include <cmath>
#include <cstdio>
#include <vector>

#include "solver/exact_sum.hpp"
#include "tests/verification/mhd2d_problem_run.hpp"

namespace brume::verification {
namespace {

struct Totals {
  double mass = 0.0, energy = 0.0, momentum_scale = 0.0;
  std::array<double, 3> momentum{};
};

// Totals summed exactly (solver/exact_sum.hpp): a plain sum of 128² equal densities is off by
// up to ~1e-13 by itself, which would hide the round-off of the scheme.
double exact_total(const solver::State& s, const std::vector<double>& q) {
  solver::ExactSum sum;
  interior_sum(s, [&](std::ptrdiff_t c) {
    sum.add(q[std::size_t(c)]);
    return 0.0;
  });
  return sum.value();
}

Totals totals(const solver::State& s) {
  Totals t;
  t.mass = exact_total(s, s.density);
  t.energy = exact_total(s, s.energy);
  for (std::size_t d = 0; d < 3; ++d) {
    t.momentum[d] = exact_total(s, s.momentum[d]);
    t.momentum_scale +=
        interior_sum(s, [&](std::ptrdiff_t c) { return std::fabs(s.momentum[d][c]); });
  }
  return t;
}

// Largest violation of (x, y) → (1 − x, 1 − y), v → −v, B → −B over the interior, each field
// relative to its largest magnitude: ρ and E even, momenta and face fields odd. The lower x-face
// of cell i maps to the lower x-face of cell N − i (the upper face of cell N − 1 − i).
double point_symmetry_residual(const solver::State& s) {
  const solver::BlockGeometry& g = s.geometry;
  const int nx = g.cells[0], ny = g.cells[1];
  double worst = 0.0;
  auto compare = [&](const std::vector<double>& q, double parity, int di, int dj) {
    double scale = 0.0, diff = 0.0;
    for (int j = 0; j < ny; ++j) {
      for (int i = 0; i < nx; ++i) {
        const double a = q[std::size_t(g.index(i, j, 0))];
        const double b = q[std::size_t(g.index(nx - 1 + di - i, ny - 1 + dj - j, 0))];
        scale = std::fmax(scale, std::fabs(a));
        diff = std::fmax(diff, std::fabs(a - parity * b));
      }
    }
    worst = std::fmax(worst, scale > 0.0 ? diff / scale : diff);
  };
  compare(s.density, 1.0, 0, 0);
  compare(s.energy, 1.0, 0, 0);
  compare(s.momentum[0], -1.0, 0, 0);
  compare(s.momentum[1], -1.0, 0, 0);
  compare(s.face_field[0], -1.0, 1, 0);
  compare(s.face_field[1], -1.0, 0, 1);
  return worst;
}

class Mhd2dOrszagTang : public ::testing::Test {
 protected:
  // One run at 128² to t = 0.5 serves every check; symmetry is measured at t = 0, 0.25 and 0.5.
  static void SetUpTestSuite() {
    const auto start = std::chrono::steady_clock::now();
    run_ = new ProblemRun(start_problem("orszag_tang.yaml", {"box.cells=[128,128,1]"}));
    before_ = totals(run_->state);
    symmetry_[0] = point_symmetry_residual(run_->state);
    check_divergence(*run_);
    completed_ = advance_to(*run_, 0.25, 10);
    symmetry_[1] = point_symmetry_residual(run_->state);
    completed_ = completed_ && advance_to(*run_, stop_time(*run_), 10);
    symmetry_[2] = point_symmetry_residual(run_->state);
    after_ = totals(run_->state);
    const double seconds =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    std::printf(
        "[orszag-tang 128^2] t = %.3f in %.1f s; symmetry residual t=0: %.3e, t=0.25: "
        "%.3e, t=0.5: %.3e\n",
        run_->state.time, seconds, symmetry_[0], symmetry_[1], symmetry_[2]);
    std::printf(
        "[orszag-tang 128^2] relative change: mass %.3e, energy %.3e; momentum "
        "%.3e %.3e (of sum |m| %.4g)\n",
        (after_.mass - before_.mass) / before_.mass,
        (after_.energy - before_.energy) / before_.energy,
        (after_.momentum[0] - before_.momentum[0]) / before_.momentum_scale,
        (after_.momentum[1] - before_.momentum[1]) / before_.momentum_scale,
        before_.momentum_scale);
    report_counts("orszag-tang 128^2", *run_);
  }
  static void TearDownTestSuite() {
    delete run_;
    run_ = nullptr;
  }
  static ProblemRun* run_;
  static bool completed_;
  static Totals before_, after_;
  static std::array<double, 3> symmetry_;
};

ProblemRun* Mhd2dOrszagTang::run_ = nullptr;
bool Mhd2dOrszagTang::completed_ = false;
Totals Mhd2dOrszagTang::before_, Mhd2dOrszagTang::after_;
std::array<double, 3> Mhd2dOrszagTang::symmetry_{};

TEST_F(Mhd2dOrszagTang, ReachesHalfTimeWithoutFloorsOrFallbacks) {
  ASSERT_TRUE(completed_);
  EXPECT_DOUBLE_EQ(run_->state.time, 0.5);
  // The standard vortex at β = 10/3, Mach 1 needs no floor (common practice, no source).
  EXPECT_EQ(run_->density_floors + run_->pressure_floors, 0);
  EXPECT_EQ(run_->fallback_cells, 0);
}

// A conservative finite-volume update with CT in a periodic box conserves mass, momentum and total
// energy exactly up to round-off (common practice, no source). The totals are exact sums, so what
// remains is the rounding of each cell's update, ~1e-16 of its value per step in random
// directions: measured 0 (mass) and 2e-16 (energy) over 717 steps; bound 1e-14 relative.
TEST_F(Mhd2dOrszagTang, ConservesMassMomentumAndEnergy) {
  ASSERT_TRUE(completed_);
  EXPECT_LE(std::fabs(after_.mass - before_.mass) / before_.mass, 1e-14);
  EXPECT_LE(std::fabs(after_.energy - before_.energy) / before_.energy, 1e-14);
  // The net momentum is zero; measured against Σ|m| of the initial state.
  for (std::size_t d = 0; d < 3; ++d) {
    EXPECT_LE(std::fabs(after_.momentum[d] - before_.momentum[d]) / before_.momentum_scale, 1e-14)
        << "momentum " << d;
  }
}

// Orszag & Tang 1979 set-up is invariant under the point reflection (x, y) → (1 − x, 1 − y) with
// v, B → −v, −B (common practice, no source). The set-up is exactly symmetric (problem file), and
// the scheme treats both orientations of every face alike, so the symmetry holds to round-off; the
// bound 1e-12 allows round-off to be amplified by ~1e4 over ~1e3 steps across shocks.
TEST_F(Mhd2dOrszagTang, KeepsPointSymmetry) {
  ASSERT_TRUE(completed_);
  EXPECT_EQ(symmetry_[0], 0.0);
  EXPECT_LE(symmetry_[1], 1e-12);
  EXPECT_LE(symmetry_[2], 1e-12);
}

TEST_F(Mhd2dOrszagTang, KeepsDivergenceAtRoundOff) {
  ASSERT_TRUE(completed_);
  EXPECT_GE(run_->divergence_checks, 50);
  // 1e-12: ~1e4 ulp of the face differences (common practice, no source).
  EXPECT_LE(run_->largest_divergence, 1e-12);
}

}  // namespace
}  // namespace brume::verification
