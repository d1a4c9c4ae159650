// What the problems' random fields share: their random numbers, fully specified by the standard
// (the raw bits of std::mt19937_64) so that the same seed gives the same field with any standard
// library, and the wave vectors of a shell of Fourier modes.
#pragma once

#include <array>
#include <cmath>
#include <numbers>
#include <random>
#include <vector>

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

// The wave vectors with lowest ≤ |k| ≤ highest (units of 2π/L; k_d = 0 along an inactive axis), one
// of each ±k pair, in a fixed order (x slowest).
inline std::vector<std::array<int, 3>> shell_wave_vectors(std::array<bool, 3> active, int lowest,
                                                          int highest) {
  std::array<int, 3> reach{};
  for (int d = 0; d < 3; ++d)
    reach[d] = active[d] ? highest : 0;
  std::vector<std::array<int, 3>> shell;
  for (int kx = -reach[0]; kx <= reach[0]; ++kx) {
    for (int ky = -reach[1]; ky <= reach[1]; ++ky) {
      for (int kz = -reach[2]; kz <= reach[2]; ++kz) {
        const std::array<int, 3> k{kx, ky, kz};
        const int k2 = kx * kx + ky * ky + kz * kz;
        if (k2 >= lowest * lowest && k2 <= highest * highest && upper_half(k)) shell.push_back(k);
      }
    }
  }
  return shell;
}

}  // namespace brume::problems
