#include "physics/sky_eb_spectra.hpp"

#include <cmath>
#include <complex>

#include "physics/sky_fft.hpp"
#include "physics/sky_wavenumber_bins.hpp"

namespace brume::physics {

// E(l) = Q̂ cos 2φ_l + Û sin 2φ_l, B(l) = −Q̂ sin 2φ_l + Û cos 2φ_l: Seljak 1997 (ApJ 482, 6),
// eq. 6, and Zaldarriaga & Seljak 1997 (PRD 55, 1830), flat-sky limit of §III (both from memory).
// φ_l is measured like the polarization angle ψ, from north (+v) through east (−u), so the
// wavevector's north and east components are (n_v / L_v, −n_u / L_u).
SkySpectra sky_spectra(const SkyMapGeometry& g, const std::vector<double>& i,
                       const std::vector<double>& q, const std::vector<double>& u, double area) {
  SkySpectra s;
  const long annuli = sky_largest_annulus(g);
  if (g.cells_u < 2 || g.cells_v < 2 || annuli < 1) return s;
  const auto m = std::size_t(annuli);
  std::vector<double> kappa(m, 0.0), count(m, 0.0), tt(m, 0.0), ee(m, 0.0), bb(m, 0.0), te(m, 0.0);

  SkyFourierTransform fft(g.cells_u, g.cells_v);
  const std::vector<std::complex<double>> t_hat = fft.forward(i);
  const std::vector<std::complex<double>> q_hat = fft.forward(q);
  const std::vector<std::complex<double>> u_hat = fft.forward(u);
  const double longer = sky_longer_edge(g);
  for (long row = 0; row < g.cells_v; ++row) {
    const double north = double(signed_frequency(row, g.cells_v)) / g.size_v;
    for (long col = 0; col < g.cells_u; ++col) {
      const double east = -double(signed_frequency(col, g.cells_u)) / g.size_u;
      const double k2 = north * north + east * east;
      const double k = longer * std::sqrt(k2);
      const long bin = long(std::floor(k + 0.5));
      if (bin < 1 || bin > annuli) continue;
      const double cos2 = (north * north - east * east) / k2;
      const double sin2 = 2.0 * north * east / k2;
      const std::size_t c = std::size_t(row * g.cells_u + col);
      const std::complex<double> e = q_hat[c] * cos2 + u_hat[c] * sin2;
      const std::complex<double> b = -q_hat[c] * sin2 + u_hat[c] * cos2;
      const auto at = std::size_t(bin - 1);
      kappa[at] += k;
      count[at] += 1.0;
      tt[at] += std::norm(t_hat[c]);
      ee[at] += std::norm(e);
      bb[at] += std::norm(b);
      te[at] += (t_hat[c] * std::conj(e)).real();
    }
  }
  const double cells = double(g.cells_u) * double(g.cells_v);
  const double scale = area / (cells * cells);
  for (std::size_t a = 0; a < m; ++a) {
    if (count[a] == 0.0) continue;  // an annulus without modes (very elongated maps) is left out
    s.wavenumber.push_back(kappa[a] / count[a]);
    s.modes.push_back(count[a]);
    s.tt.push_back(tt[a] / count[a] * scale);
    s.ee.push_back(ee[a] / count[a] * scale);
    s.bb.push_back(bb[a] / count[a] * scale);
    s.te.push_back(te[a] / count[a] * scale);
  }
  return s;
}

}  // namespace brume::physics
