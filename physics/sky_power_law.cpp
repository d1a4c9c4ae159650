#include "physics/sky_power_law.hpp"

#include <cmath>
#include <limits>

namespace brume::physics {

namespace {

bool in_range(double wavenumber, const SkyFitRange& range) {
  const double annulus = std::round(wavenumber);
  return annulus >= range.lowest && annulus <= range.highest;
}

}  // namespace

int sky_annuli_in_range(const std::vector<double>& wavenumber, const SkyFitRange& range) {
  int n = 0;
  for (const double k : wavenumber) {
    if (in_range(k, range)) ++n;
  }
  return n;
}

SkyPowerLaw sky_power_law(const std::vector<double>& wavenumber,
                          const std::vector<double>& spectrum, const SkyFitRange& range) {
  double sx = 0.0, sy = 0.0, sxx = 0.0, sxy = 0.0;
  int n = 0;
  for (std::size_t a = 0; a < wavenumber.size(); ++a) {
    if (!in_range(wavenumber[a], range) || !(spectrum[a] > 0.0)) continue;
    const double x = std::log(wavenumber[a]);
    const double y = std::log(spectrum[a]);
    sx += x;
    sy += y;
    sxx += x * x;
    sxy += x * y;
    ++n;
  }
  SkyPowerLaw fit;
  fit.annuli = n;
  if (n < 2) {
    fit.slope = std::numeric_limits<double>::quiet_NaN();
    return fit;
  }
  // Centred sums: the slope of the straight line through the points in the least-squares sense.
  const double mx = sx / n, my = sy / n;
  const double cxx = sxx - n * mx * mx;
  const double cxy = sxy - n * mx * my;
  fit.slope = cxx > 0.0 ? cxy / cxx : std::numeric_limits<double>::quiet_NaN();
  return fit;
}

double sky_bb_over_ee(const std::vector<double>& wavenumber, const std::vector<double>& modes,
                      const std::vector<double>& ee, const std::vector<double>& bb,
                      const SkyFitRange& range) {
  double e = 0.0, b = 0.0;
  for (std::size_t a = 0; a < wavenumber.size(); ++a) {
    if (!in_range(wavenumber[a], range)) continue;
    e += modes[a] * ee[a];
    b += modes[a] * bb[a];
  }
  return e > 0.0 ? b / e : std::numeric_limits<double>::quiet_NaN();
}

}  // namespace brume::physics
