// The part of a block's storage array that takes part in a snapshot read or write, and where it
// lies in the global dataset ([z][y][x], slowest first, as HDF5 wants it).
#pragma once

#include <hdf5.h>

#include <array>
#include <string>

#include "solver/block_geometry.hpp"

namespace brume::io {

struct BlockSelection {
  std::array<hsize_t, 3> memory_extent;  // storage extents
  std::array<hsize_t, 3> memory_start;
  std::array<hsize_t, 3> count;
  std::array<hsize_t, 3> file_extent;
  std::array<hsize_t, 3> file_start;
};

// Which faces of a face array a block takes along its normal.
enum class FaceRange {
  owned,     // the lower face of each cell, and the upper box face for the last block: every face
             // belongs to exactly one block (writing)
  bounding,  // lower and upper faces of every cell: faces between blocks go to both (reading)
};

// `staggered_axis` is the normal of a face array (−1 for cell data); `global_cells` the box.
[[nodiscard]] BlockSelection block_selection(const solver::BlockGeometry& block,
                                             const std::array<long, 3>& global_cells,
                                             int staggered_axis, FaceRange faces);

// Selects the block in `memory_space` (of extent memory_extent) and in `file_space`; throws
// std::runtime_error naming `what` when HDF5 refuses.
void select_block(hid_t memory_space, hid_t file_space, const BlockSelection& s,
                  const std::string& what);

}  // namespace brume::io
