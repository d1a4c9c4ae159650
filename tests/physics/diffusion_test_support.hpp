// Helpers shared by the diffusion tests: a periodic box with its ghost filler, a diffusion term
// called directly on it (no ideal-MHD step), and sums over the interior.
#pragma once

#include <cmath>
#include <functional>
#include <memory>

#include "physics/diffusion_term.hpp"
#include "solver/box_boundaries.hpp"
#include "tests/solver/solver_test_support.hpp"

namespace brume::physics::testing {

using solver::testing::kPi;

inline constexpr double kGamma = 5.0 / 3.0;

// A diffusion term on a single periodic block (code units equal to cgs: the coefficients are
// given in code units directly).
inline DiffusionTerm make_box_term(const DiffusionCoefficients& coefficients, int max_stages = 64) {
  RunContext context;
  context.gamma = coefficients.gamma;
  context.ghosts = std::make_shared<solver::BoxGhostFiller>(solver::BoxBoundaries{});
  return DiffusionTerm(coefficients, max_stages, context);
}

// Advances `state` to t_end in `steps` equal calls of the term; returns the largest stage count.
inline int advance_in_steps(DiffusionTerm& term, solver::State& state, double t_end, int steps) {
  int most = 0;
  const double dt = t_end / steps;
  for (int n = 0; n < steps; ++n) {
    term.advance(state, dt);
    state.time += dt;
    most = std::max(most, term.last_call().stages);
  }
  return most;
}

// Σ over interior cells of q(c), in k, j, i order.
inline double interior_sum(const solver::State& s, const std::function<double(std::ptrdiff_t)>& q) {
  return solver::testing::interior_sum(s, q);
}

// θ = p/ρ of cell c of a hydrodynamic or magnetized ideal-gas state.
inline double theta_of(const solver::State& s, std::ptrdiff_t c) {
  double internal = s.energy[c];
  for (int m = 0; m < 3; ++m)
    internal -= 0.5 * s.momentum[m][c] * s.momentum[m][c] / s.density[c];
  if (s.magnetic) {
    for (int d = 0; d < 3; ++d)
      internal -= 0.5 * solver::cell_field(s, d, c) * solver::cell_field(s, d, c);
  }
  return (kGamma - 1.0) * internal / s.density[c];
}

// The heat kernel of the infinite line, A σ/σ_t exp(−x²/(2σ_t²)) with σ_t² = σ² + 2Dt, summed over
// the periodic images of a box of length L (Carslaw & Jaeger 1959, Conduction of Heat in Solids,
// 2nd ed., §2.2 for the instantaneous source, from memory; images: common practice, no source).
inline double periodic_gaussian(double x, double centre, double length, double sigma2,
                                double sigma2_t, double amplitude) {
  double sum = 0.0;
  for (int m = -3; m <= 3; ++m) {
    const double r = x - centre - m * length;
    sum += std::exp(-r * r / (2.0 * sigma2_t));
  }
  return amplitude * std::sqrt(sigma2 / sigma2_t) * sum;
}

}  // namespace brume::physics::testing
