// Boundary conditions on the six faces of the box, applied by filling ghost cells and faces.
#pragma once

#include <array>

#include "solver/ghost_filler.hpp"

namespace brume::solver {

enum class BoundaryKind {
  periodic,    // the opposite side of the box
  outflow,     // zero gradient: copy of the last interior cell (or boundary face)
  reflecting,  // mirror image; normal velocity and normal field change sign
};

struct BoxBoundaries {
  std::array<BoundaryKind, 3> lower{BoundaryKind::periodic, BoundaryKind::periodic,
                                    BoundaryKind::periodic};
  std::array<BoundaryKind, 3> upper{BoundaryKind::periodic, BoundaryKind::periodic,
                                    BoundaryKind::periodic};
};

// Fills ghosts axis by axis (x, then y, then z over the full extents of the others), so that edge
// and corner ghosts are filled too. The block must be the whole box along axes with box boundaries.
class BoxGhostFiller final : public GhostFiller {
 public:
  explicit BoxGhostFiller(const BoxBoundaries& boundaries) : boundaries_(boundaries) {}
  void fill(State& state) const override;
  // Across a periodic wrap the block is its own neighbour: the flags of its first (last) layer
  // are those of its upper (lower) ghost layer.
  void exchange_flags(const BlockGeometry& g, std::vector<std::ptrdiff_t>& cells) const override;

 private:
  BoxBoundaries boundaries_;
};

// Ghost filling of one array along one axis; `staggered` marks a face array whose faces are normal
// to the axis, `parity` is −1 for quantities that change sign in a mirror (reflecting only).
void fill_axis(double* q, const BlockGeometry& g, int axis, BoundaryKind lower, BoundaryKind upper,
               bool staggered, double parity);

}  // namespace brume::solver
