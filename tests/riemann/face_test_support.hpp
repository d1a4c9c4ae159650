// Shared helpers for the Riemann-solver tests: random face states, the reference physical flux
// (tests/reference/conserved_flux.hpp, written from conserved variables) in the face frame,
// and comparisons of fluxes.
#pragma once

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <random>

#include "solver/eos.hpp"
#include "solver/riemann/face_state.hpp"
#include "tests/reference/conserved_flux.hpp"

namespace brume::solver::testing {

inline FaceState random_state(std::mt19937_64& rng, bool magnetic) {
  std::uniform_real_distribution<double> rho(0.1, 10.0), v(-3.0, 3.0), p(0.05, 10.0), b(-3.0, 3.0);
  FaceState s{rho(rng), v(rng), v(rng), v(rng), p(rng), 0.0, 0.0};
  if (magnetic) {
    s.bt1 = b(rng);
    s.bt2 = b(rng);
  }
  return s;
}

template <class Eos>
reference::WaveSystem system_of(const Eos& eos, bool magnetic) {
  reference::WaveSystem sys;
  sys.magnetic = magnetic;
  sys.isothermal = Eos::isothermal;
  if constexpr (Eos::isothermal) {
    sys.sound_speed = eos.sound_speed;
  } else {
    sys.gamma = eos.gamma;
  }
  return sys;
}

// The reference F(U) mapped to the face frame (n → x, t1 → y, t2 → z).
template <class Eos>
FaceFlux reference_flux(const FaceState& s, double bn, const Eos& eos, bool magnetic) {
  const reference::WaveSystem sys = system_of(eos, magnetic);
  const reference::Primitive w{s.density, s.vn, s.vt1, s.vt2, s.pressure, bn, s.bt1, s.bt2};
  const auto f = reference::conserved_flux(sys, reference::to_conserved(sys, w), bn);
  const auto iby = static_cast<std::size_t>(sys.by_index());
  return {f[0],
          f[1],
          f[2],
          f[3],
          sys.isothermal ? 0.0 : f[4],
          magnetic ? f[iby] : 0.0,
          magnetic ? f[iby + 1] : 0.0};
}

inline double max_abs(const FaceFlux& f) {
  return std::max({std::abs(f.density), std::abs(f.mn), std::abs(f.mt1), std::abs(f.mt2),
                   std::abs(f.energy), std::abs(f.bt1), std::abs(f.bt2)});
}

inline double max_difference(const FaceFlux& a, const FaceFlux& b) {
  return max_abs({a.density - b.density, a.mn - b.mn, a.mt1 - b.mt1, a.mt2 - b.mt2,
                  a.energy - b.energy, a.bt1 - b.bt1, a.bt2 - b.bt2});
}

inline bool all_finite(const FaceFlux& f) {
  return std::isfinite(f.density) && std::isfinite(f.mn) && std::isfinite(f.mt1) &&
         std::isfinite(f.mt2) && std::isfinite(f.energy) && std::isfinite(f.bt1) &&
         std::isfinite(f.bt2);
}

// Component-wise closeness |a − b| ≤ tol · (1 + max |a|).
inline ::testing::AssertionResult fluxes_close(const FaceFlux& a, const FaceFlux& b, double tol) {
  const double scale = 1.0 + std::max(max_abs(a), max_abs(b));
  const double d = max_difference(a, b);
  if (d <= tol * scale) return ::testing::AssertionSuccess();
  return ::testing::AssertionFailure()
         << "max |difference| " << d << " > " << tol << " × " << scale << "\n  a = {" << a.density
         << ", " << a.mn << ", " << a.mt1 << ", " << a.mt2 << ", " << a.energy << ", " << a.bt1
         << ", " << a.bt2 << "}\n  b = {" << b.density << ", " << b.mn << ", " << b.mt1 << ", "
         << b.mt2 << ", " << b.energy << ", " << b.bt1 << ", " << b.bt2 << "}";
}

}  // namespace brume::solver::testing
