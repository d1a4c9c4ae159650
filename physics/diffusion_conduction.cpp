#include "physics/diffusion_kernels.hpp"

namespace brume::physics {

// Fourier's law q = −κ ∇T through a face by the two-point central difference (common practice,
// no source).
void add_conduction_flux(const solver::BlockGeometry& g, int d, const std::vector<double>& theta,
                         const std::vector<double>& kappa, std::vector<double>& energy_flux) {
  const IndexBox box = faces_of_interior(g, d);
  const std::ptrdiff_t s = g.step(d);
  const double inverse = 1.0 / g.spacing[d];
  const double* t = theta.data();
  const double* k_cell = kappa.data();
  double* f = energy_flux.data();
  for (int k = box.lower[2]; k < box.upper[2]; ++k) {
    for (int j = box.lower[1]; j < box.upper[1]; ++j) {
      const std::ptrdiff_t row = g.index(box.lower[0], j, k);
      const int n = box.upper[0] - box.lower[0];
      for (int i = 0; i < n; ++i) {
        const std::ptrdiff_t c = row + i;
        f[c] -= 0.5 * (k_cell[c] + k_cell[c - s]) * (t[c] - t[c - s]) * inverse;
      }
    }
  }
}

}  // namespace brume::physics
