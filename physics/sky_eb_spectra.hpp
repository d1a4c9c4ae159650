// Flat-sky E/B decomposition of a pair of Stokes maps and the annulus-averaged power spectra TT,
// EE, BB and TE (T = I), on one rank (docs/sky-maps.md).
#pragma once

#include <vector>

#include "physics/sky_map_geometry.hpp"

namespace brume::physics {

// Annuli m = 1 … M (sky_wavenumber_bins.hpp). For X, Y among T, E, B:
// C_XY(m) = ⟨Re X̂ Ŷ*⟩_m · A / (N_u N_v)², X̂ the unnormalized DFT and A = L_u L_v the map area,
// so that Σ over all modes of C_XX / A is the mean of X² over the map (Parseval).
struct SkySpectra {
  std::vector<double> wavenumber;  // mean κ of the modes of each annulus, units of 2π / L
  std::vector<double> modes;       // number of Fourier modes in each annulus
  std::vector<double> tt, ee, bb, te;
};

// `area` is A in the unit wanted for the spectra (maps in cm^-2 and A in cm² give cm^-2).
// Maps are [v][u] with the geometry's sizes. Empty spectra when the map has no full annulus.
[[nodiscard]] SkySpectra sky_spectra(const SkyMapGeometry& geometry, const std::vector<double>& i,
                                     const std::vector<double>& q, const std::vector<double>& u,
                                     double area);

}  // namespace brume::physics
