// RKL2 coefficients checked on the scalar problem y' = λ y, where an s-stage step multiplies y by
// its stability polynomial R_s(z), z = λ dt.
#include <gtest/gtest.h>

#include <cmath>

#include "physics/diffusion_rkl2.hpp"

namespace brume::physics {
namespace {

double amplification(int stages, double z) {
  const double y0 = 1.0;
  double before = y0;
  double previous = y0 + rkl2_first_weight(stages) * z * y0;
  for (int j = 2; j <= stages; ++j) {
    const Rkl2Stage w = rkl2_stage(stages, j);
    const double next = w.mu * previous + w.nu * before + (1.0 - w.mu - w.nu) * y0 +
                        w.mu_tilde * z * previous + w.gamma_tilde * z * y0;
    before = previous;
    previous = next;
  }
  return previous;
}

// |R_s(z)| ≤ 1 on the whole interval z ∈ [−2 (s² + s − 2)/4, 0] that the stage count promises
// (Meyer, Balsara & Aslam 2014, J. Comput. Phys. 257, 594, Sect. 3: the stability polynomial is
// bounded by 1 there). Tolerance 1e-12 for round-off in the recursion.
TEST(DiffusionRkl2, StableOverThePromisedInterval) {
  for (int s : {2, 3, 5, 9, 16, 40}) {
    const double edge = -2.0 * rkl2_step_ratio(s);
    for (int i = 0; i <= 2000; ++i) {
      const double z = edge * i / 2000.0;
      ASSERT_LE(std::fabs(amplification(s, z)), 1.0 + 1e-12) << "s = " << s << ", z = " << z;
    }
  }
}

// Second order: R_s(z) = 1 + z + z²/2 + O(z³) (Meyer, Balsara & Aslam 2014, Sect. 3), so
// (R_s(z) − e^z)/z³ stays bounded as z → 0; measured at z = −1e-2 and −5e-3 the error falls by a
// factor 8 (order 3 per step) within 10 %.
TEST(DiffusionRkl2, SecondOrderAccurate) {
  for (int s : {2, 4, 9, 25}) {
    const double e1 = std::fabs(amplification(s, -1e-2) - std::exp(-1e-2));
    const double e2 = std::fabs(amplification(s, -5e-3) - std::exp(-5e-3));
    EXPECT_NEAR(e1 / e2, 8.0, 0.8) << "s = " << s;
  }
}

// The stage count is the fewest s with (s² + s − 2)/4 ≥ dt/dt_exp (Meyer, Balsara & Aslam 2014, eq.
// 19, from memory): 20 limits need 9 stages ((81 + 9 − 2)/4 = 22 ≥ 20, (64 + 8 − 2)/4 = 17.5 < 20),
// 1 limit 2, 100 limits 20.
TEST(DiffusionRkl2, StageCount) {
  EXPECT_EQ(rkl2_stages_for(0.0), 2);
  EXPECT_EQ(rkl2_stages_for(1.0), 2);
  EXPECT_EQ(rkl2_stages_for(20.0), 9);
  EXPECT_EQ(rkl2_stages_for(100.0), 20);
  EXPECT_DOUBLE_EQ(rkl2_step_ratio(9), 22.0);
  for (double r = 0.5; r < 5000.0; r *= 1.37) {
    const int s = rkl2_stages_for(r);
    EXPECT_GE(rkl2_step_ratio(s), r);
    EXPECT_LT(rkl2_step_ratio(s - 1), r);
  }
}

}  // namespace
}  // namespace brume::physics
