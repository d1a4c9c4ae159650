#include "physics/diffusion_kernels.hpp"

namespace brume::physics {

namespace {

// Loops the cells of `box` row by row: f(c) for each linear index, i innermost.
template <class F>
void for_each_index(const solver::BlockGeometry& g, const IndexBox& box, F&& f) {
  for (int k = box.lower[2]; k < box.upper[2]; ++k) {
    for (int j = box.lower[1]; j < box.upper[1]; ++j) {
      const std::ptrdiff_t row = g.index(box.lower[0], j, k);
      const int n = box.upper[0] - box.lower[0];
      for (int i = 0; i < n; ++i)
        f(row + i);
    }
  }
}

}  // namespace

// J_e = ∂_t1 B_t2 − ∂_t2 B_t1 on the edge along e at the lower corner of the cell in t1 and t2,
// from the face fields on either side: the edge-centred current of the staggered (Yee 1966, IEEE
// Trans. Antennas Propag. 14, 302) mesh that constrained transport uses.
void ohmic_emf(const solver::BlockGeometry& g, double resistivity, const Fields& face_field,
               Fields& emf) {
  for (int e = 0; e < 3; ++e) {
    const int t1 = solver::tangent1(e), t2 = solver::tangent2(e);
    const std::ptrdiff_t s1 = g.step(t1), s2 = g.step(t2);
    const double c1 = resistivity / g.spacing[t1], c2 = resistivity / g.spacing[t2];
    const double* b1 = face_field[std::size_t(t1)].data();
    const double* b2 = face_field[std::size_t(t2)].data();
    double* out = emf[std::size_t(e)].data();
    for_each_index(g, edges_of_interior(g, e), [&](std::ptrdiff_t c) {
      out[c] = c1 * (b2[c] - b2[c - s1]) - c2 * (b1[c] - b1[c - s2]);
    });
  }
}

// (E × B)_d = E_t1 B_t2 − E_t2 B_t1 at the face centre: E_t1 and E_t2 averaged over the two edges
// of the face along each, B_t1 and B_t2 over the four faces of the two cells beside it (common
// practice, no source).
void add_poynting_flux(const solver::BlockGeometry& g, int d, const Fields& emf,
                       const Fields& face_field, std::vector<double>& energy_flux) {
  const int t1 = solver::tangent1(d), t2 = solver::tangent2(d);
  const std::ptrdiff_t sd = g.step(d), s1 = g.step(t1), s2 = g.step(t2);
  const double* e1 = emf[std::size_t(t1)].data();
  const double* e2 = emf[std::size_t(t2)].data();
  const double* b1 = face_field[std::size_t(t1)].data();
  const double* b2 = face_field[std::size_t(t2)].data();
  double* f = energy_flux.data();
  for_each_index(g, faces_of_interior(g, d), [&](std::ptrdiff_t c) {
    const std::ptrdiff_t l = c - sd;
    const double edge1 = 0.5 * (e1[c] + e1[c + s2]);
    const double edge2 = 0.5 * (e2[c] + e2[c + s1]);
    const double field1 = 0.25 * (b1[c] + b1[c + s1] + b1[l] + b1[l + s1]);
    const double field2 = 0.25 * (b2[c] + b2[c + s2] + b2[l] + b2[l + s2]);
    f[c] += edge1 * field2 - edge2 * field1;
  });
}

// ∂B_d/∂t = −(∂_t1 E_t2 − ∂_t2 E_t1) on the d-face: the discrete Stokes theorem around the face,
// whose divergence vanishes identically (Evans & Hawley 1988, ApJ 332, 659; equation number from
// memory: eq. 2.2).
void set_face_rates(const solver::BlockGeometry& g, const Fields& emf, Fields& face_rate) {
  for (int d = 0; d < 3; ++d) {
    const int t1 = solver::tangent1(d), t2 = solver::tangent2(d);
    const std::ptrdiff_t s1 = g.step(t1), s2 = g.step(t2);
    const double c1 = 1.0 / g.spacing[t1], c2 = 1.0 / g.spacing[t2];
    const double* e1 = emf[std::size_t(t1)].data();
    const double* e2 = emf[std::size_t(t2)].data();
    double* out = face_rate[std::size_t(d)].data();
    for_each_index(g, faces_of_interior(g, d), [&](std::ptrdiff_t c) {
      out[c] = -(c1 * (e2[c + s1] - e2[c]) - c2 * (e1[c + s2] - e1[c]));
    });
  }
}

}  // namespace brume::physics
