// The annuli of a map's Fourier plane. A mode (n_u, n_v) has the wavenumber
// κ = L sqrt((n_u / L_u)² + (n_v / L_v)²) in units of 2π / L, L the longer map edge; annulus m
// holds m − ½ ≤ κ < m + ½. Only annuli below both Nyquist wavenumbers are kept, so no annulus is
// cut by the edge of the Fourier plane (common practice, no source).
#pragma once

#include <algorithm>
#include <cmath>

#include "physics/sky_map_geometry.hpp"

namespace brume::physics {

[[nodiscard]] inline double sky_longer_edge(const SkyMapGeometry& g) {
  return std::max(g.size_u, g.size_v);
}

// The largest annulus index m whose upper edge m + ½ stays at or below both Nyquist wavenumbers
// κ_N = L N / (2 L_edge); 0 when the map holds no full annulus.
[[nodiscard]] inline long sky_largest_annulus(const SkyMapGeometry& g) {
  const double longer = sky_longer_edge(g);
  const double nyquist = std::min(longer * double(g.cells_u) / (2.0 * g.size_u),
                                  longer * double(g.cells_v) / (2.0 * g.size_v));
  return std::max(0L, long(std::floor(nyquist - 0.5)));
}

// The signed Fourier index of FFT position `i` of `n`.
[[nodiscard]] inline long signed_frequency(long i, long n) {
  return 2 * i < n ? i : i - n;
}

}  // namespace brume::physics
