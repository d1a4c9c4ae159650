// Exact solution of the Riemann problem for the 1D Euler equations of an ideal gas, sampled at
// ξ = x/t. Test-side reference (not used by the solver).
// Toro 2009, Riemann Solvers and Numerical Methods for Fluid Dynamics, 3rd ed., ch. 4
// (equation numbers below from memory).
#pragma once

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace brume::reference {

struct EulerState {
  double density, velocity, pressure;
};

// The star region and the waves bounding it.
struct EulerStar {
  double pressure, velocity;           // p*, u*
  double density_left, density_right;  // ρ*_L, ρ*_R
  bool left_shock, right_shock;        // shock (true) or rarefaction (false)
};

class ExactRiemann {
 public:
  ExactRiemann(const EulerState& left, const EulerState& right, double gamma)
      : l_(left), r_(right), g_(gamma), cl_(sound(left)), cr_(sound(right)) {
    // Pressure positivity condition (no vacuum), Toro 2009 §4.3.1, eq. 4.40.
    if (2.0 * (cl_ + cr_) / (g_ - 1.0) <= r_.velocity - l_.velocity) {
      throw std::invalid_argument("ExactRiemann: the data generate vacuum");
    }
    star_ = solve_star();
  }

  [[nodiscard]] const EulerStar& star() const { return star_; }
  [[nodiscard]] double gamma() const { return g_; }
  [[nodiscard]] double sound_left() const { return cl_; }
  [[nodiscard]] double sound_right() const { return cr_; }

  // Shock speed of side K (K = left: sign −1, right: +1), Toro 2009 eqs. 4.52 and 4.59.
  [[nodiscard]] double shock_speed(bool right_side) const {
    const EulerState& k = right_side ? r_ : l_;
    const double c = right_side ? cr_ : cl_;
    const double sgn = right_side ? 1.0 : -1.0;
    const double ratio = star_.pressure / k.pressure;
    return k.velocity +
           sgn * c * std::sqrt((g_ + 1.0) / (2.0 * g_) * ratio + (g_ - 1.0) / (2.0 * g_));
  }

  // Solution at ξ = x/t: the sampling of Toro 2009 §4.5 (eqs. 4.53–4.56 and 4.60–4.63).
  [[nodiscard]] EulerState sample(double xi) const {
    const bool on_left = xi <= star_.velocity;
    const EulerState& k = on_left ? l_ : r_;
    const double c = on_left ? cl_ : cr_;
    const double sgn = on_left ? -1.0 : 1.0;  // direction of the wave of side K
    const bool shock = on_left ? star_.left_shock : star_.right_shock;
    const double rho_star = on_left ? star_.density_left : star_.density_right;
    const EulerState inner{rho_star, star_.velocity, star_.pressure};
    // Position relative to the wave measured outward: outside the wave is sgn (ξ − s) > 0.
    if (shock) {
      const double s = shock_speed(!on_left);
      return sgn * (xi - s) > 0.0 ? k : inner;
    }
    const double head = k.velocity + sgn * c;
    const double c_star = c * std::pow(star_.pressure / k.pressure, (g_ - 1.0) / (2.0 * g_));
    const double tail = star_.velocity + sgn * c_star;
    if (sgn * (xi - head) > 0.0) return k;
    if (sgn * (xi - tail) < 0.0) return inner;
    // Inside the fan, Toro 2009 eq. 4.56 (left) and eq. 4.63 (right).
    const double gm = g_ - 1.0, gp = g_ + 1.0;
    const double f = 2.0 / gp - sgn * gm / (gp * c) * (k.velocity - xi);
    const double rho = k.density * std::pow(f, 2.0 / gm);
    const double u = 2.0 / gp * (-sgn * c + 0.5 * gm * k.velocity + xi);
    const double p = k.pressure * std::pow(f, 2.0 * g_ / gm);
    return {rho, u, p};
  }

 private:
  [[nodiscard]] double sound(const EulerState& s) const {
    return std::sqrt(g_ * s.pressure / s.density);
  }

  // f_K(p) and its derivative, Toro 2009 eqs. 4.6–4.7 (shock: p > p_K, rarefaction: p ≤ p_K)
  // and eq. 4.37.
  void pressure_function(double p, const EulerState& k, double c, double& f, double& df) const {
    if (p > k.pressure) {
      const double a = 2.0 / ((g_ + 1.0) * k.density);
      const double b = (g_ - 1.0) / (g_ + 1.0) * k.pressure;
      const double q = std::sqrt(a / (b + p));
      f = (p - k.pressure) * q;
      df = q * (1.0 - 0.5 * (p - k.pressure) / (b + p));
    } else {
      const double ratio = p / k.pressure;
      f = 2.0 * c / (g_ - 1.0) * (std::pow(ratio, (g_ - 1.0) / (2.0 * g_)) - 1.0);
      df = 1.0 / (k.density * c) * std::pow(ratio, -(g_ + 1.0) / (2.0 * g_));
    }
  }

  // Newton–Raphson for f(p) = f_L + f_R + Δu = 0 (Toro 2009 eq. 4.5, §4.3.2), started from the
  // two-rarefaction guess (eq. 4.46), which is exact when both waves are rarefactions.
  [[nodiscard]] EulerStar solve_star() const {
    const double z = (g_ - 1.0) / (2.0 * g_);
    const double du = r_.velocity - l_.velocity;
    const double guess = (cl_ + cr_ - 0.5 * (g_ - 1.0) * du) /
                         (cl_ / std::pow(l_.pressure, z) + cr_ / std::pow(r_.pressure, z));
    double p = std::max(std::pow(guess, 1.0 / z), 1e-14 * std::min(l_.pressure, r_.pressure));
    double fl = 0, fr = 0, dfl = 0, dfr = 0;
    for (int it = 0; it < 100; ++it) {
      pressure_function(p, l_, cl_, fl, dfl);
      pressure_function(p, r_, cr_, fr, dfr);
      double next = p - (fl + fr + du) / (dfl + dfr);
      if (next <= 0.0) next = 0.5 * p;  // stay in the physical domain
      const double change = 2.0 * std::abs(next - p) / (next + p);
      p = next;
      if (change < 1e-15) break;
    }
    pressure_function(p, l_, cl_, fl, dfl);
    pressure_function(p, r_, cr_, fr, dfr);
    EulerStar s{};
    s.pressure = p;
    s.velocity = 0.5 * (l_.velocity + r_.velocity) + 0.5 * (fr - fl);  // Toro 2009 eq. 4.9
    s.left_shock = p > l_.pressure;
    s.right_shock = p > r_.pressure;
    s.density_left = star_density(l_, s.left_shock, p);
    s.density_right = star_density(r_, s.right_shock, p);
    return s;
  }

  // Shock: Toro 2009 eq. 4.50 (Rankine–Hugoniot); rarefaction: eq. 4.53 (isentropic).
  [[nodiscard]] double star_density(const EulerState& k, bool shock, double p) const {
    const double ratio = p / k.pressure;
    if (shock) {
      const double q = (g_ - 1.0) / (g_ + 1.0);
      return k.density * (ratio + q) / (q * ratio + 1.0);
    }
    return k.density * std::pow(ratio, 1.0 / g_);
  }

  EulerState l_, r_;
  double g_;
  double cl_, cr_;
  EulerStar star_{};
};

}  // namespace brume::reference
