// Flags of the first-order fallback near the faces of a block: the cells of a block's first and
// last interior layers that the fallback flagged, as a neighbouring block needs them in its first
// ghost layer so that a face shared by two blocks is corrected on both sides (GhostFiller::
// exchange_flags). Flags travel as dense planes over the two other axes' interior cells.
#pragma once

#include <cstddef>
#include <vector>

#include "solver/block_geometry.hpp"

namespace brume::solver {

// Cells of a layer normal to `axis`: the interior cells of the two other axes.
[[nodiscard]] std::size_t layer_plane_size(const BlockGeometry& g, int axis);

// plane[a + n_a · b] = 1 for the listed cells c in [0, count) at interior-relative position
// `layer` along `axis` (a, b: positions along the two other axes, the lower-numbered first),
// 0 elsewhere.
void mark_layer(const std::vector<std::ptrdiff_t>& cells, std::size_t count, const BlockGeometry& g,
                int axis, int layer, unsigned char* plane);

// Appends the cells at position `layer` along `axis` whose entry in `plane` is set.
void append_marked_layer(const unsigned char* plane, const BlockGeometry& g, int axis, int layer,
                         std::vector<std::ptrdiff_t>& cells);

// A block that spans a periodic axis is its own neighbour: appends, for the listed cells in
// [0, count) on the first (last) interior layer along `axis`, their images in the upper (lower)
// ghost layer.
void append_periodic_images(std::vector<std::ptrdiff_t>& cells, std::size_t count,
                            const BlockGeometry& g, int axis);

}  // namespace brume::solver
