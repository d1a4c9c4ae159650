// The same plane-parallel problem laid along x, y or z must give bitwise identical answers:
// the sweeps, CT edges and boundaries treat the three axes alike (common practice, no source).
#include <gtest/gtest.h>

#include <cmath>

#include "tests/solver/solver_test_support.hpp"

namespace brume::solver {
namespace {

using namespace testing;

// The MHD shock tube of Brio & Wu 1988 (J. Comput. Phys. 75, 400: γ = 2, B_n = 0.75, B_t1 = ±1)
// with tangential and normal motion added, varying along `axis`; `transverse` cells in the other
// two axes. B_t2 = v_t2 = 0: sums of three non-zero squares (B², v²) are evaluated in x, y, z
// order, which is not rotation invariant in the last bit, so one component must vanish.
State shock_tube_along(int axis, int n, int transverse) {
  std::array<int, 3> cells{transverse, transverse, transverse};
  cells[std::size_t(axis)] = n;
  State s = make_box_state(cells, true, false);
  const BlockGeometry& g = s.geometry;
  const int t1 = tangent1(axis), t2 = tangent2(axis);
  const double gamma = 2.0;
  for (int k = -g.ghosts(2); k < g.cells[2] + g.ghosts(2); ++k) {
    for (int j = -g.ghosts(1); j < g.cells[1] + g.ghosts(1); ++j) {
      for (int i = -g.ghosts(0); i < g.cells[0] + g.ghosts(0); ++i) {
        const int idx[3] = {i, j, k};
        const bool left = g.centre(axis, idx[axis]) < 0.5;
        const std::ptrdiff_t c = g.index(i, j, k);
        s.face_field[std::size_t(axis)][c] = 0.75;
        s.face_field[std::size_t(t1)][c] = left ? 1.0 : -1.0;
        s.face_field[std::size_t(t2)][c] = 0.0;
      }
    }
  }
  // The upper boundary face along the axis (the loop above covers the lower faces of cells only).
  for (std::size_t c = 0; c < s.face_field[std::size_t(axis)].size(); ++c) {
    s.face_field[std::size_t(axis)][c] = 0.75;
  }
  set_primitive(
      s,
      [&](double x, double y, double z) {
        const double p[3] = {x, y, z};
        const bool left = p[axis] < 0.5;
        Primitive w{left ? 1.0 : 0.125, 0.0, 0.0, 0.0, left ? 1.0 : 0.1};
        double v[3] = {0, 0, 0};
        v[t1] = left ? 0.1 : -0.2;  // tangential motion in t1
        v[axis] = 0.05;
        w.vx = v[0];
        w.vy = v[1];
        w.vz = v[2];
        return w;
      },
      gamma);
  return s;
}

void run_symmetry(int transverse, Reconstruction recon = Reconstruction::plm,
                  bool characteristic = false,
                  PpmLimiter ppm_limiter = PpmLimiter::extremum_preserving) {
  SchemeOptions o;
  o.reconstruction = recon;
  o.characteristic = characteristic;
  o.ppm_limiter = ppm_limiter;
  o.riemann = RiemannSolver::hlle;
  o.gamma = 2.0;
  BoxBoundaries b;
  b.lower = {BoundaryKind::outflow, BoundaryKind::outflow, BoundaryKind::outflow};
  b.upper = b.lower;
  auto ghosts = std::make_shared<BoxGhostFiller>(b);
  const int n = 64;
  std::array<State, 3> states{shock_tube_along(0, n, transverse),
                              shock_tube_along(1, n, transverse),
                              shock_tube_along(2, n, transverse)};
  // One fixed step for all three (the summed CFL rate adds directions in a different order).
  auto probe = make_integrator(o, states[0].geometry, ghosts);
  const double dt = probe->stable_time_step(states[0]);
  for (int a = 0; a < 3; ++a) {
    auto integrator = make_integrator(o, states[std::size_t(a)].geometry, ghosts);
    for (int step = 0; step < 40; ++step) {
      ASSERT_TRUE(integrator->advance(states[std::size_t(a)], dt).ok());
    }
  }
  // Compare cell p along the axis at the first transverse position, in the rotated frame.
  for (int a = 1; a < 3; ++a) {
    const State& s = states[std::size_t(a)];
    const State& r = states[0];
    const int t1 = tangent1(a), t2 = tangent2(a);
    for (int p = 0; p <= n; ++p) {
      int idx[3] = {0, 0, 0};
      idx[a] = p;
      const std::ptrdiff_t c = s.geometry.index(idx[0], idx[1], idx[2]);
      const std::ptrdiff_t cr = r.geometry.index(p, 0, 0);
      if (p < n) {
        ASSERT_EQ(s.density[c], r.density[cr]) << "axis " << a << " cell " << p;
        ASSERT_EQ(s.momentum[std::size_t(a)][c], r.momentum[0][cr]);
        ASSERT_EQ(s.momentum[std::size_t(t1)][c], r.momentum[1][cr]);
        ASSERT_EQ(s.momentum[std::size_t(t2)][c], r.momentum[2][cr]);
        ASSERT_EQ(s.energy[c], r.energy[cr]);
        ASSERT_EQ(s.face_field[std::size_t(t1)][c], r.face_field[1][cr]);
        ASSERT_EQ(s.face_field[std::size_t(t2)][c], r.face_field[2][cr]);
      }
      ASSERT_EQ(s.face_field[std::size_t(a)][c], r.face_field[0][cr]);
    }
  }
  // The tube evolved (otherwise equality proves nothing).
  EXPECT_NE(states[0].density[states[0].geometry.index(n / 2 + 3, 0, 0)], 0.125);
}

TEST(SweepSymmetry, ShockTubeAlongXYZIsIdenticalIn1D) {
  run_symmetry(1);
}
TEST(SweepSymmetry, ShockTubeAlongXYZIsIdenticalIn3DBox) {
  run_symmetry(4);
}
TEST(SweepSymmetry, ShockTubeAlongXYZIsIdenticalIn3DBoxWithCharacteristicLimiting) {
  run_symmetry(4, Reconstruction::plm, true);
}
TEST(SweepSymmetry, ShockTubeAlongXYZIsIdenticalIn3DBoxWithExtremumPreservingPpm) {
  run_symmetry(4, Reconstruction::ppm);
}

}  // namespace
}  // namespace brume::solver
