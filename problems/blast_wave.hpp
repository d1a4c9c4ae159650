// The MHD blast wave: an overpressured circle (sphere in 3D) in a uniform, strongly magnetized gas.
// The explosion is channelled along the field; at low plasma β it tests the positivity of the
// scheme and the robustness of constrained transport in strong rarefactions.
#pragma once

#include "problems/problem.hpp"

namespace brume::problems {

[[nodiscard]] Problem blast_wave_problem();

}  // namespace brume::problems
