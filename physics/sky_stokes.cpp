#include "physics/sky_stokes.hpp"

#include <cmath>
#include <numbers>

namespace brume::physics {

// Optically thin emission of aligned grains with a constant intrinsic polarization fraction p0 and
// a uniform source function: Planck Collaboration Int. XX 2015 (A&A 576, A105), eqs. 5–7 (from
// memory): I = ∫ n [1 − p0 (cos²γ − 2/3)] ds, Q = p0 ∫ n cos²γ cos 2ψ ds,
// U = p0 ∫ n cos²γ sin 2ψ ds; with `intensity: column`, I = ∫ n ds (the same Q and U).
SkyStokesMaps sky_stokes_maps(const SkyColumnSums& sums, const SkySettings& settings,
                              double to_number_column) {
  SkyStokesMaps m;
  m.geometry = sums.geometry;
  const std::size_t n = sums.geometry.pixels();
  m.column_density.resize(n);
  m.i.resize(n);
  m.q.resize(n);
  m.u.resize(n);
  m.fraction.resize(n);
  m.angle.resize(n);
  m.field_angle.resize(n);
  const double p0 = settings.polarization_fraction;
  const bool corrected = settings.intensity == SkyIntensity::alignment_corrected;
  const double to_degrees = 90.0 / std::numbers::pi;  // ½ · 180/π
  for (std::size_t c = 0; c < n; ++c) {
    const double mass = sums.maps[sky_mass][c];
    const double intensity = corrected ? mass - p0 * sums.maps[sky_alignment][c] : mass;
    const double q = p0 * sums.maps[sky_q][c] * to_number_column;
    const double u = p0 * sums.maps[sky_u][c] * to_number_column;
    m.column_density[c] = mass * to_number_column;
    m.i[c] = intensity * to_number_column;
    m.q[c] = q;
    m.u[c] = u;
    const bool lit = m.i[c] > 0.0;
    m.fraction[c] = lit ? std::hypot(q, u) / m.i[c] : 0.0;
    const double psi = lit ? std::atan2(u, q) * to_degrees : 0.0;
    m.angle[c] = psi;
    m.field_angle[c] = psi > 0.0 ? psi - 90.0 : psi + 90.0;
  }
  return m;
}

}  // namespace brume::physics
