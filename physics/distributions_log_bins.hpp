// Logarithmically spaced bins of a positive quantity, and the slot a value falls in: a bin, or
// one of three slots past the bins for values below the range (zero and negative values
// included), above it, and undefined (NaN). Logarithmic binning: common practice, no source.
#pragma once

#include <cmath>
#include <cstddef>
#include <vector>

namespace brume::physics {

struct LogBins {
  std::size_t count = 1;
  double lowest = 1.0;    // lower edge of the first bin, in the unit of the binned values
  double highest = 10.0;  // upper edge of the last bin

  [[nodiscard]] std::size_t underflow() const { return count; }
  [[nodiscard]] std::size_t overflow() const { return count + 1; }
  [[nodiscard]] std::size_t undefined() const { return count + 2; }
  [[nodiscard]] std::size_t slots() const { return count + 3; }

  // Edge k = lowest · (highest/lowest)^(k/count), k = 0 … count (the last is `highest` itself).
  [[nodiscard]] std::vector<double> edges() const;
  // Geometric centres √(edge_k · edge_k+1).
  [[nodiscard]] std::vector<double> centres() const;
};

// Precomputed ln(lowest) and count / ln(highest/lowest) so that the per-cell work is one log,
// one multiply and the comparisons.
class LogBinner {
 public:
  explicit LogBinner(const LogBins& bins)
      : count_(bins.count),
        log_lowest_(std::log(bins.lowest)),
        per_log_unit_(double(bins.count) / std::log(bins.highest / bins.lowest)) {}

  [[nodiscard]] std::size_t slot(double value) const {
    if (std::isnan(value)) return count_ + 2;
    if (!(value > 0.0)) return count_;
    const double u = (std::log(value) - log_lowest_) * per_log_unit_;
    if (u < 0.0) return count_;
    if (!(u < double(count_))) return count_ + 1;
    return static_cast<std::size_t>(u);
  }
  [[nodiscard]] std::size_t count() const { return count_; }

 private:
  std::size_t count_;
  double log_lowest_;
  double per_log_unit_;
};

}  // namespace brume::physics
