#include "solver/state.hpp"

namespace brume::solver {

State make_state(const BlockGeometry& geometry, bool magnetic, bool isothermal) {
  State s;
  s.geometry = geometry;
  s.magnetic = magnetic;
  s.isothermal = isothermal;
  const std::size_t n = geometry.storage_size();
  s.density.assign(n, 0.0);
  for (auto& m : s.momentum)
    m.assign(n, 0.0);
  if (!isothermal) s.energy.assign(n, 0.0);
  if (magnetic) {
    for (auto& b : s.face_field)
      b.assign(n, 0.0);
  }
  return s;
}

std::size_t allocated_bytes(const State& s) {
  std::size_t n = s.density.capacity() + s.energy.capacity();
  for (int d = 0; d < 3; ++d)
    n += s.momentum[d].capacity() + s.face_field[d].capacity();
  return n * sizeof(double);
}

std::vector<std::vector<double>*> cell_arrays(State& s) {
  std::vector<std::vector<double>*> arrays{&s.density, &s.momentum[0], &s.momentum[1],
                                           &s.momentum[2]};
  if (!s.isothermal) arrays.push_back(&s.energy);
  return arrays;
}

}  // namespace brume::solver
