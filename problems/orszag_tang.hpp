// The Orszag–Tang vortex: a doubly periodic vortex of flow and field that steepens into
// interacting MHD shocks and current sheets, the standard test of multidimensional MHD shocks.
#pragma once

#include "problems/problem.hpp"

namespace brume::problems {

[[nodiscard]] Problem orszag_tang_problem();

}  // namespace brume::problems
