#include "problems/random_solenoidal_field.hpp"

#include <cmath>
#include <numbers>
#include <random>

#include "problems/random_field_parts.hpp"

namespace brume::problems {

RandomSolenoidalField::RandomSolenoidalField(std::array<double, 3> box_size,
                                             std::array<bool, 3> active, int lowest, int highest,
                                             double rms, std::uint64_t seed)
    : box_size_(box_size) {
  std::mt19937_64 generator(seed);
  double mean_square = 0.0;
  for (const std::array<int, 3>& k : shell_wave_vectors(active, lowest, highest)) {
    // Wave vector in physical units, for the projection perpendicular to it.
    std::array<double, 3> kv{};
    double kv2 = 0.0;
    for (int d = 0; d < 3; ++d) {
      kv[d] = k[d] / box_size[d];
      kv2 += kv[d] * kv[d];
    }
    std::array<double, 3> a{gaussian_deviate(generator), gaussian_deviate(generator),
                            gaussian_deviate(generator)};
    const double along = (a[0] * kv[0] + a[1] * kv[1] + a[2] * kv[2]) / kv2;
    for (int d = 0; d < 3; ++d)
      a[d] -= along * kv[d];
    const double phase = 2.0 * std::numbers::pi * uniform_deviate(generator);
    modes_.push_back({k, a, phase});
    // ⟨sin²⟩ = 1/2 over the box for every mode, and distinct modes are orthogonal.
    mean_square += 0.5 * (a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
  }
  const double scale = mean_square > 0.0 ? rms / std::sqrt(mean_square) : 0.0;
  for (auto& mode : modes_) {
    for (double& component : mode.amplitude)
      component *= scale;
  }
}

std::array<double, 3> RandomSolenoidalField::operator()(double x, double y, double z) const {
  std::array<double, 3> v{0.0, 0.0, 0.0};
  for (const auto& mode : modes_) {
    const double argument =
        2.0 * std::numbers::pi *
            (mode.wave_number[0] * x / box_size_[0] + mode.wave_number[1] * y / box_size_[1] +
             mode.wave_number[2] * z / box_size_[2]) +
        mode.phase;
    const double s = std::sin(argument);
    for (int d = 0; d < 3; ++d)
      v[d] += mode.amplitude[d] * s;
  }
  return v;
}

}  // namespace brume::problems
