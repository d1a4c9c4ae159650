// Isolated linearly degenerate discontinuities. HLLC resolves contacts exactly (Toro, Spruce &
// Speares 1994, Shock Waves 4, 25, the claim; Toro 2009 §10.4); HLLD resolves isolated contact,
// tangential and rotational discontinuities exactly (Miyoshi & Kusano 2005, J. Comput. Phys.
// 208, 315, abstract and §5, the claim; from memory). "Exactly" means the flux equals the
// physical flux of the state at x/t = 0 of the exact solution, to round-off.
#include <gtest/gtest.h>

#include <cmath>

#include "solver/eos.hpp"
#include "solver/riemann/solvers.hpp"
#include "tests/riemann/face_test_support.hpp"

namespace brume::solver {
namespace {

using testing::fluxes_close;
using testing::reference_flux;

// Round-off margin (see consistency_test.cpp); the states here are O(1).
constexpr double kRoundOff = 1e-12;

const IdealGas kGas{1.4};
const IdealGas kGas53{5.0 / 3.0};
const Isothermal kIso{0.8};

// Hydro contact: ρ and v_t jump, v_n and p continuous. At rest the exact flux is (0, p, 0, ...).
TEST(RiemannDiscontinuity, HllcResolvesStationaryContact) {
  const FaceState l{1.0, 0.0, 0.3, -0.2, 1.0, 0.0, 0.0};
  const FaceState r{0.125, 0.0, -0.5, 0.7, 1.0, 0.0, 0.0};
  const FaceFlux f = hllc(l, r, 0.0, kGas);
  EXPECT_TRUE(fluxes_close(f, {0.0, 1.0, 0.0, 0.0, 0.0, 0.0, 0.0}, kRoundOff));
}

// Moving contact: the exact solution at x/t = 0 is the upwind state.
TEST(RiemannDiscontinuity, HllcResolvesMovingContact) {
  for (double u : {0.4, -0.4}) {
    const FaceState l{1.0, u, 0.3, -0.2, 1.0, 0.0, 0.0};
    const FaceState r{0.125, u, -0.5, 0.7, 1.0, 0.0, 0.0};
    const FaceState& upwind = u > 0.0 ? l : r;
    EXPECT_TRUE(
        fluxes_close(hllc(l, r, 0.0, kGas), reference_flux(upwind, 0.0, kGas, false), kRoundOff))
        << "u = " << u;
  }
}

// Isothermal hydro: the only contact is the shear wave (v_t jumps, ρ and v_n continuous).
TEST(RiemannDiscontinuity, IsothermalHllcResolvesShearWave) {
  for (double u : {0.0, 0.3, -0.3}) {
    const FaceState l{1.3, u, 1.0, 0.0, 0.0, 0.0, 0.0};
    const FaceState r{1.3, u, -1.0, 2.0, 0.0, 0.0, 0.0};
    const FaceState& upwind = u >= 0.0 ? l : r;
    EXPECT_TRUE(
        fluxes_close(hllc(l, r, 0.0, kIso), reference_flux(upwind, 0.0, kIso, false), kRoundOff))
        << "u = " << u;
  }
}

// Control (shows that the check above discriminates): HLLE smears the contact, so its mass
// flux is not zero (Toro 2009 §10.3: HLL ignores the contact wave).
TEST(RiemannDiscontinuity, HlleDoesNotResolveContact) {
  const FaceState l{1.0, 0.0, 0.0, 0.0, 1.0, 0.0, 0.0};
  const FaceState r{0.125, 0.0, 0.0, 0.0, 1.0, 0.0, 0.0};
  EXPECT_GT(std::abs(hlle<IdealGas, false>(l, r, 0.0, kGas).density), 0.05);
}

// MHD contact with B_n ≠ 0: only ρ jumps; v, p and B continuous.
TEST(RiemannDiscontinuity, HlldResolvesMhdContact) {
  for (double u : {0.0, 0.25, -0.25}) {
    const FaceState l{1.0, u, 0.4, -0.3, 0.6, 0.7, -1.1};
    FaceState r = l;
    r.density = 0.2;
    const double bn = 0.9;
    const FaceState& upwind = u >= 0.0 ? l : r;
    EXPECT_TRUE(
        fluxes_close(hlld(l, r, bn, kGas53), reference_flux(upwind, bn, kGas53, true), kRoundOff))
        << "u = " << u;
  }
}

// Tangential discontinuity: B_n = 0, v_n uniform, total pressure continuous; ρ, p, v_t, B_t jump.
TEST(RiemannDiscontinuity, HlldResolvesTangentialDiscontinuity) {
  for (double u : {0.0, 0.35, -0.35}) {
    const FaceState l{1.0, u, 0.5, -0.1, 1.0, 0.8, 0.3};
    FaceState r{0.3, u, -0.7, 0.9, 0.0, -0.2, 1.4};
    const double ptl = 1.0 + 0.5 * (0.8 * 0.8 + 0.3 * 0.3);
    r.pressure = ptl - 0.5 * (r.bt1 * r.bt1 + r.bt2 * r.bt2);
    ASSERT_GT(r.pressure, 0.0);
    const FaceState& upwind = u >= 0.0 ? l : r;
    EXPECT_TRUE(
        fluxes_close(hlld(l, r, 0.0, kGas53), reference_flux(upwind, 0.0, kGas53, true), kRoundOff))
        << "u = " << u;
  }
}

// A rotational discontinuity: ρ, p, v_n, |B_t| continuous, B_t rotated. It moves at
// v_n − c_a (left-going family) or v_n + c_a (right-going), c_a = |B_n|/sqrt(ρ); the jump across
// it is ΔB_t = ±sign(B_n) sqrt(ρ) Δv_t (+ for the left-going family; derived here from the jump
// conditions of the tangential momentum and induction equations). `speed` is the wave speed in
// the face frame: 0 (stationary), or ±0.3, which puts x/t = 0 inside HLLD's Alfvén fan on one
// side and checks the double-star states.
struct Rotational {
  FaceState left, right;
  double bn, speed;
};

Rotational rotational(double bn, double pressure, bool left_going, double speed) {
  const double rho = 1.2, angle = 2.0;
  const double sqrt_rho = std::sqrt(rho);
  const double branch = left_going ? 1.0 : -1.0;
  const double vn = speed + branch * std::abs(bn) / sqrt_rho;
  const double b1 = 1.0, b2 = 0.5;
  const double c = std::cos(angle), s = std::sin(angle);
  const double r1 = c * b1 - s * b2, r2 = s * b1 + c * b2;
  const double k = branch * (bn > 0 ? 1.0 : -1.0) * sqrt_rho;  // ΔB_t = k Δv_t
  const FaceState l{rho, vn, 0.2, -0.4, pressure, b1, b2};
  const FaceState r{rho, vn, 0.2 + (r1 - b1) / k, -0.4 + (r2 - b2) / k, pressure, r1, r2};
  return {l, r, bn, speed};
}

template <class Eos>
void check_rotational(const Eos& eos) {
  for (double speed : {0.0, 0.3, -0.3}) {
    for (double bn : {0.8, -0.8}) {
      for (bool left_going : {true, false}) {
        const Rotational d = rotational(bn, 0.6, left_going, speed);
        const FaceFlux fl = reference_flux(d.left, d.bn, eos, true);
        const FaceFlux fr = reference_flux(d.right, d.bn, eos, true);
        // The set-up is an exact discontinuity: F_R − F_L = s (U_R − U_L) (Rankine–Hugoniot).
        const FaceConserved ul = conserved<Eos, true>(d.left, d.bn, eos);
        const FaceConserved ur = conserved<Eos, true>(d.right, d.bn, eos);
        ASSERT_TRUE(fluxes_close(flux_across(fl, d.speed, ur, ul), fr, kRoundOff));
        const FaceFlux& upwind = d.speed >= 0.0 ? fl : fr;
        EXPECT_TRUE(fluxes_close(hlld(d.left, d.right, d.bn, eos), upwind, kRoundOff))
            << "bn = " << bn << ", left-going family " << left_going << ", speed " << speed;
      }
    }
  }
}

TEST(RiemannDiscontinuity, HlldResolvesRotationalDiscontinuity) {
  check_rotational(kGas53);
}

TEST(RiemannDiscontinuity, IsothermalHlldResolvesRotationalDiscontinuity) {
  check_rotational(kIso);
}

// Control: HLLE smears the rotational discontinuity (its flux differs from F_L at O(1)).
TEST(RiemannDiscontinuity, HlleDoesNotResolveRotationalDiscontinuity) {
  const Rotational d = rotational(0.8, 0.6, true, 0.0);
  const FaceFlux f = hlle<IdealGas, true>(d.left, d.right, d.bn, kGas53);
  EXPECT_GT(testing::max_difference(f, reference_flux(d.left, d.bn, kGas53, true)), 0.05);
}

}  // namespace
}  // namespace brume::solver
