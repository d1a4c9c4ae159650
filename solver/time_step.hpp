// The CFL time-step limit of a block.
//
// The unsplit scheme updates a cell with the fluxes of all directions at once, so the limit sums
// the signal rates of the active directions: Δt = C / max_cells Σ_d (|v_d| + c_f,d)/Δx_d. With this
// sum the first-order (donor-cell) unsplit update is stable for C ≤ 1 in any number of dimensions,
// so one Courant number serves 1D, 2D and 3D (common practice, no source; C ≈ 0.3–0.4 recommended
// for the second-order stage). It is never larger than the per-direction minimum.
#pragma once

#include <algorithm>
#include <cmath>
#include <cstddef>

#include "solver/primitive.hpp"
#include "solver/stage_checks.hpp"
#include "solver/state.hpp"

namespace brume::solver {

// max over interior cells of Σ_d (|v_d| + c_f,d)/Δx_d (inverse time); interior only, no ghosts.
template <class Eos, bool Magnetic>
[[nodiscard]] double max_signal_rate(const State& s, const Eos& eos) {
  const BlockGeometry& g = s.geometry;
  double inv_dx[3];
  for (int d = 0; d < 3; ++d)
    inv_dx[d] = g.active(d) ? 1.0 / g.spacing[d] : 0.0;
  double rate = 0.0;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        const double rho = s.density[c];
        const double inv = 1.0 / rho;
        const double b2 = cell_field_sq<Magnetic>(s, c);
        const double p = cell_pressure<Eos, Magnetic>(s, c, eos);
        double sum = 0.0;
        for (int d = 0; d < 3; ++d) {
          double bn = 0.0;
          if constexpr (Magnetic) bn = cell_field(s, d, c);
          const double v = std::fabs(s.momentum[d][c] * inv);
          sum += inv_dx[d] * (v + fast_magnetosonic_speed(rho, p, bn, b2, eos));
        }
        rate = std::max(rate, sum);
      }
    }
  }
  return rate;
}

}  // namespace brume::solver
