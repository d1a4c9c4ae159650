// Field-loop advection (Gardiner & Stone 2005, J. Comput. Phys. 205, 509, §5.1): a weak loop of
// field carried across a periodic box by a uniform flow.
#include <gtest/gtest.h>

#include <chrono>
#include <cmath>
#include <cstdio>

#include "tests/verification/mhd2d_problem_run.hpp"

namespace brume::verification {
namespace {

// The largest |B_z| over the interior z-faces.
double largest_bz(const solver::State& s) {
  const solver::BlockGeometry& g = s.geometry;
  double largest = 0.0;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i)
        largest = std::fmax(largest, std::fabs(s.face_field[2][g.index(i, j, k)]));
    }
  }
  return largest;
}

TEST(Mhd2dFieldLoop, MagneticEnergyAfterTwoCrossingsAt128x64) {
  const auto start = std::chrono::steady_clock::now();
  ProblemRun run = start_problem("field_loop.yaml", {});
  ASSERT_EQ(run.state.geometry.cells, (std::array<int, 3>{128, 64, 1}));
  const double initial = magnetic_energy(run.state);
  ASSERT_GT(initial, 0.0);
  check_divergence(run);
  // Advance to t = 2 (two crossings of the box along both axes), checking div B every 10 steps.
  ASSERT_TRUE(advance_to(run, stop_time(run), 10));
  const double ratio = magnetic_energy(run.state) / initial;
  const double seconds =
      std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
  std::printf("[field loop 128x64] E_B(t=2)/E_B(0) = %.5f, %.1f s\n", ratio, seconds);
  report_counts("field loop 128x64", run);
  // Ideal MHD conserves the loop's magnetic energy; only numerical dissipation removes it and
  // nothing may create it, so ratio ≤ 1. Gardiner & Stone 2005, §5.1 (from memory, uncertain:
  // their CTU scheme keeps roughly 90-95% of E_B at t = 2 at this resolution). brume's VL2 with
  // PLM keeps 84.5% (measured); the lower bound 0.82 guards that figure against regressions.
  EXPECT_LE(ratio, 1.0);
  EXPECT_GE(ratio, 0.82);
  // The loss converges with resolution: at 64 x 32 it is 2.4 times larger (measured). The loop's
  // edge is a discontinuity of B, where limited PLM is first order at best, so demand ≥ 2
  // (convergence of the loss at order ≥ 1; common practice, no source).
  ProblemRun coarse = start_problem("field_loop.yaml", {"box.cells=[64,32,1]"});
  const double coarse_initial = magnetic_energy(coarse.state);
  ASSERT_TRUE(advance_to(coarse, stop_time(coarse), 10));
  const double coarse_ratio = magnetic_energy(coarse.state) / coarse_initial;
  std::printf("[field loop 64x32] E_B(t=2)/E_B(0) = %.5f; loss ratio 64x32 / 128x64 = %.2f\n",
              coarse_ratio, (1.0 - coarse_ratio) / (1.0 - ratio));
  EXPECT_GE((1.0 - coarse_ratio) / (1.0 - ratio), 2.0);
  EXPECT_LE(coarse.largest_divergence, 1e-12);
  EXPECT_GE(run.divergence_checks, 10);
  // CT keeps the discrete divergence at round-off: 1e-12 is ~1e4 ulp (common practice, no source).
  EXPECT_LE(run.largest_divergence, 1e-12);
  // B_z is never sourced in a 2D problem with v_z = 0 (the EMFs E_x, E_y vanish identically).
  EXPECT_EQ(largest_bz(run.state), 0.0);
  EXPECT_EQ(run.density_floors + run.pressure_floors + run.fallback_cells, 0);
}

// The same loop (A = A0 (R − r) ẑ, uniform along z) in a 3D box, advected by v = (2, 1, 1): the
// loop's field lies in the x-y plane and is uniform along z, so ∂B_z/∂t = v_z (∂_x B_x + ∂_y B_y)
// = 0 in the continuum and B_z should stay zero (Gardiner & Stone 2008, J. Comput. Phys. 227,
// 4123, §6.2, from memory: the 3D loop test checks exactly this).
TEST(Mhd2dFieldLoop, NoOutOfPlaneFieldIn3DWithVerticalAdvection) {
  const auto start = std::chrono::steady_clock::now();
  ProblemRun run =
      start_problem("field_loop.yaml",
                    {"box.cells=[32,16,16]", "box.size=[2pc,1pc,1pc]",
                     "box.origin=[-1pc,-0.5pc,-0.5pc]", "problem.field_loop.velocity=[2,1,1]"});
  const double amplitude = run.config.real("problem.field_loop.amplitude");
  const double initial = magnetic_energy(run.state);
  ASSERT_EQ(largest_bz(run.state), 0.0);
  double largest = 0.0;
  ASSERT_TRUE(advance_to(run, stop_time(run), 10, [&](const solver::State& s) {
    largest = std::fmax(largest, largest_bz(s));
  }));
  const double seconds =
      std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
  std::printf("[field loop 3D 32x16x16] max_t |B_z| / A0 = %.3e, E_B(t=2)/E_B(0) = %.5f, %.1f s\n",
              largest / amplitude, magnetic_energy(run.state) / initial, seconds);
  report_counts("field loop 3D", run);
  EXPECT_LE(run.largest_divergence, 1e-12);
  // Checked: the largest |B_z| over every interior z-face after every step, relative to the
  // loop's |B| = A0. A discretely inconsistent EMF would make B_z grow at truncation level,
  // ~(h/R)² A0 ~ 1e-2 A0 here (Gardiner & Stone 2008, §6.2, from memory); round-off of the EMF
  // differences is ~1e-16 A0 a step. Bound 1e-12 A0: far below the first, ~1e4 above the second.
  EXPECT_LE(largest / amplitude, 1e-12);
  // The loop was carried, not lost: some field is left (E_B at 16 cells per unit length decays
  // fast; measured 0.21 of the initial energy at t = 2). Bound: more than 10%.
  EXPECT_GE(magnetic_energy(run.state) / initial, 0.10);
}

}  // namespace
}  // namespace brume::verification
