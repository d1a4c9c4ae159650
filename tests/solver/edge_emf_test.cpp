// The upwind edge EMF reduces to the face EMF of a plane-parallel problem (Gardiner & Stone
// 2005, J. Comput. Phys. 205, 509, §3: the consistency condition the CT-contact form is built
// to satisfy; from memory).
#include <gtest/gtest.h>

#include <cmath>

#include "solver/constrained_transport.hpp"
#include "solver/stage_scratch.hpp"
#include "tests/solver/solver_test_support.hpp"

namespace brume::solver {
namespace {

using namespace testing;

TEST(EdgeEmf, PlaneParallelProblemGivesTheFaceEmf) {
  // 2D box whose state varies along x only; velocities of both signs exercise the upwinding.
  State s = make_box_state({16, 8, 1}, true, false);
  const BlockGeometry& g = s.geometry;
  StageScratch scratch = make_stage_scratch(g, true, false);
  PrimitiveArrays& w = scratch.primitive;
  for (int k = 0; k < 1; ++k) {
    for (int j = -g.ghosts(1); j < g.cells[1] + g.ghosts(1); ++j) {
      for (int i = -g.ghosts(0); i < g.cells[0] + g.ghosts(0) + 1; ++i) {
        const std::ptrdiff_t c = g.index(i, j, k);
        const double x = g.centre(0, i);
        w.velocity[0][c] = std::sin(2 * kPi * x);
        w.velocity[1][c] = 0.3 * std::cos(2 * kPi * x);
        w.velocity[2][c] = 0.0;
        s.face_field[0][c] = 0.7;
        s.face_field[1][c] = std::cos(4 * kPi * x);
        s.face_field[2][c] = 0.0;
        // x-face EMF E_z (= face_emf[x][1]) of some 1D solver: any function of x will do.
        scratch.ct.face_emf[0][1][c] = 0.1 + std::sin(6 * kPi * g.face(0, i));
        scratch.ct.mass_sign[0][c] = std::int8_t(i % 3 - 1);
      }
    }
  }
  // y-faces of a problem without y variation carry the cell values (the Riemann problem with
  // equal states): use the cell-centred EMF there, as the sweep of a uniform direction gives.
  const CellEmfReader ec = cell_emf_reader(w, s, 2);
  for (int j = -1; j <= g.cells[1]; ++j) {
    for (int i = -1; i <= g.cells[0]; ++i) {
      const std::ptrdiff_t c = g.index(i, j, 0);
      scratch.ct.face_emf[1][0][c] = ec(c);  // E_z on y-faces = face_emf[y][0]
      scratch.ct.mass_sign[1][c] = 0;
    }
  }
  edge_emf(2, w, s, scratch.ct);
  for (int j = 0; j <= g.cells[1]; ++j) {
    for (int i = 0; i <= g.cells[0]; ++i) {
      const std::ptrdiff_t c = g.index(i, j, 0);
      // Tolerance: round-off of a sum of eight O(1) terms.
      EXPECT_NEAR(edge_emf_values(scratch.ct, 2)[c], scratch.ct.face_emf[0][1][c], 1e-14)
          << "edge " << i << " " << j;
    }
  }
}

}  // namespace
}  // namespace brume::solver
