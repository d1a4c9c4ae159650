#include "physics/diffusion_kernels.hpp"

namespace brume::physics {

IndexBox cells_with_ghosts(const solver::BlockGeometry& g, int layers) {
  IndexBox box;
  for (int x = 0; x < 3; ++x) {
    const int extra = g.active(x) ? layers : 0;
    box.lower[x] = -extra;
    box.upper[x] = g.cells[x] + extra;
  }
  return box;
}

IndexBox faces_of_interior(const solver::BlockGeometry& g, int d) {
  IndexBox box;
  for (int x = 0; x < 3; ++x)
    box.upper[x] = g.cells[x] + (x == d && g.active(x) ? 1 : 0);
  return box;
}

IndexBox edges_of_interior(const solver::BlockGeometry& g, int e) {
  IndexBox box;
  for (int x = 0; x < 3; ++x)
    box.upper[x] = g.cells[x] + (x != e && g.active(x) ? 1 : 0);
  return box;
}

}  // namespace brume::physics
