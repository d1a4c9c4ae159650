// Where a projection puts the box on the sky. Projected along axis a, the map's axes are the
// cyclic pair (u, v) = (y, z), (z, x), (x, y) for a = x, y, z, so that u × v = a: the observer sits
// at +∞ on a and looks towards −a, with north along +v and east along −u (docs/sky-maps.md).
// Maps are stored [v][u] (u fastest), like the snapshots' [z][y][x].
#pragma once

#include <array>
#include <cstddef>
#include <string>

namespace brume::physics {

struct SkyMapGeometry {
  int axis = 2;  // line of sight: 0, 1, 2 for x, y, z
  int u = 0;     // box axis along the map's first index (fastest)
  int v = 1;     // box axis along the map's second index ("north")
  long cells_u = 1;
  long cells_v = 1;
  double size_u = 1.0;  // map edges, code units
  double size_v = 1.0;

  [[nodiscard]] std::size_t pixels() const { return std::size_t(cells_u) * std::size_t(cells_v); }
};

[[nodiscard]] inline SkyMapGeometry sky_map_geometry(int axis, const std::array<long, 3>& cells,
                                                     const std::array<double, 3>& size) {
  SkyMapGeometry g;
  g.axis = axis;
  g.u = (axis + 1) % 3;
  g.v = (axis + 2) % 3;
  g.cells_u = cells[std::size_t(g.u)];
  g.cells_v = cells[std::size_t(g.v)];
  g.size_u = size[std::size_t(g.u)];
  g.size_v = size[std::size_t(g.v)];
  return g;
}

[[nodiscard]] inline std::string axis_letter(int axis) {
  return std::string(1, char('x' + axis));
}

}  // namespace brume::physics
