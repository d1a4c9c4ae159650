#include "problems/oblique_wave_frame.hpp"

#include <cmath>
#include <stdexcept>

namespace brume::problems {

namespace {

constexpr double two_pi = 6.283185307179586476925286766559;

using Vec = std::array<double, 3>;

Vec cross(const Vec& a, const Vec& b) {
  return {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
}

Vec normalized(const Vec& a) {
  const double n = std::hypot(a[0], a[1], a[2]);
  return {a[0] / n, a[1] / n, a[2] / n};
}

}  // namespace

double ObliqueWave::phase(double x, double y, double z) const {
  return wave_vector[0] * (x - origin[0]) + wave_vector[1] * (y - origin[1]) +
         wave_vector[2] * (z - origin[2]);
}

std::array<double, 3> ObliqueWave::to_box(const std::array<double, 3>& v) const {
  Vec out{};
  for (std::size_t d = 0; d < 3; ++d)
    out[d] = v[0] * along[d] + v[1] * transverse1[d] + v[2] * transverse2[d];
  return out;
}

VectorPotential ObliqueWave::potential(const TransverseField& b) const {
  return [wave = *this, b](double x, double y, double z) {
    const double phi = wave.phase(x, y, z);
    const double s = std::sin(phi), c = std::cos(phi), k = wave.wavenumber;
    // ∫ (a sin φ + b cos φ) dξ = (−a cos φ + b sin φ)/k.
    const double a1 = (-b.t2_sin * c + b.t2_cos * s) / k;
    const double a2 = -(-b.t1_sin * c + b.t1_cos * s) / k;
    return wave.to_box({0.0, a1, a2});
  };
}

ObliqueWave box_diagonal_wave(const std::array<double, 3>& lower, const std::array<double, 3>& size,
                              const std::array<long, 3>& cells) {
  ObliqueWave w;
  w.origin = lower;
  for (std::size_t d = 0; d < 3; ++d)
    w.wave_vector[d] = cells[d] > 1 ? two_pi / size[d] : 0.0;
  w.wavenumber = std::hypot(w.wave_vector[0], w.wave_vector[1], w.wave_vector[2]);
  if (!(w.wavenumber > 0.0)) throw std::invalid_argument("box_diagonal_wave: no active axis");
  w.wavelength = two_pi / w.wavenumber;
  w.along = normalized(w.wave_vector);
  const Vec z{0, 0, 1}, x{1, 0, 0};
  const Vec zk = cross(z, w.along);
  w.transverse1 = normalized(std::hypot(zk[0], zk[1], zk[2]) > 1e-12 ? zk : cross(x, w.along));
  w.transverse2 = cross(w.along, w.transverse1);
  return w;
}

}  // namespace brume::problems
