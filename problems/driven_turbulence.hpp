// Driven magnetized turbulence: uniform gas at rest threaded by a uniform field, stirred for the
// whole run by the `stirring` section's acceleration (the problem sets only the start).
#pragma once

#include "problems/problem.hpp"

namespace brume::problems {

[[nodiscard]] Problem driven_turbulence_problem();

}  // namespace brume::problems
