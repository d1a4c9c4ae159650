// What every operator split from the ideal-MHD step, and every diagnostic, may need to know about
// the run: units, gas, the whole box (for global coordinates), the communicator and the ghost
// filler.
#pragma once

#include <mpi.h>

#include <array>
#include <memory>

#include "solver/ghost_filler.hpp"
#include "solver/units/code_units.hpp"

namespace brume::physics {

struct RunContext {
  units::CodeUnits code_units;
  double gamma = 5.0 / 3.0;            // ideal gas
  double sound_speed = 1.0;            // isothermal gas, code units
  double mean_molecular_weight = 1.0;  // μ: ρ = μ m_H n, and T from p = n k_B T
  bool isothermal = false;
  bool magnetic = true;
  std::array<long, 3> box_cells{};
  std::array<double, 3> box_lower{};  // code units
  std::array<double, 3> box_size{};   // code units
  MPI_Comm comm = MPI_COMM_WORLD;     // the blocks of the box
  std::shared_ptr<const solver::GhostFiller> ghosts;
};

}  // namespace brume::physics
