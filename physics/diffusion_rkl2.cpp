#include "physics/diffusion_rkl2.hpp"

#include <cmath>

namespace brume::physics {

namespace {

// b_j = (j² + j − 2) / (2 j (j + 1)) for j ≥ 2, b_0 = b_1 = b_2 = 1/3 (Meyer, Balsara & Aslam
// 2014, J. Comput. Phys. 257, 594, eq. 16; numbers from memory).
double legendre_b(int j) {
  if (j < 2) return 1.0 / 3.0;
  const double x = double(j);
  return (x * x + x - 2.0) / (2.0 * x * (x + 1.0));
}

// w_1 = 4 / (s² + s − 2) (Meyer, Balsara & Aslam 2014, eq. 17, from memory).
double first_weight(int stages) {
  const double s = double(stages);
  return 4.0 / (s * s + s - 2.0);
}

}  // namespace

double rkl2_first_weight(int stages) {
  return legendre_b(1) * first_weight(stages);
}

// μ_j = (2j − 1)/j · b_j/b_{j−1}, ν_j = −(j − 1)/j · b_j/b_{j−2}, μ̃_j = μ_j w_1,
// γ̃_j = −(1 − b_{j−1}) μ̃_j (Meyer, Balsara & Aslam 2014, J. Comput. Phys. 257, 594, eq. 17, from
// memory).
Rkl2Stage rkl2_stage(int stages, int j) {
  const double x = double(j);
  const double b = legendre_b(j);
  Rkl2Stage w;
  w.mu = (2.0 * x - 1.0) / x * b / legendre_b(j - 1);
  w.nu = -(x - 1.0) / x * b / legendre_b(j - 2);
  w.mu_tilde = w.mu * first_weight(stages);
  w.gamma_tilde = -(1.0 - legendre_b(j - 1)) * w.mu_tilde;
  return w;
}

double rkl2_step_ratio(int stages) {
  const double s = double(stages);
  return (s * s + s - 2.0) / 4.0;
}

// The positive root of s² + s − 2 − 4 ratio = 0, rounded up (Meyer, Balsara & Aslam 2014,
// J. Comput. Phys. 257, 594, eq. 19 solved for s; from memory).
int rkl2_stages_for(double ratio) {
  int s = int(std::ceil(0.5 * (std::sqrt(9.0 + 16.0 * ratio) - 1.0)));
  if (s < 2) s = 2;
  while (rkl2_step_ratio(s) < ratio)  // guards the rounding of the square root
    ++s;
  return s;
}

}  // namespace brume::physics
