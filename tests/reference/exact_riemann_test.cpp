// Tests of the exact Euler Riemann solver (tests/reference/exact_riemann.hpp).
#include "tests/reference/exact_riemann.hpp"

#include <gtest/gtest.h>

#include <array>
#include <cmath>
#include <vector>

namespace brume::reference {
namespace {

constexpr double kGamma = 1.4;

struct ToroCase {
  const char* name;
  EulerState left, right;
  double p_star, u_star, rho_star_left, rho_star_right;  // Toro 2009 Table 4.3 (from memory)
  double half_width;                                     // |ξ| range holding all waves
};

// Initial data: Toro 2009, §4.3.3, Table 4.1 (γ = 1.4); star values: Toro 2009, Tables 4.2 and
// 4.3 (p*, u*, ρ*_L, ρ*_R), all typed from memory, not checked against the book.
const std::array<ToroCase, 5> kToro = {{
    {"test 1", {1.0, 0.0, 1.0}, {0.125, 0.0, 0.1}, 0.30313, 0.92745, 0.42632, 0.26557, 3.0},
    {"test 2", {1.0, -2.0, 0.4}, {1.0, 2.0, 0.4}, 0.00189, 0.00000, 0.02185, 0.02185, 4.0},
    {"test 3", {1.0, 0.0, 1000.0}, {1.0, 0.0, 0.01}, 460.894, 19.5975, 0.57506, 5.99924, 60.0},
    {"test 4", {1.0, 0.0, 0.01}, {1.0, 0.0, 100.0}, 46.0950, -6.19633, 5.99242, 0.57511, 20.0},
    {"test 5",
     {5.99924, 19.5975, 460.894},
     {5.99242, -6.19633, 46.0950},
     1691.64,
     8.68975,
     14.2823,
     31.0426,
     30.0},
}};

// The table gives 5–6 significant figures; 1e-4 relative (plus 1e-5 absolute, for u* = 0 and
// the 0.00189 of test 2, printed to 3 figures) accepts rounding of the last printed digit.
void expect_table(double computed, double table, const char* what, const char* name) {
  EXPECT_NEAR(computed, table, 1e-4 * std::abs(table) + 1e-5) << what << ", " << name;
}

TEST(ReferenceExactRiemann, StarStateMatchesToroTables) {
  for (const ToroCase& c : kToro) {
    const ExactRiemann rp(c.left, c.right, kGamma);
    expect_table(rp.star().pressure, c.p_star, "p*", c.name);
    expect_table(rp.star().velocity, c.u_star, "u*", c.name);
    expect_table(rp.star().density_left, c.rho_star_left, "rho*_L", c.name);
    expect_table(rp.star().density_right, c.rho_star_right, "rho*_R", c.name);
  }
}

// Rankine–Hugoniot conditions in the frame of a shock of speed S (Toro 2009 ch. 3, in
// conservation form; from memory): ρ(u − S), ρu(u − S) + p, E(u − S) + pu equal on both sides.
// Relative residuals: the star state is converged to 1e-15; 1e-10 allows the amplification
// of round-off through the jump formulas.
void expect_rankine_hugoniot(const EulerState& a, const EulerState& b, double s, const char* name) {
  auto energy = [](const EulerState& w) {
    return w.pressure / (kGamma - 1.0) + 0.5 * w.density * w.velocity * w.velocity;
  };
  const double ma = a.density * (a.velocity - s), mb = b.density * (b.velocity - s);
  EXPECT_NEAR(ma, mb, 1e-10 * std::abs(ma)) << "mass, " << name;
  const double pa = ma * a.velocity + a.pressure, pb = mb * b.velocity + b.pressure;
  EXPECT_NEAR(pa, pb, 1e-10 * std::abs(pa)) << "momentum, " << name;
  const double ea = energy(a) * (a.velocity - s) + a.pressure * a.velocity;
  const double eb = energy(b) * (b.velocity - s) + b.pressure * b.velocity;
  EXPECT_NEAR(ea, eb, 1e-10 * (std::abs(ea) + std::abs(pa))) << "energy, " << name;
}

TEST(ReferenceExactRiemann, ShocksSatisfyRankineHugoniot) {
  int shocks = 0;
  for (const ToroCase& c : kToro) {
    const ExactRiemann rp(c.left, c.right, kGamma);
    const EulerStar& s = rp.star();
    if (s.left_shock) {
      ++shocks;
      expect_rankine_hugoniot(c.left, {s.density_left, s.velocity, s.pressure},
                              rp.shock_speed(false), c.name);
    }
    if (s.right_shock) {
      ++shocks;
      expect_rankine_hugoniot({s.density_right, s.velocity, s.pressure}, c.right,
                              rp.shock_speed(true), c.name);
    }
  }
  EXPECT_EQ(shocks, 5);  // tests 1, 3, 4: one each; test 5: two; test 2: none (Toro 2009 §4.3.3)
}

// Across a rarefaction of side K (Toro 2009 §4.4.2 and §2.4 for the invariants): entropy
// p/ρ^γ is constant, so is the Riemann invariant u ∓ 2c/(γ−1) (− for the right wave, + for the
// left one), and inside the fan the characteristic through the origin gives ξ = u ∓ c.
// Relative tolerance 1e-10: only round-off of pow() and of the Newton-converged p*.
TEST(ReferenceExactRiemann, RarefactionsAreIsentropicWithConstantInvariants) {
  int rarefactions = 0;
  for (const ToroCase& c : kToro) {
    const ExactRiemann rp(c.left, c.right, kGamma);
    const EulerStar& s = rp.star();
    for (bool right : {false, true}) {
      if (right ? s.right_shock : s.left_shock) continue;
      ++rarefactions;
      const EulerState& k = right ? c.right : c.left;
      const double sgn = right ? 1.0 : -1.0;
      const double ck = right ? rp.sound_right() : rp.sound_left();
      const double entropy = k.pressure / std::pow(k.density, kGamma);
      const double invariant = k.velocity - sgn * 2.0 * ck / (kGamma - 1.0);
      const double rho_star = right ? s.density_right : s.density_left;
      const double c_star = std::sqrt(kGamma * s.pressure / rho_star);
      EXPECT_NEAR(s.pressure / std::pow(rho_star, kGamma), entropy, 1e-10 * entropy) << c.name;
      EXPECT_NEAR(s.velocity - sgn * 2.0 * c_star / (kGamma - 1.0), invariant,
                  1e-10 * std::abs(invariant))
          << c.name;
      const double head = k.velocity + sgn * ck, tail = s.velocity + sgn * c_star;
      for (double t : {0.1, 0.37, 0.5, 0.81, 0.99}) {
        const double xi = head + t * (tail - head);
        const EulerState w = rp.sample(xi);
        const double cw = std::sqrt(kGamma * w.pressure / w.density);
        EXPECT_NEAR(w.pressure / std::pow(w.density, kGamma), entropy, 1e-10 * entropy) << c.name;
        EXPECT_NEAR(w.velocity - sgn * 2.0 * cw / (kGamma - 1.0), invariant,
                    1e-10 * std::abs(invariant))
            << c.name;
        EXPECT_NEAR(w.velocity + sgn * cw, xi, 1e-10 * (std::abs(xi) + ck)) << c.name;
      }
    }
  }
  EXPECT_EQ(rarefactions, 5);  // tests 1, 3, 4: one each; test 2: two; test 5: none
}

// Contact (Toro 2009 §4.2): pressure and velocity continuous, density jumps from ρ*_L to ρ*_R;
// sampled just either side of ξ = u* and next to the adjacent waves (the star region is uniform).
TEST(ReferenceExactRiemann, ContactHasContinuousPressureAndVelocity) {
  for (const ToroCase& c : kToro) {
    const ExactRiemann rp(c.left, c.right, kGamma);
    const EulerStar& s = rp.star();
    const double d = 1e-9 * (1.0 + std::abs(s.velocity));
    const EulerState a = rp.sample(s.velocity - d), b = rp.sample(s.velocity + d);
    EXPECT_EQ(a.pressure, b.pressure) << c.name;
    EXPECT_EQ(a.velocity, b.velocity) << c.name;
    EXPECT_EQ(a.density, s.density_left) << c.name;
    EXPECT_EQ(b.density, s.density_right) << c.name;
  }
}

// Integral conservation (Toro 2009 §4.5 / §2.4, the integral form over [−X, X] × [0, 1]):
//   ∫ U(ξ) dξ = X (U_L + U_R) − (F(U_R) − F(U_L)).
// Midpoint rule with N cells: a jump ΔU inside a cell costs at most |ΔU| h / 2 and the smooth
// parts O(h²), so the error is bounded by h/2 times the total variation of the samples; the check
// allows h times the total variation (factor 2 margin) plus round-off.
TEST(ReferenceExactRiemann, SolutionConservesMassMomentumEnergy) {
  for (const ToroCase& c : kToro) {
    const ExactRiemann rp(c.left, c.right, kGamma);
    const double x = c.half_width;
    const int n = 400000;
    const double h = 2.0 * x / n;
    auto cons = [](const EulerState& w) {
      return std::array<double, 3>{
          w.density, w.density * w.velocity,
          w.pressure / (kGamma - 1.0) + 0.5 * w.density * w.velocity * w.velocity};
    };
    auto flux = [&](const EulerState& w) {
      const auto u = cons(w);
      return std::array<double, 3>{u[1], u[1] * w.velocity + w.pressure,
                                   (u[2] + w.pressure) * w.velocity};
    };
    std::array<double, 3> integral{0.0, 0.0, 0.0}, variation{0.0, 0.0, 0.0};
    std::array<double, 3> previous = cons(c.left);
    for (int i = 0; i < n; ++i) {
      const auto u = cons(rp.sample(-x + (i + 0.5) * h));
      for (std::size_t q = 0; q < 3; ++q) {
        integral[q] += h * u[q];
        variation[q] += std::abs(u[q] - previous[q]);
      }
      previous = u;
    }
    const auto ul = cons(c.left), ur = cons(c.right);
    const auto fl = flux(c.left), fr = flux(c.right);
    for (std::size_t q = 0; q < 3; ++q) {
      const double expected = x * (ul[q] + ur[q]) - (fr[q] - fl[q]);
      const double roundoff = 1e-12 * n * h * (std::abs(ul[q]) + std::abs(ur[q]) + variation[q]);
      EXPECT_NEAR(integral[q], expected, h * variation[q] + roundoff)
          << c.name << ", component " << q;
    }
  }
}

TEST(ReferenceExactRiemann, RejectsVacuumGeneratingData) {
  // 2 (c_L + c_R)/(γ − 1) ≈ 7.48 < Δu = 8 (Toro 2009 eq. 4.40).
  EXPECT_THROW(ExactRiemann({1.0, -4.0, 0.4}, {1.0, 4.0, 0.4}, kGamma), std::invalid_argument);
}

}  // namespace
}  // namespace brume::reference
