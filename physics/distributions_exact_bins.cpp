#include "physics/distributions_exact_bins.hpp"

#include <algorithm>
#include <climits>
#include <cmath>

namespace brume::physics {

ExponentWindow global_exponent_window(const std::vector<double>& weights, MPI_Comm comm) {
  int local[2] = {INT_MAX, INT_MAX};  // {lowest, −highest}: one MPI_MIN for both
  for (const double w : weights) {
    if (!(w > 0.0) || !std::isfinite(w)) continue;
    int e = 0;
    static_cast<void>(std::frexp(w, &e));
    local[0] = std::min(local[0], e);
    local[1] = std::min(local[1], -e);
  }
  int global[2] = {0, 0};
  MPI_Allreduce(local, global, 2, MPI_INT, MPI_MIN, comm);
  if (global[0] == INT_MAX) return {0, 0};
  return {global[0], -global[1]};
}

ExactBinSums::ExactBinSums(std::size_t bins, ExponentWindow window) : bins_(bins), window_(window) {
  // The mantissa spans 53 bits above 2^(e − 53) plus a shift below 32: three digits over the
  // window's top digit, and two more hold the carries of up to 2^64 adds.
  digits_per_bin_ = (window_.highest - window_.lowest) / digit_bits + 5;
  max_weight_ = std::ldexp(1.0, window_.highest) * (1.0 - 0x1p-53);
  digits_.assign(bins_ * std::size_t(digits_per_bin_), 0);
}

// Brings every digit but the top one of each bin into [0, 2^32).
void ExactBinSums::propagate_carries() {
  const auto n = std::size_t(digits_per_bin_);
  for (std::size_t b = 0; b < bins_; ++b) {
    std::int64_t* d = digits_.data() + b * n;
    for (std::size_t i = 0; i + 1 < n; ++i) {
      const std::int64_t carry = d[i] >> digit_bits;
      d[i] -= carry * (std::int64_t(1) << digit_bits);
      d[i + 1] += carry;
    }
  }
  pending_ = 0;
}

void ExactBinSums::combine(MPI_Comm comm) {
  propagate_carries();
  // Integer addition is associative: the order in which ranks arrive does not matter.
  MPI_Allreduce(MPI_IN_PLACE, digits_.data(), int(digits_.size()), MPI_INT64_T, MPI_SUM, comm);
  propagate_carries();
}

// Every digit is non-negative once carried (all weights are positive): the three leading
// digits hold at least 65 significant bits, so adding them from the top rounds to within one
// unit in the last place, as solver::ExactSum::value does.
double ExactBinSums::rounded(const std::int64_t* digits) const {
  int top = digits_per_bin_ - 1;
  while (top >= 0 && digits[top] == 0)
    --top;
  double result = 0.0;
  for (int i = top; i >= 0 && i >= top - 2; --i) {
    result += std::ldexp(double(digits[i]), window_.lowest - 53 + digit_bits * i);
  }
  return result;
}

double ExactBinSums::value(std::size_t bin) const {
  ExactBinSums one(1, window_);
  const auto n = std::size_t(digits_per_bin_);
  std::copy_n(digits_.begin() + std::ptrdiff_t(bin * n), n, one.digits_.begin());
  one.propagate_carries();
  return one.rounded(one.digits_.data());
}

double ExactBinSums::total() const {
  ExactBinSums sum(1, window_);
  const auto n = std::size_t(digits_per_bin_);
  // A bin's digits may be uncarried (< 2^62): carry after each bin so that no digit overflows.
  for (std::size_t b = 0; b < bins_; ++b) {
    for (std::size_t i = 0; i < n; ++i)
      sum.digits_[i] += digits_[b * n + i];
    sum.propagate_carries();
  }
  return sum.rounded(sum.digits_.data());
}

}  // namespace brume::physics
