// A Riemann problem: two uniform states, hydrodynamic or magnetized, meeting at a plane whose
// normal is a box axis (x, y or z) or the diagonal of the x–y grid. Velocities and fields are given
// in the tube's frame (normal, first transverse, second transverse); the field comes from a vector
// potential, so that its discrete divergence starts at round-off along any direction.
#pragma once

#include <array>

#include "problems/problem.hpp"
#include "solver/block_geometry.hpp"

namespace brume::problems {

[[nodiscard]] Problem shock_tube_problem();

// The tube's frame: unit normal and the two transverse unit vectors (t1 × t2 = normal). Along an
// axis d: (e_d, e_tangent1(d), e_tangent2(d)). Along the x–y diagonal the normal is ∝ (Δy, Δx),
// so that the planes of constant position are the grid diagonals i + j = const, and
// t1 = e_z × normal, t2 = e_z.
struct TubeFrame {
  std::array<double, 3> normal{1, 0, 0};
  std::array<double, 3> transverse1{0, 1, 0};
  std::array<double, 3> transverse2{0, 0, 1};

  // Position along the tube of the point (x, y, z).
  [[nodiscard]] double position(double x, double y, double z) const {
    return normal[0] * x + normal[1] * y + normal[2] * z;
  }
  // The Cartesian vector with components (n, t1, t2) in the tube's frame.
  [[nodiscard]] std::array<double, 3> to_box(const std::array<double, 3>& v) const {
    std::array<double, 3> out{};
    for (std::size_t d = 0; d < 3; ++d)
      out[d] = v[0] * normal[d] + v[1] * transverse1[d] + v[2] * transverse2[d];
    return out;
  }
};

// Direction names of problem.shock_tube.direction: "x", "y", "z" or "xy" (the diagonal).
[[nodiscard]] TubeFrame tube_frame(const std::string& direction,
                                   const std::array<double, 3>& spacing);

}  // namespace brume::problems
