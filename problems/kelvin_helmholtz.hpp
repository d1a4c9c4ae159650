// The Kelvin–Helmholtz instability: two shear layers in a periodic box, seeded with a small
// transverse velocity of one Fourier mode, optionally threaded by a weak field along the flow.
#pragma once

#include "problems/problem.hpp"

namespace brume::problems {

[[nodiscard]] Problem kelvin_helmholtz_problem();

}  // namespace brume::problems
