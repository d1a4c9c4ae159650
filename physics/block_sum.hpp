// An exact sum of doubles over one block, fast enough for a few adds per cell: the same long
// fixed-point layout as solver::ExactSum (bit 0 of digit 0 weighs 2^-1074, 32-bit digits in 64-bit
// words, carries deferred; after Kulisch & Miranker 1986, SIAM Review 28, 1), but the exponent and
// mantissa are read from the bits instead of through frexp/ldexp. The block's total is handed to
// an ExactSum as a few doubles whose exact sum it is, so the global combination stays the shared
// one and the result does not depend on the number of ranks.
#pragma once

#include <array>
#include <bit>
#include <cmath>
#include <cstdint>
#include <limits>

#include <mpi.h>

#include "solver/exact_sum.hpp"

namespace brume::physics {

class BlockSum {
 public:
  void add(double value) {
    const auto bits = std::bit_cast<std::uint64_t>(value);
    const auto biased = int((bits >> 52) & 0x7ff);
    if (biased == 0x7ff) {  // inf or NaN: the total is NaN, as ExactSum makes it
      non_finite_ = true;
      return;
    }
    std::uint64_t mantissa = bits & ((std::uint64_t(1) << 52) - 1);
    // |value| = mantissa · 2^(position − 1074): normal numbers carry the hidden bit.
    int position = 0;
    if (biased != 0) {
      mantissa |= std::uint64_t(1) << 52;
      position = biased - 1;
    }
    const int digit = position >> 5;
    const int shift = position & 31;
    const std::uint64_t low = (mantissa & mask) << shift;  // < 2^63
    const std::uint64_t high = (mantissa >> 32) << shift;  // < 2^52
    const std::int64_t sign = std::int64_t(bits >> 63) * -2 + 1;
    digits_[std::size_t(digit)] += sign * std::int64_t(low & mask);
    digits_[std::size_t(digit) + 1] += sign * std::int64_t((low >> 32) + (high & mask));
    digits_[std::size_t(digit) + 2] += sign * std::int64_t(high >> 32);
    if (++pending_ >= adds_between_carries) propagate_carries();
  }

  // Adds this block's exact total to `sum` (as at most digit_count exact doubles).
  void add_to(solver::ExactSum& sum) {
    if (non_finite_) {
      sum.add(std::numeric_limits<double>::quiet_NaN());
      return;
    }
    propagate_carries();
    // The digits of the magnitude, each in [0, 2^32) after the carries: digit · 2^(32 i − 1074)
    // is then a double exactly, subnormal or not, for every total below 2^1024.
    std::array<std::int64_t, digit_count> magnitude = digits_;
    const bool negative = magnitude[digit_count - 1] < 0;
    if (negative) {
      for (auto& d : magnitude)
        d = -d;
      propagate(magnitude);
    }
    for (int i = 0; i < digit_count; ++i) {
      if (magnitude[std::size_t(i)] == 0) continue;
      const double part = std::ldexp(double(magnitude[std::size_t(i)]), 32 * i - 1074);
      sum.add(negative ? -part : part);
    }
  }

 private:
  static constexpr std::uint64_t mask = (std::uint64_t(1) << 32) - 1;
  static constexpr int digit_count = 68;  // 66 reach past 2^1024; two for carries
  static constexpr long adds_between_carries = 1L << 28;

  // Brings every digit but the last into [0, 2^32); the last carries the sign of the total.
  static void propagate(std::array<std::int64_t, digit_count>& d) {
    for (std::size_t i = 0; i + 1 < d.size(); ++i) {
      const std::int64_t carry = d[i] >> 32;  // floor division
      d[i] -= carry * (std::int64_t(1) << 32);
      d[i + 1] += carry;
    }
  }
  void propagate_carries() {
    propagate(digits_);
    pending_ = 0;
  }

  std::array<std::int64_t, digit_count> digits_{};
  bool non_finite_ = false;
  long pending_ = 0;
};

// Whether MPI is running (MPI_Initialized and MPI_Finalized may be called at any time): a block
// on its own, in unit tests without MPI, needs no combination.
inline bool mpi_is_running() {
  int initialized = 0, finalized = 0;
  MPI_Initialized(&initialized);
  MPI_Finalized(&finalized);
  return initialized != 0 && finalized == 0;
}

// The exact total of `block` over every rank of `comm`.
inline double total_over(BlockSum block, MPI_Comm comm) {
  solver::ExactSum sum;
  block.add_to(sum);
  if (mpi_is_running()) sum.combine(comm);
  return sum.value();
}

// A block sum that holds `value` on the first rank of `comm` only, so that the total counts it
// once (a total carried over from a checkpoint).
inline BlockSum held_once(double value, MPI_Comm comm) {
  BlockSum block;
  int rank = 0;
  if (mpi_is_running()) MPI_Comm_rank(comm, &rank);
  if (rank == 0) block.add(value);
  return block;
}

}  // namespace brume::physics
