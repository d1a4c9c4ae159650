#include "io/block_selection.hpp"

#include <string>

#include "io/hdf5_handles.hpp"

namespace brume::io {

BlockSelection block_selection(const solver::BlockGeometry& g,
                               const std::array<long, 3>& global_cells, int staggered_axis,
                               FaceRange faces) {
  BlockSelection s{};
  for (int d = 0; d < 3; ++d) {
    const int z = 2 - d;  // HDF5 order: slowest first
    const bool face = d == staggered_axis && g.active(d);
    const bool last = g.offset[d] + g.cells[d] == global_cells[d];
    const bool upper_face = face && (faces == FaceRange::bounding || last);
    s.memory_extent[z] = static_cast<hsize_t>(g.extent(d));
    s.memory_start[z] = static_cast<hsize_t>(g.ghosts(d));
    s.count[z] = static_cast<hsize_t>(g.cells[d] + (upper_face ? 1 : 0));
    s.file_extent[z] = static_cast<hsize_t>(global_cells[d] + (face ? 1 : 0));
    s.file_start[z] = static_cast<hsize_t>(g.offset[d]);
  }
  return s;
}

void select_block(hid_t memory_space, hid_t file_space, const BlockSelection& s,
                  const std::string& what) {
  checked_status(H5Sselect_hyperslab(memory_space, H5S_SELECT_SET, s.memory_start.data(), nullptr,
                                     s.count.data(), nullptr),
                 "memory selection of " + what);
  checked_status(H5Sselect_hyperslab(file_space, H5S_SELECT_SET, s.file_start.data(), nullptr,
                                     s.count.data(), nullptr),
                 "file selection of " + what);
}

}  // namespace brume::io
