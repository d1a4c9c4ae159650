// Power-law slopes of annulus spectra and the BB/EE ratio over a range of annuli.
#pragma once

#include <vector>

namespace brume::physics {

struct SkyFitRange {
  double lowest = 2.0;  // annulus indices m, inclusive (units of 2π / L)
  double highest = 8.0;
};

struct SkyPowerLaw {
  double slope = 0.0;  // α in C ∝ κ^α; NaN with fewer than two usable annuli
  int annuli = 0;      // annuli used (in range, with C > 0)
};

// The annuli m = round(κ) of `wavenumber` that lie in the range.
[[nodiscard]] int sky_annuli_in_range(const std::vector<double>& wavenumber,
                                      const SkyFitRange& range);

// Least squares of ln C against ln κ over the annuli m = round(κ) in the range whose C > 0
// (common practice, no source).
[[nodiscard]] SkyPowerLaw sky_power_law(const std::vector<double>& wavenumber,
                                        const std::vector<double>& spectrum,
                                        const SkyFitRange& range);

// Σ_modes |B̂|² / Σ_modes |Ê|² over the annuli in the range; NaN when EE vanishes there.
[[nodiscard]] double sky_bb_over_ee(const std::vector<double>& wavenumber,
                                    const std::vector<double>& modes, const std::vector<double>& ee,
                                    const std::vector<double>& bb, const SkyFitRange& range);

}  // namespace brume::physics
