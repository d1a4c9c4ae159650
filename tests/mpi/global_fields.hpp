// The state of a decomposed box gathered to rank 0 in the global layout, for bitwise comparison
// of runs on different numbers of ranks.
#pragma once

#include <array>
#include <string>
#include <vector>

#include "solver/decomposition.hpp"
#include "solver/state.hpp"

namespace brume::mpi_testing {

struct GlobalFields {
  std::array<long, 3> cells{};
  // density, three momenta and (ideal gas) energy, i fastest over the whole box
  std::vector<std::vector<double>> cell_arrays;
  // B_d on every d-face of the box: cells[d] + 1 faces along an active d
  std::array<std::vector<double>, 3> faces;
  // Faces two blocks both hold (the upper face of one, the lower face of the next) whose values
  // differ in any bit.
  long shared_face_mismatches = 0;
};

// Collective over the decomposition's communicator; the result is filled on its rank 0 only.
[[nodiscard]] GlobalFields gather(const solver::State& state,
                                  const solver::Decomposition& decomposition);

// The first difference in any bit between two gathered states, or an empty string.
[[nodiscard]] std::string first_difference(const GlobalFields& a, const GlobalFields& b);

}  // namespace brume::mpi_testing
