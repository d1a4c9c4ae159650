#include "solver/stage_scratch.hpp"

namespace brume::solver {

StageScratch make_stage_scratch(const BlockGeometry& g, bool magnetic, bool isothermal) {
  StageScratch s;
  const std::size_t n = g.storage_size();
  s.primitive.density.assign(n, 0.0);
  for (auto& v : s.primitive.velocity)
    v.assign(n, 0.0);
  if (!isothermal) s.primitive.pressure.assign(n, 0.0);
  if (magnetic) {
    for (int d = 0; d < 3; ++d) {
      for (auto& e : s.ct.face_emf[d])
        e.assign(n, 0.0);
      s.ct.mass_sign[d].assign(n, 0);
      s.ct.edge_emf[d].assign(n, 0.0);
    }
  }
  const std::size_t plane = std::size_t(g.stride(2));  // one layer of storage in z
  for (auto& p : s.planes.plane) {
    for (auto& c : p)
      c.assign(plane, 0.0);
  }
  return s;
}

}  // namespace brume::solver
