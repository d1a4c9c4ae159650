// The circularly polarized Alfvén wave: a finite-amplitude transverse field and velocity that
// rotate along the wave with |B_⊥| constant, so that the total pressure is uniform and the wave is
// an exact non-linear solution travelling at B_∥/√ρ relative to the gas (Tóth 2000, J. Comput.
// Phys. 161, 605, §6.3; from memory). It runs along the diagonal of a periodic box with one
// wavelength across each side; the field comes from a vector potential.
#pragma once

#include "problems/oblique_wave_frame.hpp"
#include "problems/problem.hpp"

namespace brume::problems {

[[nodiscard]] Problem polarized_alfven_wave_problem();

// The exact solution in code units: the state at (x, y, z) and time t.
struct PolarizedAlfvenWave {
  ObliqueWave wave;
  double density = 1.0;
  double pressure = 0.1;
  double parallel_field = 1.0;  // B along k
  double amplitude = 0.1;       // |B_⊥|
  double flow_speed = 0.0;      // gas velocity along k
  int direction = 1;            // +1: along k relative to the gas, −1: against
  // Phase speed along k in the lab frame, flow_speed + direction · B_∥/√ρ.
  [[nodiscard]] double speed() const;
  // Wavelength / |speed|; infinite for a standing wave.
  [[nodiscard]] double period() const;
  // Transverse field (t1, t2) in the wave frame at phase φ − k·speed·t.
  [[nodiscard]] std::array<double, 3> field(double x, double y, double z, double t) const;
  [[nodiscard]] std::array<double, 3> velocity(double x, double y, double z, double t) const;
};

[[nodiscard]] PolarizedAlfvenWave polarized_alfven_wave(const SetupContext& context);

}  // namespace brume::problems
