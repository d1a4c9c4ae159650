#include "physics/diffusion_kernels.hpp"

namespace brume::physics {

namespace {

// The Navier–Stokes viscous stress of a Newtonian fluid with Stokes' hypothesis (zero bulk
// viscosity), τ = μ (∇v + ∇vᵀ − ⅔ (∇·v) I) with μ = ρ ν (Landau & Lifshitz 1987, Fluid Mechanics,
// 2nd ed., §15, eq. 15.3, from memory), on the D-faces: the normal derivative by the two-point
// difference across the face, the transverse ones by the mean of the central differences in the two
// cells beside it (common practice, no source). An inactive axis has step 0 and gives zero.
template <int D>
void viscous_flux_along(const solver::BlockGeometry& g, double viscosity,
                        const std::vector<double>& density, const Fields& velocity,
                        Fields& momentum_flux, std::vector<double>& energy_flux) {
  const IndexBox box = faces_of_interior(g, D);
  std::array<std::ptrdiff_t, 3> s{};
  std::array<double, 3> inverse{};
  for (int a = 0; a < 3; ++a) {
    s[std::size_t(a)] = g.step(a);
    // The transverse difference spans two cells in each of the two columns beside the face.
    inverse[std::size_t(a)] = (a == D ? 1.0 : 0.25) / g.spacing[a];
  }
  const std::ptrdiff_t sd = s[D];
  const double* rho = density.data();
  const std::array<const double*, 3> v{velocity[0].data(), velocity[1].data(), velocity[2].data()};
  const std::array<double*, 3> fm{momentum_flux[0].data(), momentum_flux[1].data(),
                                  momentum_flux[2].data()};
  double* fe = energy_flux.data();
  constexpr double two_thirds = 2.0 / 3.0;
  for (int k = box.lower[2]; k < box.upper[2]; ++k) {
    for (int j = box.lower[1]; j < box.upper[1]; ++j) {
      const std::ptrdiff_t row = g.index(box.lower[0], j, k);
      const int n = box.upper[0] - box.lower[0];
      for (int i = 0; i < n; ++i) {
        const std::ptrdiff_t c = row + i;
        const std::ptrdiff_t l = c - sd;
        double grad[3][3];  // grad[a][b] = ∂_a v_b on the face
        for (int a = 0; a < 3; ++a) {
          const std::ptrdiff_t sa = s[std::size_t(a)];
          for (int b = 0; b < 3; ++b) {
            const double* vb = v[std::size_t(b)];
            grad[a][b] = a == D ? (vb[c] - vb[l]) * inverse[std::size_t(a)]
                                : (vb[c + sa] - vb[c - sa] + vb[l + sa] - vb[l - sa]) *
                                      inverse[std::size_t(a)];
          }
        }
        const double divergence = grad[0][0] + grad[1][1] + grad[2][2];
        const double mu = viscosity * 0.5 * (rho[c] + rho[l]);
        double work = 0.0;
        for (int m = 0; m < 3; ++m) {
          double tau = mu * (grad[D][m] + grad[m][D]);
          if (m == D) tau -= mu * two_thirds * divergence;
          fm[std::size_t(m)][c] -= tau;
          work += tau * 0.5 * (v[std::size_t(m)][c] + v[std::size_t(m)][l]);
        }
        fe[c] -= work;
      }
    }
  }
}

}  // namespace

void add_viscous_flux(const solver::BlockGeometry& g, int d, double viscosity,
                      const std::vector<double>& density, const Fields& velocity,
                      Fields& momentum_flux, std::vector<double>& energy_flux) {
  switch (d) {
    case 0:
      viscous_flux_along<0>(g, viscosity, density, velocity, momentum_flux, energy_flux);
      break;
    case 1:
      viscous_flux_along<1>(g, viscosity, density, velocity, momentum_flux, energy_flux);
      break;
    default:
      viscous_flux_along<2>(g, viscosity, density, velocity, momentum_flux, energy_flux);
      break;
  }
}

}  // namespace brume::physics
