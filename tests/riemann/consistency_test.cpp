// Consistency of every solver: flux(U, U) = F(U), with F the reference flux written from the
// conserved variables (common practice, no source: a consistent numerical flux reduces to the
// physical flux for equal states). And the B = 0 limits: the MHD variants of LLF and HLLE equal
// their hydro variants, and HLLD with B = 0 equals HLLC.
#include <gtest/gtest.h>

#include <random>

#include "solver/eos.hpp"
#include "solver/riemann/solvers.hpp"
#include "tests/riemann/face_test_support.hpp"

namespace brume::solver {
namespace {

using testing::fluxes_close;
using testing::random_state;
using testing::reference_flux;

// Round-off: each solver forms F from a few dozen operations on O(1..100) numbers; 1e-12 of the
// flux scale leaves a margin of ~100 ulp while any algebra error shows up at O(1).
constexpr double kRoundOff = 1e-12;
constexpr int kSamples = 2000;

template <class Tag, class Eos, bool Magnetic>
void check_consistency(const Eos& eos, unsigned seed) {
  std::mt19937_64 rng(seed);
  std::uniform_real_distribution<double> b(-3.0, 3.0);
  for (int i = 0; i < kSamples; ++i) {
    const FaceState s = random_state(rng, Magnetic);
    const double bn = Magnetic ? b(rng) : 0.0;
    const FaceFlux f = Tag::template flux<Eos, Magnetic>(s, s, bn, eos);
    ASSERT_TRUE(fluxes_close(f, reference_flux(s, bn, eos, Magnetic), kRoundOff)) << "sample " << i;
  }
}

const IdealGas kGas{1.4};
const IdealGas kGas53{5.0 / 3.0};
const Isothermal kIso{0.7};

TEST(RiemannConsistency, LlfEqualsPhysicalFluxForEqualStates) {
  check_consistency<Llf, IdealGas, false>(kGas, 1);
  check_consistency<Llf, IdealGas, true>(kGas53, 2);
  check_consistency<Llf, Isothermal, false>(kIso, 3);
  check_consistency<Llf, Isothermal, true>(kIso, 4);
}

TEST(RiemannConsistency, HlleEqualsPhysicalFluxForEqualStates) {
  check_consistency<Hlle, IdealGas, false>(kGas, 5);
  check_consistency<Hlle, IdealGas, true>(kGas53, 6);
  check_consistency<Hlle, Isothermal, false>(kIso, 7);
  check_consistency<Hlle, Isothermal, true>(kIso, 8);
}

TEST(RiemannConsistency, HllcEqualsPhysicalFluxForEqualStates) {
  check_consistency<Hllc, IdealGas, false>(kGas, 9);
  check_consistency<Hllc, Isothermal, false>(kIso, 10);
}

TEST(RiemannConsistency, HlldEqualsPhysicalFluxForEqualStates) {
  check_consistency<Hlld, IdealGas, true>(kGas53, 11);
  check_consistency<Hlld, Isothermal, true>(kIso, 12);
}

// Equal states with B along the normal and B_n² > γp: the fast and Alfvén waves coincide and the
// HLLD star denominator vanishes (Miyoshi & Kusano 2005, text after eqs. 44–47): the degenerate
// branch must still give F(U).
TEST(RiemannConsistency, HlldEqualStatesWithFieldAlongNormal) {
  const FaceState s{1.0, 0.3, -0.2, 0.1, 0.1, 0.0, 0.0};
  for (double bn : {2.0, -2.0, 0.5}) {
    EXPECT_TRUE(
        fluxes_close(hlld(s, s, bn, kGas53), reference_flux(s, bn, kGas53, true), kRoundOff));
    EXPECT_TRUE(fluxes_close(hlld(s, s, bn, kIso), reference_flux(s, bn, kIso, true), kRoundOff));
  }
}

// Random Riemann problems with B = 0 (common practice, no source): the fast speed reduces to
// the sound speed, so the MHD variant must reproduce the hydro variant to round-off.
template <class Tag, class Eos>
void check_zero_field_limit(const Eos& eos, unsigned seed) {
  std::mt19937_64 rng(seed);
  for (int i = 0; i < kSamples; ++i) {
    const FaceState l = random_state(rng, false), r = random_state(rng, false);
    ASSERT_TRUE(fluxes_close(Tag::template flux<Eos, true>(l, r, 0.0, eos),
                             Tag::template flux<Eos, false>(l, r, 0.0, eos), kRoundOff))
        << "sample " << i;
  }
}

TEST(RiemannConsistency, LlfAndHlleWithZeroFieldEqualHydroVariants) {
  check_zero_field_limit<Llf>(kGas, 21);
  check_zero_field_limit<Llf>(kIso, 22);
  check_zero_field_limit<Hlle>(kGas, 23);
  check_zero_field_limit<Hlle>(kIso, 24);
}

// HLLD with B = 0 reduces to HLLC (Miyoshi & Kusano 2005, §3, text after eq. 51, the claim; and
// Mignone 2007 for isothermal gas). Both use the outer speeds of MK05 eq. 67, so the fluxes agree
// to round-off (their energies are written differently, Toro 2009 eq. 10.39 vs MK05 eq. 48).
TEST(RiemannConsistency, HlldWithZeroFieldEqualsHllc) {
  std::mt19937_64 rng(31);
  for (int i = 0; i < kSamples; ++i) {
    const FaceState l = random_state(rng, false), r = random_state(rng, false);
    ASSERT_TRUE(fluxes_close(hlld(l, r, 0.0, kGas), hllc(l, r, 0.0, kGas), kRoundOff)) << i;
    ASSERT_TRUE(fluxes_close(hlld(l, r, 0.0, kIso), hllc(l, r, 0.0, kIso), kRoundOff)) << i;
  }
}

}  // namespace
}  // namespace brume::solver
