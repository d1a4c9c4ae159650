// A plane wave that fits a periodic box obliquely: the wave vector k = 2π (1/L_x, 1/L_y, 1/L_z)
// over the active axes (one wavelength across each side, so one wavelength along the diagonal),
// the wave's orthonormal frame (along k, first transverse, second transverse) and the vector
// potential of a transverse field that varies sinusoidally along k.
#pragma once

#include <array>

#include "problems/face_field_setup.hpp"
#include "problems/problem.hpp"

namespace brume::problems {

// A transverse field in the wave's frame as a function of the phase φ = k·(x − x0):
// δB_t1 = t1_sin sin φ + t1_cos cos φ, δB_t2 = t2_sin sin φ + t2_cos cos φ.
struct TransverseField {
  double t1_sin = 0.0, t1_cos = 0.0, t2_sin = 0.0, t2_cos = 0.0;
};

struct ObliqueWave {
  std::array<double, 3> wave_vector{};   // k, Cartesian, code units
  std::array<double, 3> origin{};        // phase zero (the box's lower corner)
  std::array<double, 3> along{1, 0, 0};  // k / |k|
  std::array<double, 3> transverse1{0, 1,
                                    0};  // e_z × along, normalized (e_x × along if along ∥ e_z)
  std::array<double, 3> transverse2{0, 0, 1};  // along × transverse1
  double wavenumber = 1.0;                     // |k|
  double wavelength = 1.0;                     // 2π/|k|

  [[nodiscard]] double phase(double x, double y, double z) const;
  // The Cartesian vector with components (along, t1, t2) in the wave's frame.
  [[nodiscard]] std::array<double, 3> to_box(const std::array<double, 3>& wave_frame) const;
  // A vector potential whose curl is the transverse field (no uniform part): in the wave's frame
  // A_t1 = ∫ δB_t2 dξ and A_t2 = −∫ δB_t1 dξ along ξ = φ/|k|.
  [[nodiscard]] VectorPotential potential(const TransverseField& field) const;
};

// The wave of a box of `size` with `cells` per axis (axes with one cell are inactive); the box
// needs at least one active axis.
[[nodiscard]] ObliqueWave box_diagonal_wave(const std::array<double, 3>& lower,
                                            const std::array<double, 3>& size,
                                            const std::array<long, 3>& cells);

[[nodiscard]] inline ObliqueWave box_diagonal_wave(const SetupContext& c) {
  return box_diagonal_wave(c.box_lower, c.box_size, c.box_cells);
}

}  // namespace brume::problems
