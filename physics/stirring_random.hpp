// Counter-based Gaussian numbers for the stirring: draw number n of a seed is a pure function of
// (seed, n), so every rank draws the same numbers without communication, whatever the
// decomposition, and a checkpoint needs only the next draw number.
#pragma once

#include <cmath>
#include <cstdint>
#include <numbers>

namespace brume::physics {

// The 64-bit finalizer of SplitMix64 (Steele, Lea & Flood 2014, OOPSLA '14, "Fast splittable
// pseudorandom number generators", the mix function), applied to a Weyl sequence of the seed.
[[nodiscard]] constexpr std::uint64_t stirring_hash(std::uint64_t seed, std::uint64_t draw) {
  std::uint64_t z = seed * 0x9e3779b97f4a7c15ULL + (draw + 1) * 0xbf58476d1ce4e5b9ULL;
  z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9ULL;
  z = (z ^ (z >> 27)) * 0x94d049bb133111ebULL;
  return z ^ (z >> 31);
}

// A uniform number in (0, 1]: the top 53 bits, shifted away from zero so that its log is finite.
[[nodiscard]] inline double stirring_uniform(std::uint64_t seed, std::uint64_t draw) {
  return (double(stirring_hash(seed, draw) >> 11) + 1.0) * 0x1.0p-53;
}

// Two independent standard normal numbers from draws 2m and 2m + 1 (Box & Muller 1958, Ann.
// Math. Stat. 29, 610, their eqs. for X1, X2).
struct NormalPair {
  double first;
  double second;
};
[[nodiscard]] inline NormalPair stirring_normal_pair(std::uint64_t seed, std::uint64_t pair) {
  const double u1 = stirring_uniform(seed, 2 * pair);
  const double u2 = stirring_uniform(seed, 2 * pair + 1);
  const double radius = std::sqrt(-2.0 * std::log(u1));
  const double angle = 2.0 * std::numbers::pi * u2;
  return {radius * std::cos(angle), radius * std::sin(angle)};
}

}  // namespace brume::physics
