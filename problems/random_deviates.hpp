// The random numbers of the problems' random fields: fully specified by the standard (the raw bits
// of std::mt19937_64), so that the same seed gives the same field with any standard library.
#pragma once

#include <array>
#include <cmath>
#include <numbers>
#include <random>

namespace brume::problems {

// A uniform deviate in (0, 1) from the generator's raw 53 bits.
inline double uniform_deviate(std::mt19937_64& generator) {
  return (static_cast<double>(generator() >> 11) + 0.5) * 0x1.0p-53;
}

// Box–Muller transform (Box & Muller 1958, Ann. Math. Statist. 29, 610).
inline double gaussian_deviate(std::mt19937_64& generator) {
  const double u1 = uniform_deviate(generator);
  const double u2 = uniform_deviate(generator);
  return std::sqrt(-2.0 * std::log(u1)) * std::cos(2.0 * std::numbers::pi * u2);
}

// One of each ±k pair of wave vectors: the first non-zero component is positive.
inline bool upper_half(const std::array<int, 3>& k) {
  if (k[0] != 0) return k[0] > 0;
  if (k[1] != 0) return k[1] > 0;
  return k[2] > 0;
}

}  // namespace brume::problems
