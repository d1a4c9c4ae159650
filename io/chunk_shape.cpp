#include "io/chunk_shape.hpp"

namespace brume::io {

std::array<hsize_t, 3> chunk_shape(const std::array<hsize_t, 3>& shape) {
  std::array<hsize_t, 3> chunk = shape;
  while (chunk[0] * chunk[1] * chunk[2] > chunk_elements) {
    int longest = 0;
    for (int a = 1; a < 3; ++a) {
      if (chunk[a] > chunk[longest]) longest = a;
    }
    chunk[longest] = (chunk[longest] + 1) / 2;
  }
  return chunk;
}

}  // namespace brume::io
