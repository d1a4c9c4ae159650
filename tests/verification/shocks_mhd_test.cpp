// The MHD shock tubes of Brio & Wu 1988 (J. Comput. Phys. 75, 400, §4 and Fig. 2; γ = 2) and of
// Ryu & Jones 1995 test 2a (ApJ 442, 228, Fig. 2a; γ = 5/3) by self-convergence: coarse brume
// runs against a 4096-cell brume run of the same preset (PLM with MC, HLLD, CT, CFL 0.4).
#include <gtest/gtest.h>

#include <cstdio>

#include "tests/verification/shocks_reference_runs.hpp"
#include "tests/verification/shocks_wave_finder.hpp"

namespace brume::shocks {
namespace {

struct MhdCase {
  const char* preset;
  // The waves from left to right (see shocks_wave_finder.hpp for the criteria):
  // Brio & Wu 1988 §4: fast rarefaction, slow compound wave (an intermediate shock across which
  // B_t reverses, with a slow rarefaction attached behind it), contact, slow shock, fast
  // rarefaction. Ryu & Jones 1995 §4, Fig. 2a: fast shock, rotational discontinuity, slow shock
  // on each side of the contact.
  const char* waves;
  // The waves found at 1024 cells, and the steepness threshold there: Brio & Wu's fast
  // rarefaction changes p by ≈ 3–5 % of the range across a window of 7 cells (measured), so it
  // takes 8 % to keep it from passing for a shock; Ryu & Jones' weak slow shocks need 4 %.
  const char* coarse_waves;
  double coarse_steep;
};

class MhdTube : public ::testing::TestWithParam<MhdCase> {};

// Every wave is found, in order, and 1024 cells place each within 3 cells of the reference.
TEST_P(MhdTube, EveryWaveAtItsPlace) {
  const MhdCase& mc = GetParam();
  const TubeRun& fine = reference_run(mc.preset);
  ASSERT_FALSE(fine.failed);
  // Windows of 2h+1 cells: h = 6 at 4096 and 3 at 1024 cover a shock smeared over ~4 cells and a
  // contact smeared over ~10, while a rarefaction changes by < 4 % of the range across them (at
  // 512 cells Brio & Wu's fast rarefaction would pass for a shock): common practice, no source.
  FinderSettings reference_settings;
  reference_settings.half_window = 6;
  reference_settings.merge = 12;
  const auto reference_waves = find_waves(profile(fine), reference_settings);
  for (const Wave& w : reference_waves)
    std::printf("%s reference %s at %.4f\n", mc.preset, wave_name(w.kind), w.position);
  ASSERT_EQ(wave_sequence(reference_waves), mc.waves);

  const TubeRun coarse = run_preset(mc.preset, cells_along_x(1024));
  ASSERT_FALSE(coarse.failed);
  FinderSettings coarse_settings;
  coarse_settings.steep = mc.coarse_steep;
  const auto coarse_waves = find_waves(profile(coarse), coarse_settings);
  ASSERT_EQ(wave_sequence(coarse_waves), mc.coarse_waves);
  const double dx = coarse.state.geometry.spacing[0];
  // Each coarse wave against the next reference wave of its kind (skipping only those the
  // coarse list leaves out by design).
  std::size_t r = 0;
  for (const Wave& w : coarse_waves) {
    while (r < reference_waves.size() && reference_waves[r].kind != w.kind)
      ++r;
    ASSERT_LT(r, reference_waves.size());
    const double shift = w.position - reference_waves[r].position;
    std::printf("%s 1024 cells %s at %.4f (%+.2f cells)\n", mc.preset, wave_name(w.kind),
                w.position, shift / dx);
    // A few cells: the smeared profiles of the two resolutions differ in shape, not in place.
    EXPECT_LT(std::fabs(shift), 3 * dx) << wave_name(w.kind);
    ++r;
  }
}

TEST_P(MhdTube, L1ErrorFallsWithResolutionAndDivergenceStaysAtRoundOff) {
  const MhdCase& mc = GetParam();
  const TubeRun& fine = reference_run(mc.preset);
  ASSERT_FALSE(fine.failed);
  const Profile reference = profile(fine);
  std::printf("%s reference: %d cells, %ld steps, %.2f s, max div %.2g\n", mc.preset,
              reference_cells, fine.steps, fine.seconds, fine.max_divergence);
  // Round-off: the initial field is a discrete curl and CT keeps it one (Evans & Hawley 1988).
  EXPECT_LE(fine.max_divergence, 1e-12);
  std::vector<L1Errors> errors;
  for (const int n : {128, 256, 512}) {
    const TubeRun run = run_preset(mc.preset, cells_along_x(n));
    ASSERT_FALSE(run.failed);
    EXPECT_LE(run.max_divergence, 1e-12);
    errors.push_back(l1_difference(profile(run), coarsened(reference, n)));
    std::printf("%s n=%d L1 rho %.4g v %.4g B %.4g (%ld steps, %.3f s, max div %.2g)\n", mc.preset,
                n, errors.back().density, errors.back().velocity, errors.back().field, run.steps,
                run.seconds, run.max_divergence);
  }
  // Discontinuities bound L1 convergence to first order (common practice, no source); a fall by
  // ≥ 1.3 per doubling leaves room for the reference's own error (8× finer than 512 cells).
  for (std::size_t r = 1; r < errors.size(); ++r) {
    EXPECT_GT(errors[r - 1].density / errors[r].density, 1.3);
    EXPECT_GT(errors[r - 1].velocity / errors[r].velocity, 1.3);
    EXPECT_GT(errors[r - 1].field / errors[r].field, 1.3);
  }
}

INSTANTIATE_TEST_SUITE_P(
    Published, MhdTube,
    ::testing::Values(MhdCase{"brio_wu", "FR IS SR C SS FR", "FR IS SR C SS FR", 0.08},
                      MhdCase{"ryu_jones_2a", "FS RD SS C SS RD FS", "FS RD SS C SS RD FS", 0.04}),
    [](const auto& test) { return std::string(test.param.preset); });

}  // namespace
}  // namespace brume::shocks
