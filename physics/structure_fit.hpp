// A straight line y = a + b x fitted by ordinary least squares: the slope b and its standard
// error, as used for the size–linewidth exponent (ln σ against ln ℓ).
#pragma once

#include <vector>

namespace brume::physics {

struct SlopeFit {
  double slope = 0.0;  // NaN with fewer than 2 points or no spread in x
  double error = 0.0;  // NaN with fewer than 3 points
  int points = 0;
};

// x and y of the same size.
[[nodiscard]] SlopeFit least_squares_slope(const std::vector<double>& x,
                                           const std::vector<double>& y);

}  // namespace brume::physics
