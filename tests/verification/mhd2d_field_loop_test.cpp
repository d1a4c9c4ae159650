// Field-loop advection (Gardiner & Stone 2005, J. Comput. Phys. 205, 509, §5.1): a weak loop of
// field carried across a periodic box by a uniform flow.
#include <gtest/gtest.h>

#include <chrono>
#include <cmath>
#include <cstdio>
#include <string>
#include <vector>

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

// The loop's initial cell-centred B_x and B_y carried as passive density
// contrasts ρ = 1 + B_d in the same box, flow, scheme and time by brume's hydrodynamics: for a
// uniform flow ∂B/∂t = −(v·∇)B, each component is a passive scalar, so this is the decay the
// underlying scheme gives the same profiles. Returns Σ(ρ − 1)² at t = 2 over its initial value.
double passive_scalar_ratio(std::vector<std::string> overrides) {
  const ProblemRun mhd = start_problem("field_loop.yaml", overrides);
  overrides.push_back("gas.magnetized=false");
  overrides.push_back("scheme.riemann_solver=hllc");
  double initial = 0.0, final = 0.0;
  for (int d = 0; d < 2; ++d) {
    ProblemRun run = start_problem("field_loop.yaml", overrides);
    const solver::BlockGeometry& g = run.state.geometry;
    const auto v = run.config.reals3("problem.field_loop.velocity");
    const double p = run.config.real("problem.field_loop.pressure");
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = g.index(i, j, 0);
        const double rho = 1.0 + solver::cell_field(mhd.state, d, c);
        run.state.density[c] = rho;
        for (int a = 0; a < 3; ++a)
          run.state.momentum[std::size_t(a)][c] = rho * v[std::size_t(a)];
        run.state.energy[c] =
            p / (run.setup.gamma - 1.0) + 0.5 * rho * (v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
      }
    }
    auto contrast = [](const solver::State& s) {
      return interior_sum(
          s, [&](std::ptrdiff_t c) { return (s.density[c] - 1.0) * (s.density[c] - 1.0); });
    };
    initial += contrast(run.state);
    if (!advance_to(run, stop_time(run), 100)) return -1.0;
    final += contrast(run.state);
  }
  return final / initial;
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
  // nothing may create it, so ratio ≤ 1.
  EXPECT_LE(ratio, 1.0);
  // The CT update with the upwind edge EMF is built to dissipate the field as the underlying
  // scheme dissipates a passive scalar (Gardiner & Stone 2005, §3, from memory: the EMF reduces
  // to the 1D upwind flux). So the loop must keep what the same VL2 + PLM keeps of its B_x, B_y
  // profiles advected as scalars: measured 0.8451 (CT) against 0.8401 (scalar; an independent
  // numpy VL2 + PLM-MC upwind advection of the same profiles also gives 0.8401). Bound 0.02:
  // 4× the measured gap; the plain average of the four face EMFs, which lacks the upwind
  // dissipation, is off by 0.05 (0.890), as is any EMF that does not reduce to the 1D flux.
  const double scalar = passive_scalar_ratio({});
  std::printf("[field loop 128x64] passive-scalar reference %.5f\n", scalar);
  EXPECT_NEAR(ratio, scalar, 0.02);
  // The best this method gives at 128 x 64: VL2's first-order predictor and PLM-MC without
  // time-centred edge states lose 15 % at the small advective Courant number 0.14 (C = 0.4 of the
  // fast speed); GS05's CTU kept ≈ 90–95 % (from memory). 0.84 guards 0.8451 against regressions.
  EXPECT_GE(ratio, 0.84);
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

// "Within a few percent" of the initial magnetic energy after two crossings: VL2 + PLM-MC gets
// there at 512 x 256 (measured 0.9518; 0.917 at 256 x 128, 0.845 at 128 x 64). At 128 x 64 no
// bounded reconstruction inside VL2 reaches 0.95 (docs/validation.md: PPM 0.888 in brume; MP5
// and WENO-Z reach 0.91 in a passive-scalar study only by overshooting 13–15 %). Five percent is
// the reading of "a few" (common practice, no source). About 3 minutes: label slow.
TEST(Mhd2dFieldLoopSlow, WithinFivePercentAfterTwoCrossingsAt512x256) {
  ProblemRun run = start_problem("field_loop.yaml", {"box.cells=[512,256,1]"});
  const double initial = magnetic_energy(run.state);
  ASSERT_TRUE(advance_to(run, stop_time(run), 50));
  const double ratio = magnetic_energy(run.state) / initial;
  std::printf("[field loop 512x256] E_B(t=2)/E_B(0) = %.5f\n", ratio);
  EXPECT_LE(ratio, 1.0);
  EXPECT_GE(ratio, 0.95);
  EXPECT_LE(run.largest_divergence, 1e-12);
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
