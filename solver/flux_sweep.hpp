// One directional sweep of a finite-volume stage: fluxes through every d-face, the conservative
// update of the target cells, and (MHD) the face EMFs and mass-flux signs for constrained
// transport. Loops run k, j, i with i innermost and unit stride for every d; the stencil moves by
// the linear step of d, so x, y and z sweeps vectorize alike.
#pragma once

#include <cstddef>
#include <cstdint>

#include "solver/face_flux.hpp"
#include "solver/stage_scratch.hpp"
#include "solver/state.hpp"

namespace brume::solver {

// Index ranges [lo, hi) of the faces a sweep along d visits: all d-faces of the interior, and for
// MHD one extra layer on each side in the active tangential directions (the edge EMFs need them).
struct FaceRange {
  int lo[3], hi[3];
};

[[nodiscard]] inline FaceRange sweep_range(const BlockGeometry& g, int d, bool magnetic) {
  FaceRange r{};
  for (int e = 0; e < 3; ++e) {
    const bool wide = e != d && magnetic && g.active(e);
    r.lo[e] = wide ? -1 : 0;
    r.hi[e] = e == d ? g.cells[e] + 1 : g.cells[e] + (wide ? 1 : 0);
  }
  return r;
}

// Fluxes along the active direction d from the primitives `w` and faces of `source`; subtracts
// dt ∂F/∂x_d from the conserved variables of `target` (interior cells).
template <class Eos, bool Magnetic, class Recon, class Solver>
void flux_sweep(int d, double dt, const Eos& eos, const PrimitiveArrays& w, const State& source,
                State& target, FluxPlanes& planes, CtScratch& ct) {
  const BlockGeometry& g = source.geometry;
  const int t1 = tangent1(d), t2 = tangent2(d);
  const FaceReaders readers = face_readers(w, source, d);
  const FaceRange range = sweep_range(g, d, Magnetic);
  const std::ptrdiff_t plane_step = d == 2 ? 0 : g.stride(d);  // d-neighbour inside a plane
  const double dt_dx = dt / g.spacing[d];
  double* rho = target.density.data();
  double* mn = target.momentum[d].data();
  double* mt1 = target.momentum[t1].data();
  double* mt2 = target.momentum[t2].data();
  double* en = target.energy.data();
  [[maybe_unused]] double* emf1 = Magnetic ? ct.face_emf[d][0].data() : nullptr;
  [[maybe_unused]] double* emf2 = Magnetic ? ct.face_emf[d][1].data() : nullptr;
  [[maybe_unused]] std::int8_t* sign = Magnetic ? ct.mass_sign[d].data() : nullptr;

  for (int k = range.lo[2]; k < range.hi[2]; ++k) {
    auto& cur = planes.plane[std::size_t(k & 1)];
    auto& prev = planes.plane[std::size_t((k + 1) & 1)];
    double* f0 = cur[0].data();
    double* f1 = cur[1].data();
    double* f2 = cur[2].data();
    double* f3 = cur[3].data();
    double* f4 = cur[4].data();
    for (int j = range.lo[1]; j < range.hi[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      const std::ptrdiff_t prow = row - g.index(0, 0, k) + g.index(0, 0, -g.ghosts(2));
      for (int i = range.lo[0]; i < range.hi[0]; ++i) {
        const std::ptrdiff_t c = row + i, cp = prow + i;
        const FaceFlux f = face_flux<Eos, Magnetic, Recon, Solver>(readers, c, eos);
        f0[cp] = f.density;
        f1[cp] = f.mn;
        f2[cp] = f.mt1;
        f3[cp] = f.mt2;
        f4[cp] = f.energy;
        if constexpr (Magnetic) {
          // Flux of B_t1 is −E_t2, flux of B_t2 is +E_t1 (E = −v × B).
          emf1[c] = f.bt2;
          emf2[c] = -f.bt1;
          sign[c] = std::int8_t(int(f.density > 0.0) - int(f.density < 0.0));
        }
      }
    }
    // Update the interior cells whose upper d-face is now known.
    const int layer = d == 2 ? k - 1 : k;
    if (layer < 0 || layer >= g.cells[2]) continue;
    const auto& lower_plane = d == 2 ? prev : cur;
    const double* l0 = lower_plane[0].data();
    const double* l1 = lower_plane[1].data();
    const double* l2 = lower_plane[2].data();
    const double* l3 = lower_plane[3].data();
    const double* l4 = lower_plane[4].data();
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, layer);
      const std::ptrdiff_t prow = row - g.index(0, 0, layer) + g.index(0, 0, -g.ghosts(2));
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i, lo = prow + i, hi = lo + plane_step;
        rho[c] -= dt_dx * (f0[hi] - l0[lo]);
        mn[c] -= dt_dx * (f1[hi] - l1[lo]);
        mt1[c] -= dt_dx * (f2[hi] - l2[lo]);
        mt2[c] -= dt_dx * (f3[hi] - l3[lo]);
        if constexpr (!Eos::isothermal) en[c] -= dt_dx * (f4[hi] - l4[lo]);
      }
    }
  }
}

}  // namespace brume::solver
