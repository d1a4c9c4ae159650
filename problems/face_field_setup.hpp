// Divergence-free initial magnetic fields on the faces of a block: a uniform field plus the curl of
// a vector potential given at cell edges, so that the discrete div B vanishes to round-off.
#pragma once

#include <array>
#include <functional>

#include "solver/state.hpp"

namespace brume::problems {

// A vector potential A(x, y, z) in code units; called once per edge at setup, never in the step.
using VectorPotential = std::function<std::array<double, 3>(double x, double y, double z)>;

// Set the interior faces (and the upper faces of the last interior cells) of `state` to
// B = uniform + curl A, the curl taken as the difference of A around each face (Stokes), which is
// the discrete form whose divergence vanishes exactly — Evans & Hawley 1988, ApJ 332, 659.
void set_face_field(solver::State& state, const std::array<double, 3>& uniform,
                    const VectorPotential& potential);

// A uniform field given in gauss on every face of a magnetized state (nothing for hydrodynamics).
void set_uniform_field(solver::State& state, std::array<double, 3> gauss,
                       double code_magnetic_field);

}  // namespace brume::problems
