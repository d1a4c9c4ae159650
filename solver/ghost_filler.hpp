// What a stage needs from the blocks around its own: ghost cells and ghost faces refreshed, the
// first-order fallback's flags across block faces, and agreement on a failure. Box boundaries
// implement it for one block (BoxGhostFiller), the halo exchange for a decomposed box.
//
// Every call is collective over the blocks of the box: every rank makes the same calls in the
// same order, whatever happened on its own block, or a rank would wait for ever in a call the
// others skipped.
#pragma once

#include <cstddef>
#include <vector>

#include "solver/state.hpp"

namespace brume::solver {

class GhostFiller {
 public:
  virtual ~GhostFiller() = default;
  // Fill every ghost cell and ghost face (including edges and corners) of `state`.
  virtual void fill(State& state) const = 0;

  // `cells`: this block's flagged interior cells (linear indices of geometry `g`), ascending. Adds
  // the flagged cells of the blocks across its faces that lie in its first ghost layer, at the
  // faces shared with another block or with itself across a periodic wrap (none beyond a physical
  // box face), and leaves the list ascending. The default has no such faces.
  virtual void exchange_flags(const BlockGeometry& g, std::vector<std::ptrdiff_t>& cells) const {
    (void)g, (void)cells;
  }

  // True on every block when `local` is true on any block. The default is one block.
  [[nodiscard]] virtual bool any_block(bool local) const { return local; }
};

}  // namespace brume::solver
