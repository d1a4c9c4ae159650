#include "solver/block_geometry.hpp"

#include <stdexcept>

namespace brume::solver {

BlockGeometry whole_box_geometry(std::array<int, 3> cells, std::array<double, 3> lower,
                                 std::array<double, 3> upper, int ghost_layers) {
  BlockGeometry g;
  g.cells = cells;
  g.ghost_layers = ghost_layers;
  g.box_lower = lower;
  g.lower = lower;
  for (int d = 0; d < 3; ++d) {
    if (cells[d] < 1 || !(upper[d] > lower[d])) {
      throw std::invalid_argument("block geometry: need n >= 1 cells and upper > lower per axis");
    }
    if (cells[d] > 1 && cells[d] < ghost_layers) {
      throw std::invalid_argument(
          "block geometry: fewer cells than ghost layers in an active axis");
    }
    g.spacing[d] = (upper[d] - lower[d]) / cells[d];
  }
  if (ghost_layers < 1)
    throw std::invalid_argument("block geometry: need at least one ghost layer");
  return g;
}

}  // namespace brume::solver
