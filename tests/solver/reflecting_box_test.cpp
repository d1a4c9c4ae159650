// A closed box with reflecting walls: the wall faces carry no mass or energy flux (the mirrored
// Riemann problem has v_n = 0 at the face), so mass and energy are conserved to round-off while
// a pressure pulse bounces off the walls (common practice, no source).
#include <gtest/gtest.h>

#include <cmath>

#include "tests/solver/solver_test_support.hpp"

namespace brume::solver {
namespace {

using namespace testing;

TEST(ReflectingBox, ConservesMassAndEnergyWhileWavesHitTheWalls) {
  SchemeOptions o;
  o.magnetic = true;
  o.reconstruction = Reconstruction::plm;
  o.riemann = RiemannSolver::hlld;
  o.gamma = 1.4;
  State s = make_box_state({24, 16, 1}, true, false);
  add_uniform_field(s, {0.0, 0.0, 0.5});  // field along z: no normal field at any wall
  set_primitive(
      s,
      [](double x, double y, double) {
        const double r2 = (x - 0.3) * (x - 0.3) + (y - 0.6) * (y - 0.6);
        return Primitive{1.0, 0.0, 0.0, 0.0, 1.0 + 4.0 * std::exp(-r2 / 0.01)};
      },
      o.gamma);
  BoxBoundaries b;
  b.lower = {BoundaryKind::reflecting, BoundaryKind::reflecting, BoundaryKind::reflecting};
  b.upper = b.lower;
  auto integrator = make_integrator(o, s.geometry, std::make_shared<BoxGhostFiller>(b));
  auto mass = [&] { return interior_sum(s, [&](std::ptrdiff_t c) { return s.density[c]; }); };
  auto energy = [&] { return interior_sum(s, [&](std::ptrdiff_t c) { return s.energy[c]; }); };
  const double m0 = mass(), e0 = energy();
  // t = 0.8: the pulse (sound speed ≈ 1.2–2.6) has reached every wall.
  ASSERT_GT(run_until(*integrator, s, 0.8), 0);
  // Round-off: ~1e-16 relative per cell update on totals of O(400) and O(1000).
  EXPECT_NEAR(mass(), m0, 1e-12 * m0);
  EXPECT_NEAR(energy(), e0, 1e-12 * e0);
  // The walls must have been hit: the density next to the left wall has changed.
  EXPECT_GT(std::fabs(s.density[s.geometry.index(0, 9, 0)] - 1.0), 1e-3);
}

}  // namespace
}  // namespace brume::solver
