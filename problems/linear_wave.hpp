// A linear wave: a small-amplitude eigenmode of one wave family (fast, Alfvén, slow or entropy,
// either direction) on a uniform background, travelling along the diagonal of a periodic box
// (one wavelength across each side). The set-up of Gardiner & Stone 2008, J. Comput. Phys. 227,
// 4123, §8.1, and Stone et al. 2008, ApJS 178, 137, §8.1 (from memory). The eigenvector is computed
// at run time from the linearized equations; the field perturbation comes from a vector potential.
#pragma once

#include "problems/linear_wave_eigenmode.hpp"
#include "problems/oblique_wave_frame.hpp"
#include "problems/problem.hpp"

namespace brume::problems {

[[nodiscard]] Problem linear_wave_problem();

// Everything the set-up derives from problem.linear_wave and the box, in code units.
struct LinearWave {
  WaveGas gas;
  WaveBackground background;  // wave frame
  Eigenmode mode;
  ObliqueWave wave;
  double amplitude = 0.0;
  double period = 0.0;  // wavelength / |speed|; infinite for a standing mode
};

[[nodiscard]] LinearWave linear_wave(const SetupContext& context);

}  // namespace brume::problems
