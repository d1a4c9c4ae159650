// Positivity of the intermediate states on strong rarefactions and strong shocks: every density
// and pressure inside the approximate Riemann fan must be positive, and so must a first-order
// update of the two cells next to the face at CFL 1/2. Data: Toro 2009, Table 4.1, test 2
// (1, −2, 0.4 | 1, 2, 0.4) and test 3 (1, 0, 1000 | 1, 0, 0.01), γ = 1.4 (from memory), plus a
// near-vacuum rarefaction (1, −3, 0.4 | 1, 3, 0.4; the vacuum limit is |Δu| = 2(c_L + c_R)/(γ−1)
// ≈ 7.5, Toro 2009 eq. 4.40). The property is that of Einfeldt et al. 1991, J. Comput. Phys. 92,
// 273 (positively conservative schemes).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <vector>

#include "solver/eos.hpp"
#include "solver/riemann/solvers.hpp"
#include "tests/riemann/face_test_support.hpp"

namespace brume::solver {
namespace {

struct Problem {
  const char* name;
  FaceState left, right;
  double bn;
};

const IdealGas kGas{1.4};

std::vector<Problem> problems(bool magnetic) {
  const double bt = magnetic ? 0.8 : 0.0, bn = magnetic ? 0.6 : 0.0;
  return {
      {"Toro test 2", {1.0, -2.0, 0.0, 0.0, 0.4, bt, 0.0}, {1.0, 2.0, 0.0, 0.0, 0.4, bt, 0.0}, bn},
      {"near vacuum", {1.0, -3.0, 0.0, 0.0, 0.4, bt, 0.0}, {1.0, 3.0, 0.0, 0.0, 0.4, bt, 0.0}, bn},
      {"Toro test 3",
       {1.0, 0.0, 0.0, 0.0, 1000.0, bt, 0.0},
       {1.0, 0.0, 0.0, 0.0, 0.01, bt, 0.0},
       bn},
      {"Toro test 3 mirrored",
       {1.0, 0.0, 0.0, 0.0, 0.01, -bt, 0.0},
       {1.0, 0.0, 0.0, 0.0, 1000.0, -bt, 0.0},
       bn}};
}

// p = (γ − 1)(E − m²/(2ρ) − B²/2) of a conserved state.
double pressure_of(const FaceConserved& u, double bn, const IdealGas& eos) {
  const double m2 = u.mn * u.mn + u.mt1 * u.mt1 + u.mt2 * u.mt2;
  const double b2 = bn * bn + u.bt1 * u.bt1 + u.bt2 * u.bt2;
  return (eos.gamma - 1.0) * (u.energy - 0.5 * m2 / u.density - 0.5 * b2);
}

void expect_positive(const FaceConserved& u, double bn, const char* what, const char* problem) {
  EXPECT_GT(u.density, 0.0) << what << ", " << problem;
  EXPECT_GT(pressure_of(u, bn, kGas), 0.0) << what << ", " << problem;
}

TEST(RiemannPositivity, HllcStarStates) {
  for (const Problem& p : problems(false)) {
    const auto ul = conserved<IdealGas, false>(p.left, 0.0, kGas);
    const auto ur = conserved<IdealGas, false>(p.right, 0.0, kGas);
    const auto fl = physical_flux<IdealGas, false>(p.left, 0.0, kGas);
    const auto fr = physical_flux<IdealGas, false>(p.right, 0.0, kGas);
    const HllcFan fan = hllc_fan(p.left, p.right, ul, ur, fl, fr, kGas);
    EXPECT_LT(fan.sl, fan.sm) << p.name;  // wave ordering of the fan
    EXPECT_LT(fan.sm, fan.sr) << p.name;
    expect_positive(fan.star_left, 0.0, "U*_L", p.name);
    expect_positive(fan.star_right, 0.0, "U*_R", p.name);
  }
}

TEST(RiemannPositivity, HlldIntermediateStates) {
  for (bool magnetic : {false, true}) {
    for (const Problem& p : problems(magnetic)) {
      const auto ul = conserved<IdealGas, true>(p.left, p.bn, kGas);
      const auto ur = conserved<IdealGas, true>(p.right, p.bn, kGas);
      const auto fl = physical_flux<IdealGas, true>(p.left, p.bn, kGas);
      const auto fr = physical_flux<IdealGas, true>(p.right, p.bn, kGas);
      const HlldFan f = hlld_fan(p.left, p.right, ul, ur, fl, fr, p.bn, kGas);
      EXPECT_LE(f.sl, f.sal) << p.name;  // wave ordering of the fan
      EXPECT_LE(f.sal, f.sm) << p.name;
      EXPECT_LE(f.sm, f.sar) << p.name;
      EXPECT_LE(f.sar, f.sr) << p.name;
      expect_positive(f.star_left, p.bn, "U*_L", p.name);
      expect_positive(f.dstar_left, p.bn, "U**_L", p.name);
      expect_positive(f.dstar_right, p.bn, "U**_R", p.name);
      expect_positive(f.star_right, p.bn, "U*_R", p.name);
    }
  }
}

TEST(RiemannPositivity, HllAverageStateOfHlleAndLlf) {
  for (bool magnetic : {false, true}) {
    for (const Problem& p : problems(magnetic)) {
      const auto ul = conserved<IdealGas, true>(p.left, p.bn, kGas);
      const auto ur = conserved<IdealGas, true>(p.right, p.bn, kGas);
      const auto fl = physical_flux<IdealGas, true>(p.left, p.bn, kGas);
      const auto fr = physical_flux<IdealGas, true>(p.right, p.bn, kGas);
      const double cl = fast_speed<IdealGas, true>(p.left, p.bn, kGas);
      const double cr = fast_speed<IdealGas, true>(p.right, p.bn, kGas);
      const OuterSpeeds s = davis_speeds(p.left.vn, cl, p.right.vn, cr);
      expect_positive(hll_state(ul, ur, fl, fr, s.left, s.right), p.bn, "HLLE U_hll", p.name);
      const double smax = std::max(std::abs(p.left.vn) + cl, std::abs(p.right.vn) + cr);
      expect_positive(hll_state(ul, ur, fl, fr, -smax, smax), p.bn, "LLF U_hll", p.name);
    }
  }
}

// U − λ (F_out − F_in), component by component.
FaceConserved updated(const FaceConserved& u, double lambda, const FaceFlux& out,
                      const FaceFlux& in) {
  return {u.density - lambda * (out.density - in.density),
          u.mn - lambda * (out.mn - in.mn),
          u.mt1 - lambda * (out.mt1 - in.mt1),
          u.mt2 - lambda * (out.mt2 - in.mt2),
          u.energy - lambda * (out.energy - in.energy),
          u.bt1 - lambda * (out.bt1 - in.bt1),
          u.bt2 - lambda * (out.bt2 - in.bt2)};
}

// One first-order step of the two cells next to the face, with uniform outer neighbours (whose
// faces carry F(U_L) and F(U_R)), at λ = Δt/Δx = ½ / max signal speed.
template <class Tag, bool Magnetic>
void check_update(const char* solver) {
  for (const Problem& p : problems(Magnetic)) {
    const auto ul = conserved<IdealGas, Magnetic>(p.left, p.bn, kGas);
    const auto ur = conserved<IdealGas, Magnetic>(p.right, p.bn, kGas);
    const auto fl = physical_flux<IdealGas, Magnetic>(p.left, p.bn, kGas);
    const auto fr = physical_flux<IdealGas, Magnetic>(p.right, p.bn, kGas);
    const double smax =
        std::max(std::abs(p.left.vn) + fast_speed<IdealGas, Magnetic>(p.left, p.bn, kGas),
                 std::abs(p.right.vn) + fast_speed<IdealGas, Magnetic>(p.right, p.bn, kGas));
    const double lambda = 0.5 / smax;
    const FaceFlux f = Tag::template flux<IdealGas, Magnetic>(p.left, p.right, p.bn, kGas);
    const double bn = Magnetic ? p.bn : 0.0;
    expect_positive(updated(ul, lambda, f, fl), bn, solver, p.name);
    expect_positive(updated(ur, lambda, fr, f), bn, solver, p.name);
  }
}

TEST(RiemannPositivity, FirstOrderUpdateAtHalfCfl) {
  check_update<Llf, false>("LLF hydro");
  check_update<Llf, true>("LLF MHD");
  check_update<Hlle, false>("HLLE hydro");
  check_update<Hlle, true>("HLLE MHD");
  check_update<Hllc, false>("HLLC");
  check_update<Hlld, true>("HLLD");
}

}  // namespace
}  // namespace brume::solver
