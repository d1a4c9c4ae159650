// The initial state `brume bench` advances: a periodic unit box with a smooth, non-trivial flow
// (a few Fourier modes in every variable) and, for MHD, a divergence-free face field.
#pragma once

#include "solver/state.hpp"

namespace brume::app {

// Interior cells of `state` set from the bench flow; the face field (MHD) is the discrete curl
// of an edge potential plus a uniform part, so its discrete divergence vanishes to round-off.
void set_bench_flow(solver::State& state, double gamma);

}  // namespace brume::app
