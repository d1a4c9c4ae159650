#include "physics/structure_fit.hpp"

#include <cmath>
#include <limits>

namespace brume::physics {

// b = Σ(x − x̄)(y − ȳ) / Σ(x − x̄)², σ_b² = Σ r² / ((n − 2) Σ(x − x̄)²) with the residuals r
// (Press et al. 2007, Numerical Recipes 3rd ed., §15.2, eqs. 15.2.6 and 15.2.9 — from memory).
SlopeFit least_squares_slope(const std::vector<double>& x, const std::vector<double>& y) {
  constexpr double nan = std::numeric_limits<double>::quiet_NaN();
  SlopeFit fit;
  fit.points = int(x.size());
  fit.slope = nan;
  fit.error = nan;
  if (x.size() < 2) return fit;
  double mean_x = 0.0, mean_y = 0.0;
  for (std::size_t i = 0; i < x.size(); ++i) {
    mean_x += x[i];
    mean_y += y[i];
  }
  mean_x /= double(x.size());
  mean_y /= double(x.size());
  double sxx = 0.0, sxy = 0.0;
  for (std::size_t i = 0; i < x.size(); ++i) {
    sxx += (x[i] - mean_x) * (x[i] - mean_x);
    sxy += (x[i] - mean_x) * (y[i] - mean_y);
  }
  if (!(sxx > 0.0)) return fit;
  fit.slope = sxy / sxx;
  if (x.size() < 3) return fit;
  const double intercept = mean_y - fit.slope * mean_x;
  double residuals = 0.0;
  for (std::size_t i = 0; i < x.size(); ++i) {
    const double r = y[i] - intercept - fit.slope * x[i];
    residuals += r * r;
  }
  fit.error = std::sqrt(residuals / (double(x.size() - 2) * sxx));
  return fit;
}

}  // namespace brume::physics
