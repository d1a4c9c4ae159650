#include "solver/boundary_layer_flags.hpp"

#include <algorithm>

namespace brume::solver {

namespace {

// The two axes other than `axis`, the lower-numbered first.
struct OtherAxes {
  int a, b;
};
OtherAxes other_axes(int axis) {
  return {axis == 0 ? 1 : 0, axis == 2 ? 1 : 2};
}

}  // namespace

std::size_t layer_plane_size(const BlockGeometry& g, int axis) {
  const OtherAxes o = other_axes(axis);
  return std::size_t(g.cells[o.a]) * std::size_t(g.cells[o.b]);
}

void mark_layer(const std::vector<std::ptrdiff_t>& cells, std::size_t count, const BlockGeometry& g,
                int axis, int layer, unsigned char* plane) {
  const OtherAxes o = other_axes(axis);
  std::fill(plane, plane + layer_plane_size(g, axis), static_cast<unsigned char>(0));
  for (std::size_t m = 0; m < count; ++m) {
    const std::array<int, 3> p = g.position(cells[m]);
    if (p[axis] != layer) continue;
    plane[std::size_t(p[o.a]) + std::size_t(g.cells[o.a]) * std::size_t(p[o.b])] = 1;
  }
}

void append_marked_layer(const unsigned char* plane, const BlockGeometry& g, int axis, int layer,
                         std::vector<std::ptrdiff_t>& cells) {
  const OtherAxes o = other_axes(axis);
  std::array<int, 3> p{};
  p[axis] = layer;
  std::size_t slot = 0;
  for (p[o.b] = 0; p[o.b] < g.cells[o.b]; ++p[o.b]) {
    for (p[o.a] = 0; p[o.a] < g.cells[o.a]; ++p[o.a], ++slot) {
      if (plane[slot] != 0) cells.push_back(g.index(p[0], p[1], p[2]));
    }
  }
}

void append_periodic_images(std::vector<std::ptrdiff_t>& cells, std::size_t count,
                            const BlockGeometry& g, int axis) {
  const int n = g.cells[axis];
  const std::ptrdiff_t shift = std::ptrdiff_t(n) * g.stride(axis);
  for (std::size_t m = 0; m < count; ++m) {
    const std::ptrdiff_t c = cells[m];  // a copy: push_back may move the list
    const int p = g.position(c)[axis];
    if (p == 0) cells.push_back(c + shift);
    if (p == n - 1) cells.push_back(c - shift);
  }
}

}  // namespace brume::solver
