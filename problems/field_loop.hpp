// Field-loop advection: a weak cylindrical loop of magnetic field carried by a uniform flow across
// a periodic box. The loop should return unchanged; its decay measures the numerical dissipation
// of the field and its shape the quality of the constrained-transport EMFs.
#pragma once

#include "problems/problem.hpp"

namespace brume::problems {

[[nodiscard]] Problem field_loop_problem();

}  // namespace brume::problems
