// A random, divergence-free vector field made of a few Fourier modes of a periodic box, evaluated
// from global coordinates so that it is the same whatever the decomposition of the box.
#pragma once

#include <array>
#include <cstdint>
#include <vector>

namespace brume::problems {

struct SolenoidalMode {
  std::array<int, 3> wave_number;   // in units of 2π / L per axis
  std::array<double, 3> amplitude;  // perpendicular to the wave vector
  double phase;
};

class RandomSolenoidalField {
 public:
  // Modes with lowest ≤ |k| ≤ highest (k in units of 2π/L; k_d = 0 along an axis with one cell),
  // one of each ±k pair, amplitudes Gaussian and projected perpendicular to k, phases uniform;
  // scaled so that the volume-averaged |v|² over the box is rms².
  RandomSolenoidalField(std::array<double, 3> box_size, std::array<bool, 3> active, int lowest,
                        int highest, double rms, std::uint64_t seed);

  [[nodiscard]] std::array<double, 3> operator()(double x, double y, double z) const;
  [[nodiscard]] const std::vector<SolenoidalMode>& modes() const { return modes_; }

 private:
  std::array<double, 3> box_size_;
  std::vector<SolenoidalMode> modes_;
};

}  // namespace brume::problems
