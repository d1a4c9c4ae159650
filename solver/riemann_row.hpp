// The Riemann solver over a row of faces: states and fluxes in structure-of-arrays row buffers,
// one loop over the faces with the solver inlined (select-based, no branches), so that the
// compiler vectorizes it across faces.
#pragma once

#include <cstdint>

#include "solver/riemann/face_state.hpp"
#include "solver/riemann/mass_flux_sign.hpp"

namespace brume::solver {

// One side of a row of faces: primitive variables in the face frame (bt1, bt2 unused for
// hydrodynamics, pressure unused for isothermal gas).
struct FaceRowStates {
  const double *density, *vn, *vt1, *vt2, *pressure, *bt1, *bt2;
};

// Fluxes of a row of faces; emf1 = E_t1 = flux of B_t2, emf2 = E_t2 = −flux of B_t1, and the
// sign of the mass flux, zero when negligible (mass_flux_sign; MHD only; nullptr for
// hydrodynamics).
struct FluxRow {
  double *density, *mn, *mt1, *mt2, *energy;
  double *emf1, *emf2;
  std::int8_t* sign;
};

// Fluxes through the faces m = 0 … n−1 between left[m] and right[m]; bn[m] is the normal field.
template <class Eos, bool Magnetic, class Solver>
[[gnu::flatten]] void riemann_row(const FaceRowStates& left, const FaceRowStates& right,
                                  const double* bn, int n, const Eos& eos, const FluxRow& out) {
#pragma GCC ivdep
  for (int m = 0; m < n; ++m) {
    FaceState l{left.density[m], left.vn[m], left.vt1[m], left.vt2[m], 0.0, 0.0, 0.0};
    FaceState r{right.density[m], right.vn[m], right.vt1[m], right.vt2[m], 0.0, 0.0, 0.0};
    if constexpr (Eos::isothermal) {
      l.pressure = eos.sound_speed_sq(l.density, 0.0) * l.density;
      r.pressure = eos.sound_speed_sq(r.density, 0.0) * r.density;
    } else {
      l.pressure = left.pressure[m];
      r.pressure = right.pressure[m];
    }
    double b = 0.0;
    if constexpr (Magnetic) {
      l.bt1 = left.bt1[m];
      l.bt2 = left.bt2[m];
      r.bt1 = right.bt1[m];
      r.bt2 = right.bt2[m];
      b = bn[m];
    }
    const FaceFlux f = Solver::template flux<Eos, Magnetic>(l, r, b, eos);
    out.density[m] = f.density;
    out.mn[m] = f.mn;
    out.mt1[m] = f.mt1;
    out.mt2[m] = f.mt2;
    if constexpr (!Eos::isothermal) out.energy[m] = f.energy;
    if constexpr (Magnetic) {
      out.emf1[m] = f.bt2;
      out.emf2[m] = -f.bt1;
    }
  }
  if constexpr (Magnetic) {
    for (int m = 0; m < n; ++m) {
      out.sign[m] = mass_flux_sign(out.density[m], left.density[m] + right.density[m], out.mn[m]);
    }
  }
}

}  // namespace brume::solver
