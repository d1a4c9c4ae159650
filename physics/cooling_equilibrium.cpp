#include "physics/cooling_equilibrium.hpp"

#include <cmath>
#include <limits>
#include <numbers>

#include "solver/units/constants.hpp"

namespace brume::physics {

namespace {

constexpr double not_a_number = std::numeric_limits<double>::quiet_NaN();

// Bisection of f on [a, b] in the logarithm of the argument, f(a) and f(b) of opposite signs.
template <class F>
double log_bisection(F f, double a, double b) {
  double fa = f(a);
  for (int i = 0; i < 200 && b - a > 1e-15 * b; ++i) {
    const double m = std::sqrt(a * b);
    const double fm = f(m);
    if ((fm < 0.0) == (fa < 0.0)) {
      a = m;
      fa = fm;
    } else {
      b = m;
    }
  }
  return std::sqrt(a * b);
}

}  // namespace

double equilibrium_temperature(const NetCooling& net, double n, TemperatureBracket bracket) {
  auto excess = [&](double t) { return n * net.lambda(t).lambda - net.heating; };
  // Scan 40 points per decade for the first sign change (common practice, no source).
  const int points = int(std::ceil(40.0 * std::log10(bracket.high / bracket.low))) + 1;
  double previous_t = bracket.low;
  double previous = excess(previous_t);
  if (previous == 0.0) return previous_t;
  for (int p = 1; p < points; ++p) {
    const double t = bracket.low * std::pow(bracket.high / bracket.low, double(p) / (points - 1));
    const double e = excess(t);
    if ((e < 0.0) != (previous < 0.0) || e == 0.0) return log_bisection(excess, previous_t, t);
    previous_t = t;
    previous = e;
  }
  return not_a_number;
}

double equilibrium_pressure(const NetCooling& net, double n, TemperatureBracket bracket) {
  return n * units::cgs::boltzmann * equilibrium_temperature(net, n, bracket);
}

// Field 1965, ApJ 142, 531: isobaric criterion (∂ℒ/∂T)_P < 0, here times T (equation number not
// looked up).
double isobaric_slope(const NetCooling& net, double n, double t) {
  const CoolingValue v = net.lambda(t);
  return n * n * t * v.slope - 2.0 * n * n * v.lambda + n * net.heating;
}

UnstableRange unstable_range(const NetCooling& net, TemperatureBracket bracket) {
  auto slope_at = [&](double n) {
    const double t = equilibrium_temperature(net, n, bracket);
    return std::isnan(t) ? 1.0 : isobaric_slope(net, n, t);
  };
  UnstableRange range;
  constexpr double n_first = 1e-4;
  constexpr double n_last = 1e6;
  constexpr int points = 401;  // 40 per decade
  double previous_n = n_first;
  double previous = slope_at(previous_n);
  for (int p = 1; p < points; ++p) {
    const double n = n_first * std::pow(n_last / n_first, double(p) / (points - 1));
    const double s = slope_at(n);
    if (!range.found && s < 0.0 && previous >= 0.0) {
      range.found = true;
      range.n_low = p == 1 && previous < 0.0 ? n_first : log_bisection(slope_at, previous_n, n);
      range.n_high = n_last;
    } else if (range.found && s >= 0.0) {
      range.n_high = log_bisection(slope_at, previous_n, n);
      break;
    }
    previous_n = n;
    previous = s;
  }
  if (!range.found) return range;
  range.t_high = equilibrium_temperature(net, range.n_low, bracket);
  range.t_low = equilibrium_temperature(net, range.n_high, bracket);
  range.p_max = range.n_low * units::cgs::boltzmann * range.t_high;
  range.p_min = range.n_high * units::cgs::boltzmann * range.t_low;
  return range;
}

double unstable_density_at_pressure(const NetCooling& net, const UnstableRange& range, double p,
                                    TemperatureBracket bracket) {
  if (!range.found || !(p >= range.p_min && p <= range.p_max)) return not_a_number;
  return log_bisection([&](double n) { return equilibrium_pressure(net, n, bracket) - p; },
                       range.n_low, range.n_high);
}

double cooling_time(const NetCooling& net, double n, double t, double gamma) {
  return n * units::cgs::boltzmann * t / ((gamma - 1.0) * std::fabs(net.rate(n, t)));
}

double field_critical_wavelength(const NetCooling& net, double n, double t, double conductivity) {
  const double slope = isobaric_slope(net, n, t);
  if (!(slope < 0.0)) return not_a_number;
  return 2.0 * std::numbers::pi * std::sqrt(conductivity * t / -slope);
}

// Begelman & McKee 1990, ApJ 358, 375, eq. 1 (from memory).
double field_length(const NetCooling& net, double n, double t, double conductivity) {
  return std::sqrt(conductivity * t / (n * n * net.lambda(t).lambda));
}

}  // namespace brume::physics
