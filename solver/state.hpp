// The evolved state of a block: cell-centred conserved variables (structure of arrays) and the
// face-centred magnetic field. Cell-centred B is derived (face average), never stored.
#pragma once

#include <array>
#include <cstddef>
#include <vector>

#include "solver/block_geometry.hpp"

namespace brume::solver {

struct State {
  BlockGeometry geometry;
  bool magnetic = false;
  bool isothermal = false;
  std::vector<double> density;
  std::array<std::vector<double>, 3> momentum;
  std::vector<double> energy;  // total energy p/(γ−1) + ρv²/2 + B²/2; empty when isothermal
  // face_field[d] is B_d on the lower d-face of each cell; empty for hydrodynamics.
  std::array<std::vector<double>, 3> face_field;
  double time = 0.0;
  long step = 0;
};

// A zero-filled state with storage for `geometry`.
[[nodiscard]] State make_state(const BlockGeometry& geometry, bool magnetic, bool isothermal);

// Cell-centred B_d of cell `c` (linear index): the average of its two d-faces.
[[nodiscard]] inline double cell_field(const State& s, int d, std::ptrdiff_t c) {
  const double* b = s.face_field[d].data();
  return 0.5 * (b[c] + b[c + s.geometry.step(d)]);
}

// Bytes of the arrays a state holds (their capacity).
[[nodiscard]] std::size_t allocated_bytes(const State& s);

// Pointers to every cell-centred array of a state (density, momenta, energy if present).
[[nodiscard]] std::vector<std::vector<double>*> cell_arrays(State& s);

}  // namespace brume::solver
