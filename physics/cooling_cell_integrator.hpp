// The temperature of one cell under heating and cooling at constant density:
//   dT/dt = f(T) = −(γ − 1)/k_B · (n Λ(T) − Γ)   (from de/dt = −(n²Λ − nΓ), e = n k_B T/(γ − 1)).
// Two paths, tried in this order:
//  1. fast: the whole dt in one second-order linearly implicit (Rosenbrock) step, ROS2, with its
//     embedded first-order solution as error estimate (two evaluations of Λ), or in up to four
//     equal ROS2 steps sized from that estimate; kept when every estimate meets the tolerance and
//     every value lies within [floor, ceiling];
//  2. robust: implicit (backward) Euler with step doubling: each sub-step h is taken once whole and
//     once as two halves; their difference estimates the local error, which sets the next sub-step,
//     and their Richardson extrapolation 2·T_half − T_whole is kept (Hairer & Wanner 1996, Solving
//     ODEs II, §IV.9, extrapolated implicit Euler; from memory). Backward Euler is L-stable, so a
//     cooling time far below dt relaxes to equilibrium in a few growing sub-steps; each implicit
//     equation is solved by Newton's method inside a bracket within [floor, ceiling], so the
//     temperature stays positive and within the limits.
#pragma once

#include <algorithm>
#include <cmath>

#include "physics/cooling_curve.hpp"

namespace brume::physics {

struct CellCoolingLimits {
  double floor = 10.0;      // K
  double ceiling = 1e9;     // K
  double tolerance = 1e-6;  // relative local error of a sub-step
  long max_substeps = 1000000;
};

struct CellCoolingResult {
  double temperature = 0.0;  // K
  long substeps = 0;
  bool limited = false;    // ended at the floor or the ceiling
  bool fast_path = false;  // the Rosenbrock steps were kept
};

template <class Function>
class CellCooler {
 public:
  // rate_factor = (γ − 1)/k_B (K s^-1 per erg s^-1 of n Λ − Γ).
  CellCooler(const Function& function, double heating, double rate_factor,
             const CellCoolingLimits& limits)
      : lambda_(function), heating_(heating), factor_(rate_factor), limits_(limits) {}
  // The cooler keeps a reference to the function: a temporary would not outlive it.
  CellCooler(const Function&& function, double heating, double rate_factor,
             const CellCoolingLimits& limits) = delete;

  // dT/dt at number density n (cm^-3) and temperature t (K), K s^-1.
  [[nodiscard]] double rate(double n, double t) const {
    return -factor_ * (n * lambda_(t).lambda - heating_);
  }

  [[nodiscard]] CellCoolingResult advance(double n, double t0, double dt) const {
    const double t = std::clamp(t0, limits_.floor, limits_.ceiling);
    const Slope start = slope_at(n, t);
    CellCoolingResult result;
    if (rosenbrock_steps(n, t, dt, start, result)) {
      result.fast_path = true;
    } else {
      result = step_doubling(n, t, dt, start);
    }
    result.limited = result.temperature <= limits_.floor || result.temperature >= limits_.ceiling;
    return result;
  }

 private:
  // f and df/dT at one temperature (K s^-1 and s^-1).
  struct Slope {
    double rate;
    double jacobian;
  };

  [[nodiscard]] Slope slope_at(double n, double t) const {
    const CoolingValue v = lambda_(t);
    return {-factor_ * (n * v.lambda - heating_), -factor_ * n * v.slope};
  }

  // ROS2 of Verwer, Spee, Blom & Hundsdorfer 1999, SIAM J. Sci. Comput. 20, 1456, §2 (from
  // memory; equation number not checked), for a scalar autonomous ODE with J = f'(T₀):
  //   (1 − γhJ) k₁ = f(T₀),  (1 − γhJ) k₂ = f(T₀ + h k₁) − 2 k₁,  T₁ = T₀ + h (3/2 k₁ + 1/2 k₂),
  // γ = 1 + 1/√2 (L-stable); the embedded first-order solution T₀ + h k₁ differs from T₁ by
  // h |k₁ + k₂| / 2, the error estimate. False when the stage or T₁ leaves [floor, ceiling].
  [[nodiscard]] bool rosenbrock_step(double n, double t, double h, const Slope& start, double& next,
                                     double& error) const {
    constexpr double gamma = 1.0 + 0.70710678118654752440;  // 1 + 1/√2
    const double a = 1.0 - gamma * h * start.jacobian;
    if (!(a > 0.0)) return false;  // J > 0 and h J ≥ 1/γ: leave it to the robust path
    const double k1 = start.rate / a;
    const double stage = t + h * k1;
    if (!(stage >= limits_.floor && stage <= limits_.ceiling)) return false;
    const double k2 = (rate(n, stage) - 2.0 * k1) / a;
    next = t + h * (1.5 * k1 + 0.5 * k2);
    error = 0.5 * h * std::fabs(k1 + k2);
    return next >= limits_.floor && next <= limits_.ceiling;
  }

  // The fast path: one ROS2 step over dt; if its estimate exceeds the tolerance by a factor q,
  // N = ⌈1.1 √q⌉ ≤ 4 equal steps (the estimate scales as h², common practice, no source), each
  // checked again. False (nothing kept) when any check fails or more steps would be needed.
  [[nodiscard]] bool rosenbrock_steps(double n, double t, double dt, const Slope& start,
                                      CellCoolingResult& out) const {
    // 2N + 1 evaluations of Λ; beyond N = 4 the robust path (5–6 per sub-step, measured) is as
    // cheap.
    constexpr int most_steps = 4;
    double next = 0.0;
    double error = 0.0;
    if (!rosenbrock_step(n, t, dt, start, next, error)) return false;
    const double allowed = limits_.tolerance * std::max(t, next);
    if (error <= allowed) {
      out.temperature = next;
      out.substeps = 1;
      return true;
    }
    const double steps = std::ceil(1.1 * std::sqrt(error / allowed));
    if (!(steps <= most_steps)) return false;
    const double h = dt / steps;
    Slope here = start;
    double now = t;
    for (int s = 0; s < int(steps); ++s) {
      if (s > 0) here = slope_at(n, now);
      if (!rosenbrock_step(n, now, h, here, next, error)) return false;
      if (!(error <= limits_.tolerance * std::max(now, next))) return false;
      now = next;
    }
    out.temperature = now;
    out.substeps = long(steps);
    return true;
  }

  [[nodiscard]] CellCoolingResult step_doubling(double n, double t, double dt,
                                                const Slope& start) const {
    CellCoolingResult result;
    double remaining = dt;
    // First try: a tenth of the cooling time |T / (dT/dt)| (common practice, no source).
    const double r0 = std::fabs(start.rate);
    double h = r0 > 0.0 ? std::min(dt, 0.1 * t / r0) : dt;
    Slope here = start;  // f and J at (or, after a Newton solve, within its tolerance of) t
    while (remaining > 0.0) {
      const bool last = h >= remaining * (1.0 - 1e-12);
      if (last) h = remaining;
      Slope unused{};
      const double whole = implicit_step(n, t, h, here, unused);
      Slope middle{};
      const double first_half = implicit_step(n, t, 0.5 * h, here, middle);
      Slope end{};
      const double half = implicit_step(n, first_half, 0.5 * h, middle, end);
      const double error = std::fabs(half - whole);
      const double allowed = limits_.tolerance * std::max(t, half);
      const bool forced = result.substeps >= limits_.max_substeps;
      // Local error of backward Euler ∝ h², hence the square root (common practice, no source).
      const double change = error > 0.0 ? 0.9 * std::sqrt(allowed / error) : 4.0;
      if (error <= allowed || forced) {
        const double extrapolated = 2.0 * half - whole;
        const bool inside = extrapolated >= limits_.floor && extrapolated <= limits_.ceiling;
        t = inside ? extrapolated : half;
        // The Newton start of the next sub-step needs f and J near t only (a predictor).
        here = end;
        remaining = last ? 0.0 : remaining - h;
        ++result.substeps;
        h *= std::min(4.0, std::max(0.2, change));
      } else {
        h *= std::max(0.2, change);
      }
    }
    result.temperature = t;
    return result;
  }

  // T with T − t0 − h·f(T) = 0 (backward Euler), within [floor, ceiling]: the floor (ceiling)
  // when the root lies below (above) it. `guess` holds f and J near t0: Newton starts from the
  // linearly implicit Euler predictor t0 + h f/(1 − hJ) and stops once its update is below 1e-3
  // of the sub-step tolerance (relative), so the Newton error is negligible in the error estimate
  // (common practice, no source). The residual at a limit is evaluated only when Newton tries to
  // step beyond it. `last` receives f and J at the last Newton iterate.
  [[nodiscard]] double implicit_step(double n, double t0, double h, const Slope& guess,
                                     Slope& last) const {
    auto residual = [&](double t) { return t - t0 - h * rate(n, t); };
    const double stop = 1e-3 * limits_.tolerance;
    double low = limits_.floor;
    double high = limits_.ceiling;
    bool low_checked = false;  // residual(low) < 0 is known
    bool high_checked = false;
    const double a = 1.0 - h * guess.jacobian;
    double t = a > 0.0 ? t0 + h * guess.rate / a : t0;
    if (!(t > low && t < high)) t = std::clamp(t0, low, high);
    for (int iteration = 0; iteration < 200; ++iteration) {
      last = slope_at(n, t);
      const double g = t - t0 - h * last.rate;
      if (g == 0.0) return t;
      if (g < 0.0) {
        low = t;
        low_checked = true;
      } else {
        high = t;
        high_checked = true;
      }
      const double slope = 1.0 - h * last.jacobian;
      double next = t - g / slope;
      if (std::fabs(next - t) <= stop * t) {
        return std::clamp(next, limits_.floor, limits_.ceiling);
      }
      if (!(next > low && next < high)) {
        // Newton leaves the bracket: make sure it holds a root, then bisect.
        if (!low_checked) {
          if (residual(low) >= 0.0) return low;
          low_checked = true;
        }
        if (!high_checked) {
          if (residual(high) <= 0.0) return high;
          high_checked = true;
        }
        if (!(next > low && next < high)) next = 0.5 * (low + high);
      }
      if (high - low <= stop * high) return next;
      t = next;
    }
    return t;
  }

  const Function& lambda_;
  double heating_;
  double factor_;
  CellCoolingLimits limits_;
};

}  // namespace brume::physics
