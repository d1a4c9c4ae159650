#include "problems/random_scalar_field.hpp"

#include <cmath>
#include <numbers>
#include <random>

#include "problems/random_field_parts.hpp"

namespace brume::problems {

RandomScalarField::RandomScalarField(std::array<double, 3> box_size, std::array<bool, 3> active,
                                     int lowest, int highest, double rms, std::uint64_t seed)
    : box_size_(box_size) {
  std::mt19937_64 generator(seed);
  double mean_square = 0.0;
  for (const std::array<int, 3>& k : shell_wave_vectors(active, lowest, highest)) {
    const double a = gaussian_deviate(generator);
    modes_.push_back({k, a, 2.0 * std::numbers::pi * uniform_deviate(generator)});
    mean_square += 0.5 * a * a;  // ⟨cos²⟩ = 1/2; distinct modes are orthogonal
  }
  const double scale = mean_square > 0.0 ? rms / std::sqrt(mean_square) : 0.0;
  for (Mode& mode : modes_)
    mode.amplitude *= scale;
}

double RandomScalarField::operator()(double x, double y, double z) const {
  double f = 0.0;
  for (const Mode& mode : modes_) {
    const double argument =
        2.0 * std::numbers::pi *
            (mode.wave_number[0] * x / box_size_[0] + mode.wave_number[1] * y / box_size_[1] +
             mode.wave_number[2] * z / box_size_[2]) +
        mode.phase;
    f += mode.amplitude * std::cos(argument);
  }
  return f;
}

}  // namespace brume::problems
