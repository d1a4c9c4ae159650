#include "solver/exact_sum.hpp"

#include <algorithm>
#include <bit>
#include <cmath>
#include <limits>

namespace brume::solver {

namespace {
constexpr std::int64_t digit_mask = (std::int64_t(1) << 32) - 1;
constexpr int lowest_exponent = -1074;  // weight of bit 0 of digit 0
}  // namespace

void ExactSum::add(double value) {
  // Read the IEEE 754 binary64 fields directly (no frexp/ldexp calls): |value| = mantissa ·
  // 2^(position − 1074) with an integer mantissa < 2^53, position ≥ 0.
  const auto bits = std::bit_cast<std::uint64_t>(value);
  const int biased = int((bits >> 52) & 0x7ff);
  if (biased == 0x7ff) {  // infinity or NaN
    ++non_finite_;
    return;
  }
  std::uint64_t mantissa = bits & ((std::uint64_t(1) << 52) - 1);
  int position = 0;  // subnormal (or zero): mantissa · 2^-1074
  if (biased != 0) {
    mantissa |= std::uint64_t(1) << 52;
    position = biased - 1;
  } else if (mantissa == 0) {
    return;
  }
  const int digit = position / digit_bits;
  const int shift = position % digit_bits;
  const std::uint64_t low = (mantissa & std::uint64_t(digit_mask)) << shift;  // < 2^63
  const std::uint64_t high = (mantissa >> digit_bits) << shift;               // < 2^52
  const std::int64_t sign = (bits >> 63) != 0 ? -1 : 1;
  digits_[std::size_t(digit)] += sign * std::int64_t(low & std::uint64_t(digit_mask));
  digits_[std::size_t(digit) + 1] +=
      sign * std::int64_t((low >> digit_bits) + (high & std::uint64_t(digit_mask)));
  digits_[std::size_t(digit) + 2] += sign * std::int64_t(high >> digit_bits);
  if (++pending_ >= adds_between_carries) propagate_carries();
}

// Brings every digit but the last into [0, 2^32); the last carries the sign of the sum.
void ExactSum::propagate_carries() {
  for (int i = 0; i + 1 < digit_count; ++i) {
    const std::int64_t carry = digits_[std::size_t(i)] >> digit_bits;  // floor division
    digits_[std::size_t(i)] -= carry * (std::int64_t(1) << digit_bits);
    digits_[std::size_t(i) + 1] += carry;
  }
  pending_ = 0;
}

void ExactSum::combine(MPI_Comm comm) {
  propagate_carries();
  std::array<std::int64_t, digit_count + 1> local{};
  for (int i = 0; i < digit_count; ++i)
    local[std::size_t(i)] = digits_[std::size_t(i)];
  local[digit_count] = non_finite_;
  std::array<std::int64_t, digit_count + 1> total{};
  // Integer addition is associative: the order in which ranks arrive does not matter.
  MPI_Allreduce(local.data(), total.data(), digit_count + 1, MPI_INT64_T, MPI_SUM, comm);
  for (int i = 0; i < digit_count; ++i)
    digits_[std::size_t(i)] = total[std::size_t(i)];
  non_finite_ = total[digit_count];
  propagate_carries();
}

double ExactSum::value() const {
  if (non_finite_ != 0) return std::numeric_limits<double>::quiet_NaN();
  ExactSum copy = *this;
  copy.propagate_carries();
  auto& d = copy.digits_;
  const bool negative = d[digit_count - 1] < 0;
  if (negative) {  // magnitude of the two's-complement-like digit string
    for (auto& x : d)
      x = -x;
    copy.propagate_carries();
  }
  int top = digit_count - 1;
  while (top >= 0 && d[std::size_t(top)] == 0)
    --top;
  if (top < 0) return 0.0;
  // The three leading digits hold at least 65 significant bits: adding them from the top rounds
  // twice at most, so the result is within one unit in the last place, and it depends on the
  // exact sum only, never on the order of the additions.
  double result = 0.0;
  for (int i = top; i >= 0 && i >= top - 2; --i) {
    result += std::ldexp(double(d[std::size_t(i)]), lowest_exponent + digit_bits * i);
  }
  return negative ? -result : result;
}

}  // namespace brume::solver
