// Test-side reference: the 1D ideal-MHD (or Euler) flux written from the conserved variables,
// independently of the solver's primitive-variable flux. Templated on the scalar so that it can
// be evaluated in complex arithmetic (complex-step differentiation, mhd_eigen.hpp).
//
// Conserved vector, in this order (x is the wave direction, B_x is a constant parameter):
//   adiabatic MHD  (7): ρ, ρv_x, ρv_y, ρv_z, E, B_y, B_z
//   isothermal MHD (6): ρ, ρv_x, ρv_y, ρv_z, B_y, B_z
//   adiabatic hydro (5) / isothermal hydro (4): the same without B (and without E).
// E = p/(γ−1) + ρv²/2 + B²/2 (code units, magnetic pressure B²/2); isothermal: p = c_s² ρ.
#pragma once

#include <array>

namespace brume::reference {

struct WaveSystem {
  bool magnetic = true;
  bool isothermal = false;
  double gamma = 5.0 / 3.0;  // adiabatic only
  double sound_speed = 1.0;  // isothermal only

  [[nodiscard]] int size() const { return 4 + (isothermal ? 0 : 1) + (magnetic ? 2 : 0); }
  [[nodiscard]] int energy_index() const { return 4; }  // meaningful when !isothermal
  [[nodiscard]] int by_index() const { return isothermal ? 4 : 5; }
  [[nodiscard]] int bz_index() const { return by_index() + 1; }
};

struct Primitive {
  double density, vx, vy, vz, pressure, bx, by, bz;
};

template <class T>
using Vector7 = std::array<T, 7>;  // entries past size() are unused (zero)

[[nodiscard]] inline Vector7<double> to_conserved(const WaveSystem& sys, const Primitive& w) {
  Vector7<double> u{};
  const double by = sys.magnetic ? w.by : 0.0, bz = sys.magnetic ? w.bz : 0.0;
  const double bx = sys.magnetic ? w.bx : 0.0;
  u[0] = w.density;
  u[1] = w.density * w.vx;
  u[2] = w.density * w.vy;
  u[3] = w.density * w.vz;
  if (!sys.isothermal) {
    const double v2 = w.vx * w.vx + w.vy * w.vy + w.vz * w.vz;
    u[4] =
        w.pressure / (sys.gamma - 1.0) + 0.5 * w.density * v2 + 0.5 * (bx * bx + by * by + bz * bz);
  }
  if (sys.magnetic) {
    u[static_cast<std::size_t>(sys.by_index())] = by;
    u[static_cast<std::size_t>(sys.bz_index())] = bz;
  }
  return u;
}

// F(U) of the 1D system (common practice; e.g. Miyoshi & Kusano 2005, J. Comput. Phys. 208, 315,
// eqs. 2–4), with the gas pressure recovered from E.
template <class T>
[[nodiscard]] Vector7<T> conserved_flux(const WaveSystem& sys, const Vector7<T>& u, double bx_in) {
  const std::size_t iby = static_cast<std::size_t>(sys.by_index());
  const T rho = u[0];
  const T vx = u[1] / rho, vy = u[2] / rho, vz = u[3] / rho;
  const double bx = sys.magnetic ? bx_in : 0.0;
  const T by = sys.magnetic ? u[iby] : T(0.0);
  const T bz = sys.magnetic ? u[iby + 1] : T(0.0);
  const T b2 = bx * bx + by * by + bz * bz;
  const T kinetic = 0.5 * (u[1] * vx + u[2] * vy + u[3] * vz);
  const T p = sys.isothermal ? T(sys.sound_speed * sys.sound_speed) * rho
                             : T(sys.gamma - 1.0) * (u[4] - kinetic - 0.5 * b2);
  const T pt = p + 0.5 * b2;
  Vector7<T> f{};
  f[0] = u[1];
  f[1] = u[1] * vx + pt - bx * bx;
  f[2] = u[1] * vy - bx * by;
  f[3] = u[1] * vz - bx * bz;
  if (!sys.isothermal) f[4] = (u[4] + pt) * vx - bx * (vx * bx + vy * by + vz * bz);
  if (sys.magnetic) {
    f[iby] = by * vx - bx * vy;
    f[iby + 1] = bz * vx - bx * vz;
  }
  return f;
}

}  // namespace brume::reference
