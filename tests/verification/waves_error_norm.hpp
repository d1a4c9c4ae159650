// Error measures of the wave-convergence tests: the L1 error vector of the conserved variables
// against a reference state, reduced to one number as in the linear-wave tests of Gardiner &
// Stone 2008 (J. Comput. Phys. 227, 4123, §8.1; from memory): δq = (1/N) Σ_cells |q − q_ref| for
// each conserved variable q (ρ, ρv, E, cell-centred B), error = sqrt(Σ_q δq²).
#pragma once

#include <cmath>
#include <cstddef>
#include <functional>
#include <vector>

#include "solver/state.hpp"

namespace brume::verification {

// The cell quantities compared: density, momenta, energy (ideal gas), cell-centred B (MHD).
inline std::vector<std::function<double(const solver::State&, std::ptrdiff_t)>> conserved_views(
    const solver::State& s) {
  std::vector<std::function<double(const solver::State&, std::ptrdiff_t)>> q;
  q.emplace_back([](const solver::State& t, std::ptrdiff_t c) { return t.density[c]; });
  for (std::size_t d = 0; d < 3; ++d)
    q.emplace_back([d](const solver::State& t, std::ptrdiff_t c) { return t.momentum[d][c]; });
  if (!s.isothermal)
    q.emplace_back([](const solver::State& t, std::ptrdiff_t c) { return t.energy[c]; });
  if (s.magnetic) {
    for (int d = 0; d < 3; ++d) {
      q.emplace_back(
          [d](const solver::State& t, std::ptrdiff_t c) { return solver::cell_field(t, d, c); });
    }
  }
  return q;
}

// sqrt(Σ_q δq²) with δq the mean |q − q_ref| over interior cells; both states share a geometry.
inline double l1_error_norm(const solver::State& s, const solver::State& reference) {
  const solver::BlockGeometry& g = s.geometry;
  double sum_sq = 0.0;
  for (const auto& q : conserved_views(s)) {
    double l1 = 0.0;
    for (int k = 0; k < g.cells[2]; ++k) {
      for (int j = 0; j < g.cells[1]; ++j) {
        for (int i = 0; i < g.cells[0]; ++i) {
          const std::ptrdiff_t c = g.index(i, j, k);
          l1 += std::fabs(q(s, c) - q(reference, c));
        }
      }
    }
    l1 /= double(g.interior_cells());
    sum_sq += l1 * l1;
  }
  return std::sqrt(sum_sq);
}

// Order of convergence between two resolutions that differ by a factor 2.
inline double convergence_order(double coarse_error, double fine_error) {
  return std::log2(coarse_error / fine_error);
}

}  // namespace brume::verification
