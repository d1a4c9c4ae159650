// One directional sweep of a finite-volume stage: fluxes through every d-face, the conservative
// update of the target cells, and (MHD) the face EMFs and mass-flux signs for constrained
// transport. Work is done a row of cells (i innermost, unit stride) at a time, in three
// vectorizable passes over row buffers: reconstruction of each cell's edges (once per cell),
// the Riemann solver over the row of faces, the update of the row of cells.
//   x sweep: the faces of a row lie between the cells of that same row;
//   y, z sweeps: the faces of row m lie between cell rows m − 1 and m (the stencil moves along d
//   by the linear step), so the edges and fluxes of the previous row are kept.
#pragma once

#include <cstddef>
#include <cstdint>

#include "solver/characteristic_plm.hpp"
#include "solver/face_flux.hpp"
#include "solver/riemann_row.hpp"
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

namespace sweep_detail {

// Edges of the n cells from c0, each variable reconstructed on its own, into row set `set`.
template <class Eos, bool Magnetic, class Recon>
void reconstruct_variables(const FaceReaders& q, std::ptrdiff_t c0, int n, SweepRows& rows,
                           int set) {
  const std::ptrdiff_t s = q.step;
  auto row = [&](const auto& reader, int v) {
    reconstruct_row<Recon>(reader, c0, s, n, rows.edge(set, 0, v), rows.edge(set, 1, v));
  };
  row(q.density, 0);
  row(q.vn, 1);
  row(q.vt1, 2);
  row(q.vt2, 3);
  if constexpr (!Eos::isothermal) row(q.pressure, 4);
  if constexpr (Magnetic) {
    row(q.bt1, 5);
    row(q.bt2, 6);
  }
}

// Edges of the n cells from c0 for every reconstructed variable, into row set `set`; a
// characteristic reconstruction does all variables in one pass.
template <class Eos, bool Magnetic, class Recon>
void reconstruct_cells(const FaceReaders& q, std::ptrdiff_t c0, int n, SweepRows& rows, int set,
                       const Eos& eos) {
  if constexpr (limits_characteristics<Recon>) {
    double* lo[SweepRows::variables];
    double* hi[SweepRows::variables];
    for (int v = 0; v < SweepRows::variables; ++v) {
      lo[v] = rows.edge(set, 0, v);
      hi[v] = rows.edge(set, 1, v);
    }
    reconstruct_characteristic_row<Recon, Eos, Magnetic>(q, c0, n, eos, lo, hi);
  } else {
    reconstruct_variables<Eos, Magnetic, Recon>(q, c0, n, rows, set);
  }
}

// The states on one side of a row of faces: edge `side` of row set `set`, from element `first`.
inline FaceRowStates side_states(SweepRows& rows, int set, int side, int first) {
  auto e = [&](int v) { return rows.edge(set, side, v) + first; };
  return {e(0), e(1), e(2), e(3), e(4), e(5), e(6)};
}

// Conserved update of n cells from c0: U −= dt/dx (F_upper − F_lower).
template <class Eos>
void update_cells(double dt_dx, std::ptrdiff_t c0, int n, const double* const lower[5],
                  const double* const upper[5], double* rho, double* mn, double* mt1, double* mt2,
                  double* en) {
#pragma GCC ivdep
  for (int m = 0; m < n; ++m) {
    const std::ptrdiff_t c = c0 + m;
    rho[c] -= dt_dx * (upper[0][m] - lower[0][m]);
    mn[c] -= dt_dx * (upper[1][m] - lower[1][m]);
    mt1[c] -= dt_dx * (upper[2][m] - lower[2][m]);
    mt2[c] -= dt_dx * (upper[3][m] - lower[3][m]);
    if constexpr (!Eos::isothermal) en[c] -= dt_dx * (upper[4][m] - lower[4][m]);
  }
}

}  // namespace sweep_detail

// Fluxes along the active direction d from the primitives `w` and faces of `source`; subtracts
// dt ∂F/∂x_d from the conserved variables of `target` (interior cells).
template <class Eos, bool Magnetic, class Recon, class Solver>
void flux_sweep(int d, double dt, const Eos& eos, const PrimitiveArrays& w, const State& source,
                State& target, SweepRows& rows, CtScratch& ct) {
  using namespace sweep_detail;
  const BlockGeometry& g = source.geometry;
  const int t1 = tangent1(d), t2 = tangent2(d);
  const FaceReaders readers = face_readers(w, source, d);
  const FaceRange range = sweep_range(g, d, Magnetic);
  const double dt_dx = dt / g.spacing[d];
  double* rho = target.density.data();
  double* mn = target.momentum[d].data();
  double* mt1 = target.momentum[t1].data();
  double* mt2 = target.momentum[t2].data();
  double* en = target.energy.data();
  const int i0 = range.lo[0];
  const int faces = range.hi[0] - i0;  // faces (x sweep) or cells (y, z sweeps) per row
  const double* const bn = Magnetic ? source.face_field[d].data() : nullptr;

  // Fluxes of the faces from linear index f0 into flux row `set`, EMFs and signs in place.
  auto solve = [&](const FaceRowStates& left, const FaceRowStates& right, std::ptrdiff_t f0,
                   int set) {
    FluxRow out{rows.flux(set, 0), rows.flux(set, 1), rows.flux(set, 2), rows.flux(set, 3),
                rows.flux(set, 4), nullptr,           nullptr,           nullptr};
    if constexpr (Magnetic) {
      out.emf1 = ct.face_emf[d][0].data() + f0;
      out.emf2 = ct.face_emf[d][1].data() + f0;
      out.sign = ct.mass_sign[d].data() + f0;
    }
    riemann_row<Eos, Magnetic, Solver>(left, right, Magnetic ? bn + f0 : nullptr, faces, eos, out);
  };
  auto flux_rows = [&](int set, int first) {
    struct {
      const double* p[5];
    } r{{rows.flux(set, 0) + first, rows.flux(set, 1) + first, rows.flux(set, 2) + first,
         rows.flux(set, 3) + first, rows.flux(set, 4) + first}};
    return r;
  };

  if (d == 0) {
    // Cells i0 − 1 … hi − 1 of the row: face i lies between buffer cells i − i0 and i − i0 + 1.
    for (int k = range.lo[2]; k < range.hi[2]; ++k) {
      for (int j = range.lo[1]; j < range.hi[1]; ++j) {
        reconstruct_cells<Eos, Magnetic, Recon>(readers, g.index(i0 - 1, j, k), faces + 1, rows, 0,
                                                eos);
        solve(side_states(rows, 0, 1, 0), side_states(rows, 0, 0, 1), g.index(i0, j, k), 0);
        if (j < 0 || j >= g.cells[1] || k < 0 || k >= g.cells[2]) continue;
        const auto lower = flux_rows(0, -i0), upper = flux_rows(0, 1 - i0);
        update_cells<Eos>(dt_dx, g.index(0, j, k), g.cells[0], lower.p, upper.p, rho, mn, mt1, mt2,
                          en);
      }
    }
    return;
  }
  // y or z: the outer loop runs over the other tangential index o, the inner one along d.
  const int o_axis = d == 1 ? 2 : 1;
  auto index = [&](int along, int other) {
    int idx[3] = {i0, 0, 0};
    idx[d] = along;
    idx[o_axis] = other;
    return g.index(idx[0], idx[1], idx[2]);
  };
  for (int o = range.lo[o_axis]; o < range.hi[o_axis]; ++o) {
    for (int m = range.lo[d] - 1; m < range.hi[d]; ++m) {
      const int set = m & 1, below = (m - 1) & 1;
      reconstruct_cells<Eos, Magnetic, Recon>(readers, index(m, o), faces, rows, set, eos);
      if (m < range.lo[d]) continue;
      // Face row m: between cell rows m − 1 (upper edges) and m (lower edges).
      solve(side_states(rows, below, 1, 0), side_states(rows, set, 0, 0), index(m, o), set);
      // Cell row m − 1 has its lower face in flux row `below` and its upper face in `set`.
      const bool interior = m - 1 >= 0 && m - 1 < g.cells[d] && o >= 0 && o < g.cells[o_axis];
      if (m == range.lo[d] || !interior) continue;
      const auto lower = flux_rows(below, -i0), upper = flux_rows(set, -i0);
      int idx[3] = {0, 0, 0};
      idx[d] = m - 1;
      idx[o_axis] = o;
      update_cells<Eos>(dt_dx, g.index(idx[0], idx[1], idx[2]), g.cells[0], lower.p, upper.p, rho,
                        mn, mt1, mt2, en);
    }
  }
}

}  // namespace brume::solver
