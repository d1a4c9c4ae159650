// The star-formation rate per free-fall time of the multi-free-fall models, evaluated on a
// measured, binned, volume-weighted PDF of s = ln(ρ/ρ̄), with the critical density of Krumholz &
// McKee 2005 in the form of Federrath & Klessen 2012 (docs/jeans.md).
#pragma once

#include <vector>

namespace brume::physics {

// Virial parameter of a box of side L, α_vir = 2 E_kin / |E_grav| = 5 σ_v² / (π G ρ̄ L²), σ_v the
// 3D velocity dispersion (Federrath & Klessen 2012, ApJ 761, 156, §2; from memory, equation
// number not looked up). Any consistent units.
[[nodiscard]] double box_virial_parameter(double velocity_dispersion_squared,
                                          double gravitational_constant, double mean_density,
                                          double box_length);

// s_crit = ln[(π²/5) φ_x² α_vir M² / (1 + 1/β)]: the Krumholz & McKee 2005 (ApJ 630, 250)
// critical density with the magnetic factor, as in Federrath & Klessen 2012 (ApJ 761, 156),
// Table 1, row KM (from memory, equation numbers not looked up). β = ∞ without a field. NaN when
// the argument of the logarithm is not positive and finite.
[[nodiscard]] double km_critical_log_density(double phi_x, double virial_parameter, double mach,
                                             double beta);

// ∫_{s_crit}^∞ (t_ff(ρ̄)/t_ff(ρ)) (ρ/ρ̄) p(s) ds = ∫_{s_crit}^∞ e^{3s/2} p(s) ds, the integral of the
// multi-free-fall rate SFR_ff = (ε/φ_t) × it (Hennebelle & Chabrier 2011, ApJ 743, L29;
// Federrath & Klessen 2012, ApJ 761, 156, their general multi-ff expression; from memory,
// equation numbers not looked up), t_ff ∝ ρ^{-1/2}. p(s) is the histogram: `fractions[k]` of the
// volume in bin k of equal width in s over [s_lowest, s_highest], constant within a bin, so each
// bin contributes fractions[k]/Δs × (2/3)(e^{3b/2} − e^{3a/2}) over its part [a, b] above s_crit.
// Gas outside the bins is not counted (the caller warns).
[[nodiscard]] double multi_free_fall_integral(const std::vector<double>& fractions, double s_lowest,
                                              double s_highest, double s_crit);

}  // namespace brume::physics
