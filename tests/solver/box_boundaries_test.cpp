#include "solver/box_boundaries.hpp"

#include <gtest/gtest.h>

#include "tests/solver/solver_test_support.hpp"

namespace brume::solver {
namespace {

using testing::make_box_state;

// Fills cell i of a 1D state with 10 + i (momentum x: 100 + i) and face i with 1000 + i.
State ramp_state(BoundaryKind kind) {
  State s = make_box_state({6, 1, 1}, true, false, 2);
  const BlockGeometry& g = s.geometry;
  for (int i = 0; i < 6; ++i) {
    s.density[g.index(i, 0, 0)] = 10 + i;
    s.momentum[0][g.index(i, 0, 0)] = 100 + i;
    s.face_field[1][g.index(i, 0, 0)] = 500 + i;
  }
  for (int i = 0; i <= 6; ++i)
    s.face_field[0][g.index(i, 0, 0)] = 1000 + i;
  BoxBoundaries b;
  b.lower = {kind, kind, kind};
  b.upper = {kind, kind, kind};
  BoxGhostFiller(b).fill(s);
  return s;
}

// Expected ghost values follow from the definitions in box_boundaries.hpp (common practice).
TEST(BoxBoundaries, PeriodicCopiesTheOppositeSide) {
  const State s = ramp_state(BoundaryKind::periodic);
  const BlockGeometry& g = s.geometry;
  EXPECT_EQ(s.density[g.index(-1, 0, 0)], 15);
  EXPECT_EQ(s.density[g.index(-2, 0, 0)], 14);
  EXPECT_EQ(s.density[g.index(6, 0, 0)], 10);
  EXPECT_EQ(s.density[g.index(7, 0, 0)], 11);
  EXPECT_EQ(s.face_field[0][g.index(-1, 0, 0)], 1005);  // face 6 ≡ face 0
  EXPECT_EQ(s.face_field[0][g.index(7, 0, 0)], 1001);
}

TEST(BoxBoundaries, OutflowCopiesTheLastInteriorValue) {
  const State s = ramp_state(BoundaryKind::outflow);
  const BlockGeometry& g = s.geometry;
  EXPECT_EQ(s.density[g.index(-2, 0, 0)], 10);
  EXPECT_EQ(s.density[g.index(7, 0, 0)], 15);
  EXPECT_EQ(s.momentum[0][g.index(-1, 0, 0)], 100);
  EXPECT_EQ(s.face_field[0][g.index(-2, 0, 0)], 1000);
  EXPECT_EQ(s.face_field[0][g.index(8, 0, 0)], 1006);
}

TEST(BoxBoundaries, ReflectingMirrorsAndFlipsNormalComponents) {
  const State s = ramp_state(BoundaryKind::reflecting);
  const BlockGeometry& g = s.geometry;
  EXPECT_EQ(s.density[g.index(-1, 0, 0)], 10);
  EXPECT_EQ(s.density[g.index(-2, 0, 0)], 11);
  EXPECT_EQ(s.density[g.index(7, 0, 0)], 14);
  EXPECT_EQ(s.momentum[0][g.index(-1, 0, 0)], -100);     // normal momentum flips
  EXPECT_EQ(s.face_field[0][g.index(-1, 0, 0)], -1001);  // normal field mirrored about face 0
  EXPECT_EQ(s.face_field[0][g.index(8, 0, 0)], -1004);
  EXPECT_EQ(s.face_field[1][g.index(-1, 0, 0)], 500);  // tangential field keeps its sign
}

TEST(BoxBoundaries, FillsEdgeAndCornerGhostsIn3D) {
  State s = make_box_state({4, 4, 4}, false, false, 2);
  const BlockGeometry& g = s.geometry;
  for (int k = 0; k < 4; ++k)
    for (int j = 0; j < 4; ++j)
      for (int i = 0; i < 4; ++i)
        s.density[g.index(i, j, k)] = i + 10 * j + 100 * k;
  BoxGhostFiller(BoxBoundaries{}).fill(s);
  EXPECT_EQ(s.density[g.index(-1, -1, -1)], 3 + 30 + 300);
  EXPECT_EQ(s.density[g.index(5, -2, 4)], 1 + 20 + 0);
}

}  // namespace
}  // namespace brume::solver
