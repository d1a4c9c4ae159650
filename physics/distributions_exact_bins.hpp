// Exact sums of positive weights in many bins at once, for mass-weighted histograms whose totals
// must not depend on the number of ranks (DESIGN.md §4). Each bin is a fixed-point integer whose
// lowest bit weighs 2^(lowest − 53) for a global exponent window [lowest, highest] of the
// weights, so a bin needs only a few 32-bit digits instead of solver::ExactSum's 72, and all
// bins are combined over the ranks in one MPI_Allreduce. The long fixed-point accumulator is
// Kulisch's idea (Kulisch & Miranker 1986, SIAM Review 28, 1); this layout is brume's own, after
// solver/exact_sum.hpp.
#pragma once

#include <mpi.h>

#include <bit>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <vector>

namespace brume::physics {

// Binary exponents (std::frexp convention, value = f·2^e with f in [½, 1)) of the smallest and
// largest positive finite weight on every rank.
struct ExponentWindow {
  int lowest = 0;
  int highest = 0;
};

// Collective over comm: the window of the positive finite entries of `weights` on all ranks
// (a window of one exponent when there are none).
[[nodiscard]] ExponentWindow global_exponent_window(const std::vector<double>& weights,
                                                    MPI_Comm comm);

class ExactBinSums {
 public:
  ExactBinSums(std::size_t bins, ExponentWindow window);

  // Adds a weight of the window to `bin`; zero, negative, non-finite or out-of-window weights
  // are not added (the callers only pass densities, positive by the solver's floor).
  void add(std::size_t bin, double weight) {
    if (!(weight > 0.0) || weight > max_weight_) return;
    // IEEE 754 binary64 fields: for a normal weight, value = m · 2^(e − 53) with the 53-bit
    // integer m (implicit bit set) and e = biased exponent − 1022 (std::frexp's convention).
    const auto bits = std::bit_cast<std::uint64_t>(weight);
    const auto biased = int(bits >> 52);  // the sign bit is 0
    std::uint64_t mantissa = 0;
    int exponent = 0;
    if (biased == 0) {  // subnormal
      mantissa = static_cast<std::uint64_t>(std::ldexp(std::frexp(weight, &exponent), 53));
    } else {
      mantissa = (bits & ((std::uint64_t(1) << 52) - 1)) | (std::uint64_t(1) << 52);
      exponent = biased - 1022;
    }
    if (exponent < window_.lowest) return;
    const int position = exponent - window_.lowest;
    std::int64_t* d =
        digits_.data() + bin * std::size_t(digits_per_bin_) + std::size_t(position / digit_bits);
    const int shift = position % digit_bits;
    const std::uint64_t low = (mantissa & digit_mask) << shift;    // < 2^63
    const std::uint64_t high = (mantissa >> digit_bits) << shift;  // < 2^52
    d[0] += std::int64_t(low & digit_mask);
    d[1] += std::int64_t((low >> digit_bits) + (high & digit_mask));
    d[2] += std::int64_t(high >> digit_bits);
    if (++pending_ >= adds_between_carries) propagate_carries();
  }

  // Sum over every rank of comm (collective, one MPI_Allreduce); the same on every rank.
  void combine(MPI_Comm comm);

  [[nodiscard]] std::size_t bins() const { return bins_; }
  // The exact sum of one bin rounded to a double (within one unit in the last place,
  // deterministically: it depends on the exact sum only).
  [[nodiscard]] double value(std::size_t bin) const;
  // The exact sum over every bin, rounded the same way.
  [[nodiscard]] double total() const;

 private:
  static constexpr int digit_bits = 32;
  static constexpr std::uint64_t digit_mask = (std::uint64_t(1) << digit_bits) - 1;
  // Each add puts < 2^32 into a digit: 2^30 adds keep every digit below 2^62.
  static constexpr long adds_between_carries = 1L << 30;

  void propagate_carries();
  [[nodiscard]] double rounded(const std::int64_t* digits) const;

  std::size_t bins_ = 0;
  ExponentWindow window_;
  int digits_per_bin_ = 0;
  double max_weight_ = 0.0;
  std::vector<std::int64_t> digits_;
  long pending_ = 0;
};

}  // namespace brume::physics
