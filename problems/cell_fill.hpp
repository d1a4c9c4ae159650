// Filling the interior cells of a state from primitive variables given as a function of position.
#pragma once

#include <array>
#include <functional>

#include "solver/state.hpp"

namespace brume::problems {

struct PrimitiveCell {
  double density;
  std::array<double, 3> velocity;
  double pressure;  // ignored when the state is isothermal
};

using PrimitiveProfile = std::function<PrimitiveCell(double x, double y, double z)>;

// Sets density, momenta and (ideal gas) total energy of every interior cell from the profile at
// the cell centre; the magnetic energy uses the face field already set in `state`.
void fill_cells(solver::State& state, double gamma, const PrimitiveProfile& profile);

}  // namespace brume::problems
