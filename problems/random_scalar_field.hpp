// A random scalar field made of a few Fourier modes of a periodic box, evaluated from global
// coordinates so that it is the same whatever the decomposition of the box.
#pragma once

#include <array>
#include <cstdint>
#include <vector>

namespace brume::problems {

class RandomScalarField {
 public:
  // Modes with lowest ≤ |k| ≤ highest (k in units of 2π/L; k_d = 0 along an axis with one cell),
  // one of each ±k pair, Gaussian amplitudes, uniform phases; scaled so that the volume average
  // of the field's square over the box is rms².
  RandomScalarField(std::array<double, 3> box_size, std::array<bool, 3> active, int lowest,
                    int highest, double rms, std::uint64_t seed);

  [[nodiscard]] double operator()(double x, double y, double z) const;

 private:
  struct Mode {
    std::array<int, 3> wave_number;
    double amplitude;
    double phase;
  };
  std::array<double, 3> box_size_;
  std::vector<Mode> modes_;
};

}  // namespace brume::problems
