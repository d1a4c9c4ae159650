#include "problems/face_field_setup.hpp"

#include <gtest/gtest.h>

#include <cmath>

#include "solver/block_geometry.hpp"

using brume::problems::set_face_field;
using brume::solver::BlockGeometry;

namespace {

brume::solver::State state_of(std::array<int, 3> cells) {
  const BlockGeometry g = brume::solver::whole_box_geometry(cells, {0, 0, 0}, {1, 2, 3}, 2);
  return brume::solver::make_state(g, true, false);
}

// Largest |div B| Δx / |B| over the interior cells, with div B from the face differences.
double relative_divergence(const brume::solver::State& s) {
  const BlockGeometry& g = s.geometry;
  double worst = 0.0;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i) {
        const auto c = g.index(i, j, k);
        double div = 0.0, size = 0.0;
        for (int d = 0; d < 3; ++d) {
          if (!g.active(d)) continue;
          const double* b = s.face_field[d].data();
          div += (b[c + g.step(d)] - b[c]) / g.spacing[d];
          size += std::fabs(b[c]) / g.spacing[d];
        }
        worst = std::max(worst, std::fabs(div) / size);
      }
    }
  }
  return worst;
}

}  // namespace

TEST(FaceFieldSetup, CurlOfALinearPotentialIsExact) {
  // A = (0, 0, 2y) − (0, 3x, 0)·0 + (z, 0, 0): curl A = (2, 1, 0) exactly (vector calculus).
  auto s = state_of({8, 6, 4});
  set_face_field(s, {0.5, 0, 0}, [](double, double y, double z) {
    return std::array<double, 3>{z, 0.0, 2.0 * y};
  });
  const auto& g = s.geometry;
  EXPECT_NEAR(s.face_field[0][g.index(3, 2, 1)], 2.5, 1e-13);
  EXPECT_NEAR(s.face_field[1][g.index(3, 2, 1)], 1.0, 1e-13);
  EXPECT_NEAR(s.face_field[2][g.index(3, 2, 1)], 0.0, 1e-13);
}

TEST(FaceFieldSetup, DiscreteDivergenceVanishes) {
  // The curl taken around each face makes div B cancel edge by edge (Evans & Hawley 1988).
  for (const std::array<int, 3> cells :
       {std::array<int, 3>{16, 12, 8}, std::array<int, 3>{16, 12, 1}}) {
    auto s = state_of(cells);
    set_face_field(s, {0.1, -0.2, 0.3}, [](double x, double y, double z) {
      return std::array<double, 3>{std::sin(6.0 * y + z), std::cos(2.0 * x * z),
                                   std::sin(3.0 * x) * std::cos(y)};
    });
    EXPECT_LT(relative_divergence(s), 1e-13) << cells[2];
  }
}
