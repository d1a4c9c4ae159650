#include "solver/stage_scratch.hpp"

namespace brume::solver {

StageScratch make_stage_scratch(const BlockGeometry& g, bool magnetic, bool isothermal) {
  StageScratch s;
  const std::size_t n = g.storage_size();
  for (auto& v : s.primitive.velocity)
    v.assign(n, 0.0);
  if (!isothermal) s.primitive.pressure.assign(n, 0.0);
  if (magnetic) {
    for (int d = 0; d < 3; ++d) {
      for (auto& e : s.ct.face_emf[d])
        e.assign(n, 0.0);
      s.ct.mass_sign[d].assign(n, 0);
    }
  }
  // One row of the x extent, rounded up to whole cache lines.
  s.rows.length = (std::size_t(g.extent(0)) + 7) / 8 * 8;
  if (magnetic) {
    s.ct.row_length = s.rows.length;
    s.ct.edge_rows.assign(2 * s.ct.row_length, 0.0);
  }
  s.rows.data.assign(
      std::size_t(4 * SweepRows::variables + 2 * SweepRows::flux_components) * s.rows.length, 0.0);
  return s;
}

std::size_t allocated_bytes(const StageScratch& s) {
  std::size_t doubles = s.primitive.pressure.capacity();
  std::size_t bytes = 0;
  for (int d = 0; d < 3; ++d) {
    doubles += s.primitive.velocity[d].capacity();
    for (const auto& e : s.ct.face_emf[d])
      doubles += e.capacity();
    bytes += s.ct.mass_sign[d].capacity();
  }
  doubles += s.rows.data.capacity() + s.ct.edge_rows.capacity();
  return bytes + doubles * sizeof(double);
}

}  // namespace brume::solver
