#include "physics/distributions_log_bins.hpp"

namespace brume::physics {

std::vector<double> LogBins::edges() const {
  std::vector<double> e(count + 1);
  const double ratio = highest / lowest;
  for (std::size_t k = 0; k < count; ++k)
    e[k] = lowest * std::pow(ratio, double(k) / double(count));
  e[count] = highest;
  return e;
}

std::vector<double> LogBins::centres() const {
  const std::vector<double> e = edges();
  std::vector<double> c(count);
  for (std::size_t k = 0; k < count; ++k)
    c[k] = std::sqrt(e[k] * e[k + 1]);
  return c;
}

}  // namespace brume::physics
