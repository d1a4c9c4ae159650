// Sums of Fourier power over shells (E(k) = Σ_shell weight |F|², spectra_shells.hpp) for one
// rank's slab: of a scalar, and of the solenoidal and compressive parts of a vector field.
#pragma once

#include <array>
#include <complex>
#include <span>

#include "physics/spectra_shells.hpp"

namespace brume::physics {

using Coefficients = std::span<const std::complex<double>>;

// shells[s] += Σ_{shell(c) = s} weight(c) |a(c)|².
void add_shell_power(const SpectralShells& geometry, Coefficients a, std::span<double> shells);

// The Helmholtz projection of a vector field's coefficients a(k) (common practice, no source;
// the projection tensor of Federrath et al. 2010, A&A 512, A81, eq. 9 — from memory): compressive
// part k (k·a)/|k|², solenoidal part a − k (k·a)/|k|², whose powers are |k·a|²/|k|² and |k ×
// a|²/|k|². k = 0 (the mean) belongs to neither. On the Nyquist index of an even axis the
// coefficient stands for +N/2 and −N/2 alike: both parts are averaged over the two signs of that
// component (over all sign combinations when several components are Nyquist), which keeps
// conjugate partners consistent and the sum of the parts equal to |a|².
void add_helmholtz_power(const SpectralShells& geometry, const std::array<Coefficients, 3>& a,
                         std::span<double> solenoidal, std::span<double> compressive);

}  // namespace brume::physics
