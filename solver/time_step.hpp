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

#include "solver/cell_view.hpp"
#include "solver/primitive.hpp"
#include "solver/stage_checks.hpp"
#include "solver/state.hpp"

namespace brume::solver {

// max over interior cells of Σ_d (|v_d| + c_f,d)/Δx_d (inverse time); interior only, no ghosts.
template <class Eos, bool Magnetic>
[[nodiscard]] double max_signal_rate(const State& s, const Eos& eos) {
  const BlockGeometry& g = s.geometry;
  const CellView<Magnetic> u(s);
  const double* m3[3] = {u.mx, u.my, u.mz};
  double inv_dx[3];
  for (int d = 0; d < 3; ++d)
    inv_dx[d] = g.active(d) ? 1.0 / g.spacing[d] : 0.0;
  // Running maxima in 8 lanes (cells i, i + 8, …; the tail repeats the last cell), so that the
  // loop vectorizes without a reduction of doubles.
  constexpr int lanes = 8;
  double lane_rate[lanes] = {0, 0, 0, 0, 0, 0, 0, 0};
  const int n = g.cells[0];
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (int i0 = 0; i0 < n; i0 += lanes) {
        for (int m = 0; m < lanes; ++m) {
          const std::ptrdiff_t c = row + (i0 + m < n ? i0 + m : n - 1);
          const double rho = u.rho[c];
          const double inv = 1.0 / rho;
          const double b2 = u.field_sq(c);
          const double p = u.pressure(c, eos);
          double sum = 0.0;
          for (int d = 0; d < 3; ++d) {
            const double v = std::fabs(m3[d][c] * inv);
            sum += inv_dx[d] * (v + fast_magnetosonic_speed(rho, p, u.field(d, c), b2, eos));
          }
          lane_rate[m] = sum > lane_rate[m] ? sum : lane_rate[m];
        }
      }
    }
  }
  double rate = 0.0;
  for (const double r : lane_rate)
    rate = r > rate ? r : rate;
  return rate;
}

}  // namespace brume::solver
