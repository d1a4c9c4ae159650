// The stirred Fourier modes: the integer wavevectors n of the periodic box with
// k_min ≤ |n| ≤ k_max (k = 2π n_d / L_d), one of each ±n pair, each with its weight in the
// spectral profile and its Helmholtz projection.
#pragma once

#include <array>
#include <vector>

namespace brume::physics {

enum class StirringProfile { parabolic, flat };

struct StirringMode {
  std::array<int, 3> n{};  // integer wavevector: n_x > 0, or n_x = 0 and n_y > 0, or ...
  double weight = 1.0;     // amplitude (standard deviation) relative to the profile's peak
  std::array<double, 9> projection{};  // P_ij (row-major), real and symmetric
};

// Amplitude weight of a mode at |n| = magnitude in the shell [lowest, highest]. Parabolic:
// 1 − ((|n| − n_c)/Δ)², n_c the shell's middle and Δ its half width, zero at both ends (the
// paraboloid of Schmidt, Federrath & Klessen 2008, PRL 101, 194505, and Federrath et al. 2010,
// A&A 512, A81, §2.1 — from memory); flat: 1. A shell of zero width is flat.
[[nodiscard]] double stirring_profile_weight(StirringProfile profile, double magnitude, int lowest,
                                             int highest);

// P_ij = ζ P⊥_ij + (1 − ζ) P∥_ij = ζ δ_ij + (1 − 2ζ) n_i n_j / |n|² (Federrath et al. 2010,
// A&A 512, A81, eq. 9 — from memory), with n scaled by 1/L_d so that it is the direction of the
// physical wavevector k.
[[nodiscard]] std::array<double, 9> helmholtz_projection(const std::array<int, 3>& n,
                                                         const std::array<double, 3>& box_size,
                                                         double solenoidal_weight);

// The modes of the shell with a non-zero weight, in a fixed order (n_x, then n_y, then n_z
// ascending). Axes with one cell (2D, 1D boxes) get n_d = 0 only.
[[nodiscard]] std::vector<StirringMode> stirring_modes(int lowest, int highest,
                                                       StirringProfile profile,
                                                       double solenoidal_weight,
                                                       const std::array<double, 3>& box_size,
                                                       const std::array<bool, 3>& active);

}  // namespace brume::physics
