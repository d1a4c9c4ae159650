#include "physics/spectra_power.hpp"

#include <complex>
#include <cstddef>

namespace brume::physics {

namespace {

using Complex = std::complex<double>;

struct Parts {
  double solenoidal = 0.0;
  double compressive = 0.0;
};

// |k × a|² and |k·a|² for one wave vector, both without cancellation of large terms.
Parts projected(const std::array<double, 3>& k, const std::array<Complex, 3>& a) {
  const Complex dot = k[0] * a[0] + k[1] * a[1] + k[2] * a[2];
  const Complex cx = k[1] * a[2] - k[2] * a[1];
  const Complex cy = k[2] * a[0] - k[0] * a[2];
  const Complex cz = k[0] * a[1] - k[1] * a[0];
  return {std::norm(cx) + std::norm(cy) + std::norm(cz), std::norm(dot)};
}

// The parts averaged over the signs of the Nyquist components (bits of `nyquist`).
Parts averaged(std::array<double, 3> k, const std::array<Complex, 3>& a, unsigned nyquist) {
  Parts sum;
  int combinations = 0;
  for (unsigned flips = nyquist;; flips = (flips - 1) & nyquist) {
    std::array<double, 3> signed_k = k;
    for (unsigned d = 0; d < 3; ++d)
      if (flips & (1u << d)) signed_k[d] = -k[d];
    const Parts p = projected(signed_k, a);
    sum.solenoidal += p.solenoidal;
    sum.compressive += p.compressive;
    ++combinations;
    if (flips == 0) break;
  }
  sum.solenoidal /= combinations;
  sum.compressive /= combinations;
  return sum;
}

}  // namespace

void add_shell_power(const SpectralShells& geometry, Coefficients a, std::span<double> shells) {
  const std::int32_t* shell = geometry.shell.data();
  const double* weight = geometry.weight.data();
  for (std::size_t c = 0; c < a.size(); ++c)
    shells[std::size_t(shell[c])] += weight[c] * std::norm(a[c]);
}

void add_helmholtz_power(const SpectralShells& geometry, const std::array<Coefficients, 3>& a,
                         std::span<double> solenoidal, std::span<double> compressive) {
  const std::size_t nx = geometry.k[0].size(), ny = geometry.k[1].size();
  const std::size_t nz = geometry.k[2].size();
  std::size_t c = 0;
  for (std::size_t z = 0; z < nz; ++z) {
    for (std::size_t y = 0; y < ny; ++y) {
      const unsigned row_nyquist =
          (geometry.nyquist[1][y] ? 2u : 0u) | (geometry.nyquist[2][z] ? 4u : 0u);
      for (std::size_t x = 0; x < nx; ++x, ++c) {
        const std::array<double, 3> k = {geometry.k[0][x], geometry.k[1][y], geometry.k[2][z]};
        const double k2 = k[0] * k[0] + k[1] * k[1] + k[2] * k[2];
        if (k2 == 0.0) continue;  // the mean flow: neither part
        const unsigned nyquist = row_nyquist | (geometry.nyquist[0][x] ? 1u : 0u);
        const std::array<Complex, 3> coefficient = {a[0][c], a[1][c], a[2][c]};
        const Parts p =
            nyquist == 0 ? projected(k, coefficient) : averaged(k, coefficient, nyquist);
        const std::size_t s = std::size_t(geometry.shell[c]);
        const double w = geometry.weight[c] / k2;
        solenoidal[s] += w * p.solenoidal;
        compressive[s] += w * p.compressive;
      }
    }
  }
}

}  // namespace brume::physics
