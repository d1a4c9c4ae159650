// Convergence of linear MHD waves of every family along the diagonal of 2D and 3D periodic boxes
// (the linear-wave test of Gardiner & Stone 2008, J. Comput. Phys. 227, 4123, §8.1, and Stone et
// al. 2008, ApJS 178, 137, §8.1; from memory), PLM + HLLD, adiabatic and isothermal.
#include <gtest/gtest.h>

#include <cctype>
#include <cstdio>
#include <string>
#include <vector>

#include "tests/verification/waves_linear_run.hpp"

namespace brume::verification {
namespace {

struct WaveCase {
  const char* label;
  int dimensions;
  std::vector<std::string> settings;  // --set style overrides of problems/linear_wave.yaml
  std::vector<int> resolutions;       // cells along the long side, coarsest first
};

void PrintTo(const WaveCase& c, std::ostream* os) {
  *os << c.label;
}

// Test names from the labels: "2D fast forward" → "2D_fast_forward".
std::string case_name(const ::testing::TestParamInfo<WaveCase>& info) {
  std::string name = info.param.label;
  for (char& ch : name) {
    if (!std::isalnum(static_cast<unsigned char>(ch))) ch = '_';
  }
  return name;
}

std::vector<std::string> family(const std::string& name, const std::string& direction) {
  return {"problem.linear_wave.family=" + name, "problem.linear_wave.direction=" + direction};
}

std::vector<std::string> isothermal(std::vector<std::string> s) {
  // c_s = 1 with B = (1, √2, ½) gives slow, Alfvén and fast speeds ½, 1 and 2 (the same as the
  // adiabatic state): c_f,s² = ½[c_s² + B²/ρ ± √((c_s² + B²/ρ)² − 4 c_s² B_x²/ρ)] (common
  // practice, no source).
  s.push_back("gas.equation_of_state=isothermal");
  s.push_back("gas.sound_speed=1");
  return s;
}

std::vector<std::string> entropy() {
  // The entropy wave stands still in the gas: a flow of 1 along k carries it once around.
  return {"problem.linear_wave.family=entropy", "problem.linear_wave.flow_speed=1"};
}

void check_convergence(const WaveCase& c) {
  std::vector<WaveRunResult> runs;
  for (int n : c.resolutions) {
    runs.push_back(
        run_wave_period("linear_wave.yaml", c.dimensions, n, c.settings, linear_wave_period));
    const WaveRunResult& r = runs.back();
    std::printf("[%s] N = %4d  L1 error %.4e  steps %5ld  |div B| dx/|B| %.2e  %.2f s\n", c.label,
                n, r.error, r.steps, r.divergence, r.seconds);
    ASSERT_TRUE(r.ok) << c.label << " failed at N = " << n;
    // CT keeps the discrete divergence at round-off; 1e-12 leaves room for the growth of
    // round-off over ~10³ steps (brief; common practice, no source).
    EXPECT_LE(r.divergence, 1e-12) << c.label << " N = " << n;
  }
  for (std::size_t i = 1; i < runs.size(); ++i) {
    EXPECT_LT(runs[i].error, runs[i - 1].error) << c.label << ": error must fall with resolution";
  }
  const double order = convergence_order(runs[runs.size() - 2].error, runs[runs.size() - 1].error);
  std::printf("[%s] order between the two finest: %.3f\n", c.label, order);
  // Second-order scheme: order ≥ 1.9 between the two finest grids (Gardiner & Stone 2008, §8.1,
  // find close to 2 for every family; from memory). 0.1 below 2 allows for the slope limiter's
  // clipping of the extrema, which still costs a little at these modest resolutions.
  EXPECT_GE(order, 1.9) << c.label;
  // The error after a period is a small fraction of the wave itself (amplitude 1e-6 of a unit
  // eigenvector; the mean |sin| is 2/π): below 10 % on the finest grid, which a scheme that lost
  // or displaced the wave (error ~ 1e-6) fails (common practice, no source).
  EXPECT_LT(runs.back().error, 0.1 * 1e-6 * 0.64) << c.label;
}

class LinearWave : public ::testing::TestWithParam<WaveCase> {};

TEST_P(LinearWave, ConvergesAtSecondOrderAfterOnePeriod) {
  check_convergence(GetParam());
}

// The adiabatic slow wave reaches order 1.9 one doubling later than the others (measured 1.88
// between 64 and 128 cells), so it runs on 64, 128 and 256 cells.
INSTANTIATE_TEST_SUITE_P(
    Oblique2D, LinearWave,
    ::testing::Values(
        WaveCase{"2D fast forward", 2, family("fast", "forward"), {32, 64, 128}},
        WaveCase{"2D fast backward", 2, family("fast", "backward"), {32, 64, 128}},
        WaveCase{"2D Alfven forward", 2, family("alfven", "forward"), {32, 64, 128}},
        WaveCase{"2D Alfven backward", 2, family("alfven", "backward"), {32, 64, 128}},
        WaveCase{"2D slow forward", 2, family("slow", "forward"), {64, 128, 256}},
        WaveCase{"2D slow backward", 2, family("slow", "backward"), {64, 128, 256}},
        WaveCase{"2D entropy", 2, entropy(), {32, 64, 128}},
        WaveCase{"2D isothermal fast", 2, isothermal(family("fast", "forward")), {32, 64, 128}},
        WaveCase{
            "2D isothermal Alfven", 2, isothermal(family("alfven", "backward")), {32, 64, 128}},
        WaveCase{"2D isothermal slow", 2, isothermal(family("slow", "forward")), {32, 64, 128}}),
    case_name);

// 3D grids of N × N/2 × N/2 cells hold N/3 cells per wavelength (2D: N/√5), so the default suite
// stops at 21 cells per wavelength, where the fast and Alfvén waves are already in the
// second-order range (measured 2.4 and 2.8); the slow and entropy waves need one more doubling
// (measured 1.90 and 1.69 between 32 and 64) and run in the slow suite.
INSTANTIATE_TEST_SUITE_P(
    Oblique3D, LinearWave,
    ::testing::Values(
        WaveCase{"3D fast forward", 3, family("fast", "forward"), {16, 32, 64}},
        WaveCase{"3D Alfven backward", 3, family("alfven", "backward"), {16, 32, 64}},
        WaveCase{"3D isothermal fast", 3, isothermal(family("fast", "backward")), {16, 32, 64}}),
    case_name);

class LinearWaveSlow : public LinearWave {};

TEST_P(LinearWaveSlow, ConvergesAtSecondOrderAfterOnePeriod) {
  check_convergence(GetParam());
}

INSTANTIATE_TEST_SUITE_P(
    Oblique3D, LinearWaveSlow,
    ::testing::Values(WaveCase{"3D slow forward", 3, family("slow", "forward"), {32, 64, 128}},
                      WaveCase{"3D entropy", 3, entropy(), {32, 64, 128}}),
    case_name);

}  // namespace
}  // namespace brume::verification
