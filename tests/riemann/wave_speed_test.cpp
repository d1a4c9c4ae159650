// The solver's signal speeds against the textbook formulas of the reference code
// (tests/reference/mhd_eigen.hpp, whose speeds are in turn checked against the eigenvalues of
// the flux Jacobian), and the outer estimates against the characteristic speeds they must bound.
#include <gtest/gtest.h>

#include <algorithm>
#include <random>

#include "solver/eos.hpp"
#include "solver/riemann/wave_speeds.hpp"
#include "tests/reference/mhd_eigen.hpp"
#include "tests/riemann/face_test_support.hpp"

namespace brume::solver {
namespace {

using testing::random_state;
using testing::system_of;

// Round-off: a square root of a sum of O(10..100) terms; 1e-12 relative.
constexpr double kRoundOff = 1e-12;

template <class Eos, bool Magnetic>
void check_fast_speed(const Eos& eos, unsigned seed) {
  std::mt19937_64 rng(seed);
  std::uniform_real_distribution<double> b(-3.0, 3.0);
  for (int i = 0; i < 2000; ++i) {
    const FaceState s = random_state(rng, Magnetic);
    const double bn = Magnetic ? b(rng) : 0.0;
    const reference::Primitive w{s.density, s.vn, s.vt1, s.vt2, s.pressure, bn, s.bt1, s.bt2};
    const reference::TextbookSpeeds c = reference::textbook_speeds(system_of(eos, Magnetic), w);
    ASSERT_NEAR((fast_speed<Eos, Magnetic>(s, bn, eos)), c.fast, kRoundOff * c.fast)
        << "sample " << i;
  }
}

// c_f from the textbook formula (common practice; Goedbloed & Poedts 2004 §5.2, from memory).
TEST(RiemannWaveSpeeds, FastSpeedMatchesTextbook) {
  check_fast_speed<IdealGas, false>(IdealGas{1.4}, 1);
  check_fast_speed<IdealGas, true>(IdealGas{5.0 / 3.0}, 2);
  check_fast_speed<Isothermal, false>(Isothermal{0.6}, 3);
  check_fast_speed<Isothermal, true>(Isothermal{0.6}, 4);
}

// Both estimates bound the fastest characteristics of both states (Davis 1988; Miyoshi &
// Kusano 2005 eq. 67) — the property the HLL family needs (Einfeldt 1988 §2, the claim).
TEST(RiemannWaveSpeeds, OuterEstimatesBoundCharacteristicSpeeds) {
  const IdealGas eos{5.0 / 3.0};
  std::mt19937_64 rng(5);
  std::uniform_real_distribution<double> b(-3.0, 3.0);
  for (int i = 0; i < 2000; ++i) {
    const FaceState l = random_state(rng, true), r = random_state(rng, true);
    const double bn = b(rng);
    const double cl = fast_speed<IdealGas, true>(l, bn, eos);
    const double cr = fast_speed<IdealGas, true>(r, bn, eos);
    const double lo = std::min(l.vn - cl, r.vn - cr), hi = std::max(l.vn + cl, r.vn + cr);
    for (const OuterSpeeds s :
         {davis_speeds(l.vn, cl, r.vn, cr), miyoshi_kusano_speeds(l.vn, cl, r.vn, cr)}) {
      ASSERT_LE(s.left, lo);
      ASSERT_GE(s.right, hi);
    }
  }
}

}  // namespace
}  // namespace brume::solver
