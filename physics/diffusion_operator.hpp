// The discrete diffusion operator L(U) of conduction, viscosity and Ohmic resistivity: the rate of
// change of the momenta, the total energy and the face fields, from second-order central
// differences in flux form (conservative to round-off) and, for resistivity, edge EMFs whose
// discrete curl updates the faces (div B unchanged to round-off).
#pragma once

#include <array>
#include <vector>

#include "physics/diffusion_coefficients.hpp"
#include "solver/state.hpp"

namespace brume::physics {

class DiffusionOperator {
 public:
  DiffusionOperator(const DiffusionCoefficients& coefficients,
                    const solver::BlockGeometry& geometry);

  // L(y) into the momenta, energy and face fields of `rate` (interior cells, and every face an
  // interior cell owns, both boundary faces included); density of `rate` is untouched. The ghosts
  // of `y` (one layer, edges and corners) must be filled.
  void rate(const solver::State& y, solver::State& rate);

  // The forward-Euler stability limit of L on this block: 1 / (2 D Σ_d 1/Δx_d²) with D the largest
  // diffusivity over its interior cells (common practice, no source). Needs the same ghosts as
  // rate().
  [[nodiscard]] double explicit_step(const solver::State& y);

  [[nodiscard]] const DiffusionCoefficients& coefficients() const { return coefficients_; }
  [[nodiscard]] const solver::BlockGeometry& geometry() const { return geometry_; }

 private:
  void cell_primitives(const solver::State& y);
  void face_fluxes(const solver::State& y, int d);
  void add_flux_divergence(solver::State& rate, int d) const;

  DiffusionCoefficients coefficients_;
  solver::BlockGeometry geometry_;
  // Scratch, allocated once: velocities, θ = p/ρ and κ(θ) of the cells with one ghost layer;
  // fluxes through the d-faces; edge EMFs E_e = η J_e.
  std::array<std::vector<double>, 3> velocity_;
  std::vector<double> theta_;
  std::vector<double> kappa_;
  std::array<std::vector<double>, 3> momentum_flux_;
  std::vector<double> energy_flux_;
  std::array<std::vector<double>, 3> emf_;
};

}  // namespace brume::physics
