// Decaying magnetized turbulence: uniform gas threaded by a mean field, stirred once at the start
// by a random solenoidal velocity field at the largest scales, then left to decay.
#pragma once

#include "problems/problem.hpp"

namespace brume::problems {

[[nodiscard]] Problem decaying_turbulence_problem();

}  // namespace brume::problems
