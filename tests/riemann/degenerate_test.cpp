// HLLD in its degenerate limits (Miyoshi & Kusano 2005, J. Comput. Phys. 208, 315, text after
// eqs. 44–47 and after eq. 51): B_n → 0 (the Alfvén waves merge with the contact) and B_t = 0
// with B_n² ≥ γp (fast and Alfvén waves coincide, the star denominator vanishes). The flux must
// stay finite and depend continuously on the data.
#include <gtest/gtest.h>

#include <random>

#include "solver/eos.hpp"
#include "solver/riemann/solvers.hpp"
#include "tests/riemann/face_test_support.hpp"

namespace brume::solver {
namespace {

using testing::all_finite;
using testing::fluxes_close;
using testing::random_state;

const IdealGas kGas53{5.0 / 3.0};
const Isothermal kIso{1.0};

// B_n = 1e-10 vs 0: the double-star region has width O(B_n) and the star jumps are O(B_n), so
// the fluxes differ by O(1e-10) of the flux scale; 1e-8 leaves two decades of margin while a
// jump discontinuity at B_n = 0 would show up at O(1).
template <class Eos>
void check_vanishing_normal_field(const Eos& eos, unsigned seed) {
  std::mt19937_64 rng(seed);
  for (int i = 0; i < 1000; ++i) {
    const FaceState l = random_state(rng, true), r = random_state(rng, true);
    const FaceFlux f0 = hlld(l, r, 0.0, eos);
    ASSERT_TRUE(all_finite(f0));
    for (double bn : {1e-10, -1e-10}) {
      ASSERT_TRUE(fluxes_close(hlld(l, r, bn, eos), f0, 1e-8)) << "sample " << i << ", bn " << bn;
    }
  }
}

TEST(RiemannDegenerate, HlldContinuousAsNormalFieldVanishes) {
  check_vanishing_normal_field(kGas53, 1);
  check_vanishing_normal_field(kIso, 2);
}

// Field along the normal, B_n² = 4 > γp = 1/6, B_t = 0, and a hydro-like jump in ρ and p.
// With B_t = 0 on both sides the exact solution keeps B_t = v_t = 0 (tangential components obey
// homogeneous linear jump conditions), so F_mt and F_Bt must vanish; the rest must be finite.
// A tiny B_t = 1e-9 must give nearly the same flux: the degenerate branch is entered for
// |D| ≤ 1e-8 of its terms, leaving O(1e-9 .. 1e-5) differences; 1e-4 of the flux scale is
// the bound (a NaN or an O(1) jump fails it).
template <class Eos>
void check_field_along_normal(const Eos& eos) {
  for (double bn : {2.0, -2.0}) {
    const FaceState l{1.0, 0.1, 0.0, 0.0, 0.1, 0.0, 0.0};
    const FaceState r{0.3, -0.2, 0.0, 0.0, 0.02, 0.0, 0.0};
    const FaceFlux f = hlld(l, r, bn, eos);
    ASSERT_TRUE(all_finite(f));
    EXPECT_EQ(f.mt1, 0.0);
    EXPECT_EQ(f.mt2, 0.0);
    EXPECT_EQ(f.bt1, 0.0);
    EXPECT_EQ(f.bt2, 0.0);
    FaceState lt = l, rt = r;
    lt.bt1 = 1e-9;
    rt.bt2 = -1e-9;
    const FaceFlux ft = hlld(lt, rt, bn, eos);
    ASSERT_TRUE(all_finite(ft));
    EXPECT_TRUE(fluxes_close(ft, f, 1e-4)) << "bn = " << bn;
  }
}

TEST(RiemannDegenerate, HlldFieldAlongNormalStaysFinite) {
  check_field_along_normal(kGas53);
  check_field_along_normal(kIso);
}

}  // namespace
}  // namespace brume::solver
