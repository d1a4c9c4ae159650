// An exact accumulator of doubles: the sum is held as a fixed-point integer wide enough for every
// finite double, so adding in any order, and combining partial sums from any number of ranks,
// gives the same bits. Rounding to a double happens once, at the end.
//
// The idea of a long fixed-point accumulator is Kulisch's (Kulisch & Miranker 1986, "The
// arithmetic of the digital computer", SIAM Review 28, 1); this layout (32-bit digits in 64-bit
// words, carries deferred) is brume's own.
#pragma once

#include <mpi.h>

#include <array>
#include <cstdint>

namespace brume::solver {

class ExactSum {
 public:
  void add(double value);
  // Sum over every rank of `comm` (collective); the result is the same on every rank.
  void combine(MPI_Comm comm);
  // The exact sum rounded to a double (to nearest within one unit in the last place,
  // deterministically); NaN when a non-finite value was added.
  [[nodiscard]] double value() const;

 private:
  // Bit 0 of digit 0 weighs 2^-1074 (the smallest subnormal); 66 digits reach past 2^1024, the
  // rest leave room for carries of sums of many large values.
  static constexpr int digit_bits = 32;
  static constexpr int digit_count = 72;
  static constexpr long adds_between_carries = 1L << 28;
  void propagate_carries();

  std::array<std::int64_t, digit_count> digits_{};
  std::int64_t non_finite_ = 0;
  long pending_ = 0;
};

}  // namespace brume::solver
