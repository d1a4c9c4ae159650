// Coefficients and stage count of the second-order Runge–Kutta–Legendre super-time-stepping
// scheme RKL2 (Meyer, Balsara & Aslam 2014, J. Comput. Phys. 257, 594, Sect. 3; section and
// equation numbers from memory).
#pragma once

namespace brume::physics {

// The weights of stage j (2 ≤ j ≤ s) of an s-stage RKL2 step:
//   Y_j = μ Y_{j−1} + ν Y_{j−2} + (1 − μ − ν) Y_0 + μ̃ Δt L(Y_{j−1}) + γ̃ Δt L(Y_0).
struct Rkl2Stage {
  double mu = 0.0;
  double nu = 0.0;
  double mu_tilde = 0.0;
  double gamma_tilde = 0.0;
};

// μ̃_1 of the first stage Y_1 = Y_0 + μ̃_1 Δt L(Y_0): w_1 / 3 with w_1 = 4 / (s² + s − 2).
[[nodiscard]] double rkl2_first_weight(int stages);

// The weights of stage j of an s-stage step (2 ≤ j ≤ s).
[[nodiscard]] Rkl2Stage rkl2_stage(int stages, int j);

// The longest step, in units of the explicit (forward-Euler) limit, that s stages keep stable:
// (s² + s − 2) / 4 (Meyer, Balsara & Aslam 2014, eq. 19, from memory).
[[nodiscard]] double rkl2_step_ratio(int stages);

// The fewest stages (at least 2) whose stable step reaches `ratio` explicit limits.
[[nodiscard]] int rkl2_stages_for(double ratio);

}  // namespace brume::physics
