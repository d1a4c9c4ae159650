// The linear-wave problem's eigenmodes (problems/linear_wave_eigenmode.hpp: Jacobian of the
// primitive-variable system, written by hand) against the test-side reference eigen-system
// (tests/reference/mhd_eigen.hpp: complex-step Jacobian of the conserved flux): two independent
// computations of the same right eigenvectors and speeds.

#include <gtest/gtest.h>

#include <cmath>
#include <stdexcept>
#include <string>

#include "problems/linear_wave_eigenmode.hpp"
#include "tests/reference/mhd_eigen.hpp"

namespace brume::verification {
namespace {

using problems::WaveFamily;
namespace ref = reference;

struct Gas {
  const char* label;
  problems::WaveGas gas;
};

// The linear-wave state of Gardiner & Stone 2008, J. Comput. Phys. 227, 4123, §8.1 (from memory)
// and a moving oblique state with no symmetry.
const problems::WaveBackground kStill{1.0, {0.0, 0.0, 0.0}, 0.6, {1.0, std::sqrt(2.0), 0.5}};
const problems::WaveBackground kMoving{1.7, {0.3, -0.4, 0.25}, 0.9, {-0.8, 0.6, 1.1}};

ref::Primitive as_reference(const problems::WaveBackground& w) {
  return {w.density,  w.velocity[0], w.velocity[1], w.velocity[2],
          w.pressure, w.field[0],    w.field[1],    w.field[2]};
}

ref::WaveSystem as_reference(const problems::WaveGas& g) {
  return {g.magnetic, g.isothermal, g.gamma, g.sound_speed};
}

ref::Family reference_family(WaveFamily f, int direction) {
  const bool plus = direction > 0;
  switch (f) {
    case WaveFamily::fast:
      return plus ? ref::Family::FastPlus : ref::Family::FastMinus;
    case WaveFamily::alfven:
      return plus ? ref::Family::AlfvenPlus : ref::Family::AlfvenMinus;
    case WaveFamily::slow:
      return plus ? ref::Family::SlowPlus : ref::Family::SlowMinus;
    case WaveFamily::entropy:
      return ref::Family::Entropy;
  }
  return ref::Family::Entropy;
}

void expect_same_mode(const problems::WaveGas& gas, const problems::WaveBackground& w, WaveFamily f,
                      int direction, const std::string& label) {
  const problems::Eigenmode mode = problems::linear_eigenmode(gas, w, f, direction);
  const ref::WaveSystem sys = as_reference(gas);
  const ref::Primitive rw = as_reference(w);
  const Eigen::VectorXd r = ref::right_eigenvector(sys, rw, reference_family(f, direction));
  ASSERT_EQ(static_cast<Eigen::Index>(mode.conserved.size()), r.size()) << label;
  // Both vectors have unit norm and the same sign rule, so they agree component by component.
  // 1e-9: both come from dense 7 × 7 eigen-solves of well-separated eigenvalues (gaps ≥ 0.1),
  // whose eigenvectors are accurate to ~1e-13 (common practice, no source); the margin covers
  // the complex-step Jacobian (exact to round-off; Squire & Trapp 1998, SIAM Rev. 40, 110).
  for (Eigen::Index i = 0; i < r.size(); ++i) {
    EXPECT_NEAR(mode.conserved[static_cast<std::size_t>(i)], r(i), 1e-9) << label << " #" << i;
  }
  // The speed is the textbook one (Goedbloed & Poedts 2004, §5.2; from memory), as the
  // reference computes it.
  EXPECT_NEAR(mode.speed, ref::family_speed(sys, rw, reference_family(f, direction)), 1e-10)
      << label;
}

TEST(WaveEigenmode, MatchesTheReferenceEigenSystem) {
  const Gas gases[] = {{"adiabatic MHD", {true, false, 5.0 / 3.0, 1.0}},
                       {"isothermal MHD", {true, true, 5.0 / 3.0, 0.9}}};
  for (const Gas& g : gases) {
    for (const auto* w : {&kStill, &kMoving}) {
      for (WaveFamily f :
           {WaveFamily::fast, WaveFamily::alfven, WaveFamily::slow, WaveFamily::entropy}) {
        if (f == WaveFamily::entropy && g.gas.isothermal) continue;
        for (int direction : {1, -1}) {
          expect_same_mode(g.gas, *w, f, direction,
                           std::string(g.label) + (w == &kStill ? " still " : " moving ") +
                               std::to_string(static_cast<int>(f)) + " " +
                               std::to_string(direction));
        }
      }
    }
  }
}

// Hydrodynamics: the sound waves match the reference; the entropy wave is degenerate with the
// shear waves and is the pure density wave, as the reference chooses it.
TEST(WaveEigenmode, HydrodynamicsSoundAndEntropyWaves) {
  const problems::WaveGas hydro{false, false, 1.4, 1.0};
  const problems::WaveBackground w{1.3, {0.2, 0.0, 0.0}, 0.8, {0.0, 0.0, 0.0}};
  expect_same_mode(hydro, w, WaveFamily::fast, 1, "hydro sound +");
  expect_same_mode(hydro, w, WaveFamily::fast, -1, "hydro sound -");
  expect_same_mode(hydro, w, WaveFamily::entropy, 1, "hydro entropy");
}

// Families that do not exist, or whose eigenvector is not unique, are refused, not guessed: with
// B ∥ k and c_s = c_a the slow, Alfvén and fast waves share one speed (degenerate);
// without a field there is no Alfvén wave; isothermal gas has no entropy wave (common practice,
// no source).
TEST(WaveEigenmode, RefusesMissingOrDegenerateFamilies) {
  const problems::WaveGas mhd{true, false, 5.0 / 3.0, 1.0};
  const problems::WaveBackground parallel{1.0, {0.0, 0.0, 0.0}, 0.6, {1.0, 0.0, 0.0}};
  // c_s² = γp/ρ = 1 = c_a²: slow, Alfvén and fast speeds all coincide.
  EXPECT_THROW((void)problems::linear_eigenmode(mhd, parallel, WaveFamily::alfven, 1),
               std::invalid_argument);
  EXPECT_THROW(
      (void)problems::linear_eigenmode({false, false, 1.4, 1.0}, parallel, WaveFamily::alfven, 1),
      std::invalid_argument);
  EXPECT_THROW(
      (void)problems::linear_eigenmode({true, true, 1.4, 1.0}, kStill, WaveFamily::entropy, 1),
      std::invalid_argument);
}

}  // namespace
}  // namespace brume::verification
