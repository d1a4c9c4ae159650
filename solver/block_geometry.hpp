// The block of cells a rank owns: interior cells, ghost layers, global offset and coordinates.
//
// Storage of every cell or face array of the block uses the same extents, so that one linear index
// addresses the cell (i, j, k) and the lower faces of that cell in x, y and z. An active dimension
// (n > 1) has `ghost_layers` ghosts on each side plus one extra slot for the upper face of the last
// ghost cell; an inactive dimension (n = 1) has exactly one slot and no ghosts, and its neighbour
// step is 0, so that one code path serves 1D, 2D and 3D.
#pragma once

#include <array>
#include <cstddef>

namespace brume::solver {

struct BlockGeometry {
  std::array<int, 3> cells{1, 1, 1};         // interior cells per dimension
  int ghost_layers = 2;                      // ghost layers in each active dimension
  std::array<long, 3> offset{0, 0, 0};       // global index of the first interior cell
  std::array<double, 3> box_lower{0, 0, 0};  // lower corner of the whole box
  // Lower corner of the block, for reports only: positions are computed from the global index
  // (centre, face), so that a cell has the same coordinates in every decomposition.
  std::array<double, 3> lower{0, 0, 0};
  std::array<double, 3> spacing{1, 1, 1};  // cell size

  [[nodiscard]] bool active(int d) const { return cells[d] > 1; }
  [[nodiscard]] int ghosts(int d) const { return active(d) ? ghost_layers : 0; }
  [[nodiscard]] int dimensions() const { return int(active(0)) + int(active(1)) + int(active(2)); }
  // Storage slots along d: interior, ghosts and the extra face slot.
  [[nodiscard]] int extent(int d) const { return active(d) ? cells[d] + 2 * ghost_layers + 1 : 1; }
  // Linear distance between storage neighbours along d.
  [[nodiscard]] std::ptrdiff_t stride(int d) const {
    std::ptrdiff_t s = 1;
    for (int e = 0; e < d; ++e)
      s *= extent(e);
    return s;
  }
  // Offset of the neighbour along d: the stride in an active dimension, 0 in an inactive one.
  [[nodiscard]] std::ptrdiff_t step(int d) const { return active(d) ? stride(d) : 0; }
  [[nodiscard]] std::size_t storage_size() const {
    return std::size_t(extent(0)) * std::size_t(extent(1)) * std::size_t(extent(2));
  }
  [[nodiscard]] long interior_cells() const { return long(cells[0]) * cells[1] * cells[2]; }
  // Linear index of cell (i, j, k), counted from the first interior cell (ghosts are negative or ≥
  // n).
  [[nodiscard]] std::ptrdiff_t index(int i, int j, int k) const {
    return (i + ghosts(0)) + stride(1) * (j + ghosts(1)) + stride(2) * (k + ghosts(2));
  }
  // Interior-relative position (i, j, k) of linear index c (the inverse of index).
  [[nodiscard]] std::array<int, 3> position(std::ptrdiff_t c) const {
    std::array<int, 3> p{};
    for (int d = 0; d < 3; ++d) {
      p[d] = int(c % extent(d)) - ghosts(d);
      c /= extent(d);
    }
    return p;
  }
  // Centre of cell i along d, from its global index: box_lower + (offset + i + ½) dx rounds the
  // same way whatever block holds the cell (box_lower + offset dx, then + (i + ½) dx, would not).
  [[nodiscard]] double centre(int d, int i) const {
    return box_lower[d] + (double(offset[d] + i) + 0.5) * spacing[d];
  }
  // Coordinate of the lower face of cell i along d, from its global index as well.
  [[nodiscard]] double face(int d, int i) const {
    return box_lower[d] + double(offset[d] + i) * spacing[d];
  }
};

// A block that is the whole box [lower, upper] with the given cells per dimension.
[[nodiscard]] BlockGeometry whole_box_geometry(std::array<int, 3> cells,
                                               std::array<double, 3> lower,
                                               std::array<double, 3> upper, int ghost_layers);

// Tangential directions of a face with normal d, in cyclic order: x → (y, z), y → (z, x), z → (x,
// y).
[[nodiscard]] constexpr int tangent1(int d) {
  return (d + 1) % 3;
}
[[nodiscard]] constexpr int tangent2(int d) {
  return (d + 2) % 3;
}

}  // namespace brume::solver
