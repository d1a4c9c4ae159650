// Eigenmodes of the one-dimensional ideal-MHD (or Euler) equations linearized about a uniform
// state: the Jacobian of the primitive-variable system, its eigen-decomposition at run time, and
// the right eigenvector of one wave family in primitive and in conserved variables.
// Set-up code only (problems/): never called inside the step.
#pragma once

#include <array>
#include <vector>

namespace brume::problems {

enum class WaveFamily { fast, alfven, slow, entropy };

struct WaveGas {
  bool magnetic = true;
  bool isothermal = false;
  double gamma = 5.0 / 3.0;  // ideal gas
  double sound_speed = 1.0;  // isothermal gas
};

// Uniform state in the wave's frame: component 0 along the wave, 1 and 2 transverse.
struct WaveBackground {
  double density = 1.0;
  std::array<double, 3> velocity{};
  double pressure = 1.0;  // ignored when isothermal
  std::array<double, 3> field{};
};

struct Eigenmode {
  double speed = 0.0;  // eigenvalue: phase speed along the wave, lab frame
  // Right eigenvector in primitive variables (wave frame); δB along the wave is zero.
  double density = 0.0;
  std::array<double, 3> velocity{};
  double pressure = 0.0;
  std::array<double, 3> field{};
  // The same in conserved variables, in the order ρ, ρv (3), E (ideal gas), B_t1, B_t2 (MHD),
  // normalized to unit 2-norm; the primitive vector above is scaled to match.
  std::vector<double> conserved;
};

// The mode of `family` travelling along +k (direction = +1) or −k (direction = −1) relative to
// the gas; the entropy mode has one direction only and ignores `direction`. The sign is fixed so
// that the first of δρ, δB_t1, δB_t2, δ(ρv_t1), δ(ρv_t2) above 1e-8 in magnitude is positive.
// Throws std::invalid_argument if the gas has no such family (entropy in isothermal gas; Alfvén or
// slow without a field), or if its eigenvalue coincides with another family's (then the
// eigenvector is not unique); a degenerate entropy mode is the pure density wave δρ = 1.
[[nodiscard]] Eigenmode linear_eigenmode(const WaveGas& gas, const WaveBackground& background,
                                         WaveFamily family, int direction);

}  // namespace brume::problems
