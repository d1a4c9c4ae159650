// Thermal instability of a uniform medium in thermal equilibrium (Field 1965, ApJ 142, 531): the
// gas sits on the equilibrium curve of the cooling function in use (section `cooling`) at a given
// density or pressure, with a small isobaric sinusoidal density perturbation of one Fourier mode.
// On the isobarically unstable branch the condensation mode grows; elsewhere it decays.
#pragma once

#include "problems/problem.hpp"

namespace brume::problems {

[[nodiscard]] Problem thermal_instability_problem();

}  // namespace brume::problems
