#include "physics/stirring_modes.hpp"

#include <cmath>

namespace brume::physics {

double stirring_profile_weight(StirringProfile profile, double magnitude, int lowest, int highest) {
  if (profile == StirringProfile::flat || highest == lowest) return 1.0;
  const double middle = 0.5 * double(lowest + highest);
  const double half_width = 0.5 * double(highest - lowest);
  const double x = (magnitude - middle) / half_width;
  return std::fmax(0.0, 1.0 - x * x);
}

std::array<double, 9> helmholtz_projection(const std::array<int, 3>& n,
                                           const std::array<double, 3>& box_size,
                                           double solenoidal_weight) {
  std::array<double, 3> k{};
  double k2 = 0.0;
  for (int d = 0; d < 3; ++d) {
    k[std::size_t(d)] = double(n[std::size_t(d)]) / box_size[std::size_t(d)];
    k2 += k[std::size_t(d)] * k[std::size_t(d)];
  }
  const double zeta = solenoidal_weight;
  std::array<double, 9> p{};
  for (std::size_t i = 0; i < 3; ++i) {
    for (std::size_t j = 0; j < 3; ++j)
      p[3 * i + j] = (i == j ? zeta : 0.0) + (1.0 - 2.0 * zeta) * k[i] * k[j] / k2;
  }
  return p;
}

std::vector<StirringMode> stirring_modes(int lowest, int highest, StirringProfile profile,
                                         double solenoidal_weight,
                                         const std::array<double, 3>& box_size,
                                         const std::array<bool, 3>& active) {
  std::vector<StirringMode> modes;
  std::array<int, 3> reach{};
  for (std::size_t d = 0; d < 3; ++d)
    reach[d] = active[d] ? highest : 0;
  for (int nx = 0; nx <= reach[0]; ++nx) {
    for (int ny = -reach[1]; ny <= reach[1]; ++ny) {
      for (int nz = -reach[2]; nz <= reach[2]; ++nz) {
        // One of each ±n pair: the first non-zero component is positive.
        const bool representative = nx > 0 || (nx == 0 && (ny > 0 || (ny == 0 && nz > 0)));
        if (!representative) continue;
        const int n2 = nx * nx + ny * ny + nz * nz;
        if (n2 < lowest * lowest || n2 > highest * highest) continue;
        const double weight =
            stirring_profile_weight(profile, std::sqrt(double(n2)), lowest, highest);
        if (weight <= 0.0) continue;
        StirringMode mode;
        mode.n = {nx, ny, nz};
        mode.weight = weight;
        mode.projection = helmholtz_projection(mode.n, box_size, solenoidal_weight);
        modes.push_back(mode);
      }
    }
  }
  return modes;
}

}  // namespace brume::physics
