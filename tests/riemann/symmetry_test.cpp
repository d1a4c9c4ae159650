// Symmetries of the 1D equations that every flux must inherit (common practice, no source):
//  mirror x → −x: swap sides, v_n → −v_n, B_n → −B_n; then F_ρ, F_mt, F_E, F_Bt change sign
//    and F_mn does not;
//  field reversal B → −B: only F_Bt changes sign;
//  rotation of the tangential frame by an angle: tangential flux components rotate alike.
#include <gtest/gtest.h>

#include <cmath>
#include <random>

#include "solver/eos.hpp"
#include "solver/riemann/solvers.hpp"
#include "tests/riemann/face_test_support.hpp"

namespace brume::solver {
namespace {

using testing::fluxes_close;
using testing::random_state;

// Round-off margin, as in consistency_test.cpp. The mirrored problem evaluates the same
// formulas in another order (HLLD chains from the other side), so equality is to round-off.
constexpr double kRoundOff = 1e-11;
constexpr int kSamples = 1000;

FaceState mirror(const FaceState& s) {
  FaceState m = s;
  m.vn = -s.vn;
  return m;
}

FaceState reverse_field(const FaceState& s) {
  FaceState m = s;
  m.bt1 = -s.bt1;
  m.bt2 = -s.bt2;
  return m;
}

FaceState rotate(const FaceState& s, double c, double sn) {
  FaceState m = s;
  m.vt1 = c * s.vt1 - sn * s.vt2;
  m.vt2 = sn * s.vt1 + c * s.vt2;
  m.bt1 = c * s.bt1 - sn * s.bt2;
  m.bt2 = sn * s.bt1 + c * s.bt2;
  return m;
}

template <class Tag, class Eos, bool Magnetic>
void check_symmetries(const Eos& eos, unsigned seed) {
  std::mt19937_64 rng(seed);
  std::uniform_real_distribution<double> b(-3.0, 3.0), angle(0.0, 6.283185307179586);
  for (int i = 0; i < kSamples; ++i) {
    const FaceState l = random_state(rng, Magnetic), r = random_state(rng, Magnetic);
    const double bn = Magnetic ? b(rng) : 0.0;
    const FaceFlux f = Tag::template flux<Eos, Magnetic>(l, r, bn, eos);

    const FaceFlux m = Tag::template flux<Eos, Magnetic>(mirror(r), mirror(l), -bn, eos);
    ASSERT_TRUE(
        fluxes_close(m, {-f.density, f.mn, -f.mt1, -f.mt2, -f.energy, -f.bt1, -f.bt2}, kRoundOff))
        << "mirror, sample " << i;

    if constexpr (Magnetic) {
      const FaceFlux rev =
          Tag::template flux<Eos, Magnetic>(reverse_field(l), reverse_field(r), -bn, eos);
      ASSERT_TRUE(
          fluxes_close(rev, {f.density, f.mn, f.mt1, f.mt2, f.energy, -f.bt1, -f.bt2}, kRoundOff))
          << "field reversal, sample " << i;
    }

    const double a = angle(rng), c = std::cos(a), sn = std::sin(a);
    const FaceFlux rot =
        Tag::template flux<Eos, Magnetic>(rotate(l, c, sn), rotate(r, c, sn), bn, eos);
    ASSERT_TRUE(fluxes_close(rot,
                             {f.density, f.mn, c * f.mt1 - sn * f.mt2, sn * f.mt1 + c * f.mt2,
                              f.energy, c * f.bt1 - sn * f.bt2, sn * f.bt1 + c * f.bt2},
                             kRoundOff))
        << "rotation, sample " << i;
  }
}

const IdealGas kGas{1.4};
const IdealGas kGas53{5.0 / 3.0};
const Isothermal kIso{1.1};

TEST(RiemannSymmetry, Llf) {
  check_symmetries<Llf, IdealGas, false>(kGas, 1);
  check_symmetries<Llf, IdealGas, true>(kGas53, 2);
  check_symmetries<Llf, Isothermal, false>(kIso, 3);
  check_symmetries<Llf, Isothermal, true>(kIso, 4);
}

TEST(RiemannSymmetry, Hlle) {
  check_symmetries<Hlle, IdealGas, false>(kGas, 5);
  check_symmetries<Hlle, IdealGas, true>(kGas53, 6);
  check_symmetries<Hlle, Isothermal, false>(kIso, 7);
  check_symmetries<Hlle, Isothermal, true>(kIso, 8);
}

TEST(RiemannSymmetry, Hllc) {
  check_symmetries<Hllc, IdealGas, false>(kGas, 9);
  check_symmetries<Hllc, Isothermal, false>(kIso, 10);
}

TEST(RiemannSymmetry, Hlld) {
  check_symmetries<Hlld, IdealGas, true>(kGas53, 11);
  check_symmetries<Hlld, Isothermal, true>(kIso, 12);
}

}  // namespace
}  // namespace brume::solver
