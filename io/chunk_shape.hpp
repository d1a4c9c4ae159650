// The chunks of a compressed snapshot dataset. They depend only on the dataset's shape, never on
// the decomposition, so that the file is the same whatever the number of ranks that wrote it.
#pragma once

#include <hdf5.h>

#include <array>

namespace brume::io {

// Elements in a chunk at most: 2^17, i.e. 1 MiB of float64, the size of HDF5's default chunk
// cache per dataset (common practice, no source).
inline constexpr hsize_t chunk_elements = hsize_t{1} << 17;

// Chunk extents for a dataset of `shape` (slowest axis first): the longest extent is halved
// (rounding up; ties go to the slower axis) until the chunk holds at most `chunk_elements`.
[[nodiscard]] std::array<hsize_t, 3> chunk_shape(const std::array<hsize_t, 3>& shape);

}  // namespace brume::io
