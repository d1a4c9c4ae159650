// Robustness after each stage: detection of cells that lost positivity (for the first-order
// fallback), non-finite values (reported, never thrown), and counted density/pressure floors.
#pragma once

#include <algorithm>
#include <array>
#include <cmath>
#include <cstddef>
#include <tuple>
#include <vector>

#include "solver/cell_view.hpp"
#include "solver/face_flux.hpp"
#include "solver/primitive.hpp"
#include "solver/riemann/llf.hpp"
#include "solver/step_report.hpp"

namespace brume::solver {

// B² of cell c from its face averages (zero for hydrodynamics).
template <bool Magnetic>
[[nodiscard]] inline double cell_field_sq(const State& s, std::ptrdiff_t c) {
  if constexpr (Magnetic) {
    const double bx = cell_field(s, 0, c), by = cell_field(s, 1, c), bz = cell_field(s, 2, c);
    return bx * bx + by * by + bz * bz;
  } else {
    (void)s, (void)c;
    return 0.0;
  }
}

template <class Eos, bool Magnetic>
[[nodiscard]] inline double cell_pressure(const State& s, std::ptrdiff_t c, const Eos& eos) {
  const double e = Eos::isothermal ? 0.0 : s.energy[c];
  return pressure_from_conserved(s.density[c], s.momentum[0][c], s.momentum[1][c], s.momentum[2][c],
                                 e, cell_field_sq<Magnetic>(s, c), eos);
}

// Interior cells with density or pressure that is not positive (NaN included), ascending.
template <class Eos, bool Magnetic>
void find_unphysical_cells(const State& s, const Eos& eos, std::vector<std::ptrdiff_t>& cells) {
  const BlockGeometry& g = s.geometry;
  const CellView<Magnetic> u(s);
  cells.clear();
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      int bad = 0;
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        bad |= int(!(u.rho[c] > 0.0)) | int(!(u.pressure(c, eos) > 0.0));
      }
      if (bad == 0) continue;
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        if (!(u.rho[c] > 0.0) || !(u.pressure(c, eos) > 0.0)) cells.push_back(c);
      }
    }
  }
}

[[nodiscard]] inline bool is_interior(const BlockGeometry& g, std::ptrdiff_t c) {
  const std::array<int, 3> p = g.position(c);
  return p[0] >= 0 && p[0] < g.cells[0] && p[1] >= 0 && p[1] < g.cells[1] && p[2] >= 0 &&
         p[2] < g.cells[2];
}

// Replaces the fluxes through every face of the listed cells by first-order fluxes (donor cell and
// local Lax–Friedrichs), correcting the interior cells on both sides of each face so the update
// stays conservative. The field (CT) update is kept. The positivity fallback is common practice,
// no source (DESIGN.md §3).
//
// `cells` is ascending and holds this block's flagged cells and, in its first ghost layer, those
// of the neighbouring blocks (GhostFiller::exchange_flags): a face between two blocks is then
// replaced on both, with the same flux, and each block corrects its own cell. A face is replaced
// once (a face shared by two listed cells belongs to the lower one); faces with no interior cell
// on either side are skipped. Each cell receives its corrections in the same order whatever the
// list holds besides — x faces, then y, then z; lower face before upper — so the result is the
// same in every decomposition.
template <class Eos, bool Magnetic, class Recon, class Solver>
void first_order_fallback(const std::vector<std::ptrdiff_t>& cells, double dt, const Eos& eos,
                          const PrimitiveArrays& w, const State& source, State& target) {
  const BlockGeometry& g = source.geometry;
  for (int d = 0; d < 3; ++d) {
    if (!g.active(d)) continue;
    const FaceReaders readers = face_readers(w, source, d);
    const std::ptrdiff_t s = readers.step;
    const double dt_dx = dt / g.spacing[d];
    const int t1 = tangent1(d), t2 = tangent2(d);
    for (const std::ptrdiff_t c : cells) {
      for (int side = 0; side < 2; ++side) {
        const std::ptrdiff_t face = side == 0 ? c : c + s;
        if (side == 0 && std::binary_search(cells.begin(), cells.end(), c - s)) continue;
        // The cell below the face loses dt/dx ΔF, the cell above gains it.
        const std::ptrdiff_t below = face - s, above = face;
        const bool correct_below = is_interior(g, below), correct_above = is_interior(g, above);
        if (!correct_below && !correct_above) continue;
        const FaceFlux high = face_flux<Eos, Magnetic, Recon, Solver>(readers, face, eos);
        const FaceFlux low = face_flux<Eos, Magnetic, DonorCell, Llf>(readers, face, eos);
        const double delta[5] = {low.density - high.density, low.mn - high.mn, low.mt1 - high.mt1,
                                 low.mt2 - high.mt2, low.energy - high.energy};
        for (const auto& [cell, sign, correct] :
             {std::tuple{below, -1.0, correct_below}, std::tuple{above, 1.0, correct_above}}) {
          if (!correct) continue;
          const double f = sign * dt_dx;
          target.density[cell] += f * delta[0];
          target.momentum[d][cell] += f * delta[1];
          target.momentum[t1][cell] += f * delta[2];
          target.momentum[t2][cell] += f * delta[3];
          if constexpr (!Eos::isothermal) target.energy[cell] += f * delta[4];
        }
      }
    }
  }
}

// The first interior cell with a non-finite conserved value, if any.
[[nodiscard]] NumericalFailure find_non_finite(const State& s);

// Density floor (momentum kept) and pressure floor (thermal energy raised to p_floor); adds the
// counts to `density_floors`, `pressure_floors` and records the first cell floored (its values
// before the floor) in `first` unless it holds one already. Common practice, no source.
template <class Eos, bool Magnetic>
void apply_floors(State& s, double density_floor, double pressure_floor, const Eos& eos,
                  long& density_floors, long& pressure_floors, NumericalFailure& first) {
  const BlockGeometry& g = s.geometry;
  const CellView<Magnetic> u(s);
  double* rho = s.density.data();
  double* en = s.energy.data();
  auto pressure = [&](std::ptrdiff_t c, double r) {
    return pressure_from_conserved(r, u.mx[c], u.my[c], u.mz[c], en[c], u.field_sq(c), eos);
  };
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      // Read-only count first: rows without a floored cell (nearly all) are not written.
      int any = 0;
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        const double r = std::max(rho[c], density_floor);
        any |= int(rho[c] < density_floor);
        if constexpr (!Eos::isothermal) any |= int(pressure(c, r) < pressure_floor);
      }
      if (any == 0) continue;
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        const bool low_density = rho[c] < density_floor;
        const double r = low_density ? density_floor : rho[c];
        bool low_pressure = false;
        double p = 0.0;
        if constexpr (!Eos::isothermal) {
          p = pressure(c, r);
          low_pressure = p < pressure_floor;
        }
        if (!low_density && !low_pressure) continue;
        if (!first.occurred) {
          first.occurred = true;
          first.cell = {g.offset[0] + i, g.offset[1] + j, g.offset[2] + k};
          first.density = rho[c];
          first.momentum = {u.mx[c], u.my[c], u.mz[c]};
          first.energy = Eos::isothermal ? 0.0 : en[c];
        }
        density_floors += long(low_density);
        pressure_floors += long(low_pressure);
        rho[c] = r;
        if constexpr (!Eos::isothermal) {
          if (low_pressure) en[c] += (pressure_floor - p) / (eos.gamma - 1.0);
        }
      }
    }
  }
}

}  // namespace brume::solver
