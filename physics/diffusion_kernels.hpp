// The per-direction kernels of the diffusion operator (diffusion_operator.hpp). Fluxes through the
// lower d-face of cell c (between c − s_d and c) are written to index c, for every face an
// interior cell owns; rates of the face fields likewise. Inputs need one layer of ghosts.
#pragma once

#include <array>
#include <vector>

#include "solver/block_geometry.hpp"

namespace brume::physics {

// Index ranges [lower, upper) of a loop over a block, per dimension.
struct IndexBox {
  std::array<int, 3> lower{0, 0, 0};
  std::array<int, 3> upper{1, 1, 1};
};

// The interior cells and, along every active axis, `layers` ghosts on each side.
[[nodiscard]] IndexBox cells_with_ghosts(const solver::BlockGeometry& g, int layers);
// The d-faces of the interior cells: both boundary faces along an active d.
[[nodiscard]] IndexBox faces_of_interior(const solver::BlockGeometry& g, int d);
// The e-edges of the interior faces: both boundary edges along each active axis other than e.
[[nodiscard]] IndexBox edges_of_interior(const solver::BlockGeometry& g, int e);

using Fields = std::array<std::vector<double>, 3>;

// F_E += −κ_face (θ_c − θ_{c−s}) / Δx_d with κ_face the mean of the two cells.
void add_conduction_flux(const solver::BlockGeometry& g, int d, const std::vector<double>& theta,
                         const std::vector<double>& kappa, std::vector<double>& energy_flux);

// Navier–Stokes stress τ = ρ ν (∇v + ∇vᵀ − ⅔ (∇·v) I) on the d-faces: F_m += −τ_dm and
// F_E += −τ_dm v_m.
void add_viscous_flux(const solver::BlockGeometry& g, int d, double viscosity,
                      const std::vector<double>& density, const Fields& velocity,
                      Fields& momentum_flux, std::vector<double>& energy_flux);

// E_e = η J_e on the edges of the interior faces, J = ∇ × B from the face fields.
void ohmic_emf(const solver::BlockGeometry& g, double resistivity, const Fields& face_field,
               Fields& emf);

// Poynting flux of the Ohmic EMF through the d-faces: F_E += (E × B)_d.
void add_poynting_flux(const solver::BlockGeometry& g, int d, const Fields& emf,
                       const Fields& face_field, std::vector<double>& energy_flux);

// ∂B/∂t = −∇ × E on every interior face: the discrete curl of the edge EMFs.
void set_face_rates(const solver::BlockGeometry& g, const Fields& emf, Fields& face_rate);

}  // namespace brume::physics
