// Conserved variables in the face frame and the few vector operations the HLL-family solvers need.
// FaceConserved mirrors FaceFlux member for member, so a flux and a state jump combine directly.
#pragma once

#include "solver/riemann/face_state.hpp"

namespace brume::solver {

struct FaceConserved {
  double density;
  double mn, mt1, mt2;  // momentum
  double energy;        // total energy (zero for isothermal gas)
  double bt1, bt2;      // tangential field (zero for hydrodynamics)
};

// f + s (a − b): the flux behind a wave of speed s that separates state b (upwind) from a.
[[nodiscard]] inline FaceFlux flux_across(const FaceFlux& f, double s, const FaceConserved& a,
                                          const FaceConserved& b) {
  return {f.density + s * (a.density - b.density),
          f.mn + s * (a.mn - b.mn),
          f.mt1 + s * (a.mt1 - b.mt1),
          f.mt2 + s * (a.mt2 - b.mt2),
          f.energy + s * (a.energy - b.energy),
          f.bt1 + s * (a.bt1 - b.bt1),
          f.bt2 + s * (a.bt2 - b.bt2)};
}

// Component-wise choice; written as selects so that the compiler may blend instead of branching.
[[nodiscard]] inline FaceFlux choose(bool first, const FaceFlux& a, const FaceFlux& b) {
  return {first ? a.density : b.density, first ? a.mn : b.mn,         first ? a.mt1 : b.mt1,
          first ? a.mt2 : b.mt2,         first ? a.energy : b.energy, first ? a.bt1 : b.bt1,
          first ? a.bt2 : b.bt2};
}

// The HLL average of the Riemann fan between the speeds sl < sr:
// (sr U_R − sl U_L − (F_R − F_L)) / (sr − sl).
// Harten, Lax & van Leer 1983, SIAM Rev. 25, 35, §3 (Toro 2009 §10.3; from memory).
[[nodiscard]] inline FaceConserved hll_state(const FaceConserved& ul, const FaceConserved& ur,
                                             const FaceFlux& fl, const FaceFlux& fr, double sl,
                                             double sr) {
  const double w = 1.0 / (sr - sl);
  return {w * (sr * ur.density - sl * ul.density - (fr.density - fl.density)),
          w * (sr * ur.mn - sl * ul.mn - (fr.mn - fl.mn)),
          w * (sr * ur.mt1 - sl * ul.mt1 - (fr.mt1 - fl.mt1)),
          w * (sr * ur.mt2 - sl * ul.mt2 - (fr.mt2 - fl.mt2)),
          w * (sr * ur.energy - sl * ul.energy - (fr.energy - fl.energy)),
          w * (sr * ur.bt1 - sl * ul.bt1 - (fr.bt1 - fl.bt1)),
          w * (sr * ur.bt2 - sl * ul.bt2 - (fr.bt2 - fl.bt2))};
}

// The HLL flux (sr F_L − sl F_R + sl sr (U_R − U_L)) / (sr − sl) for sl ≤ 0 ≤ sr. Callers clip
// sl to ≤ 0 and sr to ≥ 0, which turns the supersonic cases (F_L or F_R) into the same formula.
// Harten, Lax & van Leer 1983, SIAM Rev. 25, 35, §3 (Toro 2009 §10.3, eq. 10.21; from memory).
[[nodiscard]] inline FaceFlux hll_flux(const FaceConserved& ul, const FaceConserved& ur,
                                       const FaceFlux& fl, const FaceFlux& fr, double sl,
                                       double sr) {
  const double w = 1.0 / (sr - sl);
  const double slsr = sl * sr;
  return {w * (sr * fl.density - sl * fr.density + slsr * (ur.density - ul.density)),
          w * (sr * fl.mn - sl * fr.mn + slsr * (ur.mn - ul.mn)),
          w * (sr * fl.mt1 - sl * fr.mt1 + slsr * (ur.mt1 - ul.mt1)),
          w * (sr * fl.mt2 - sl * fr.mt2 + slsr * (ur.mt2 - ul.mt2)),
          w * (sr * fl.energy - sl * fr.energy + slsr * (ur.energy - ul.energy)),
          w * (sr * fl.bt1 - sl * fr.bt1 + slsr * (ur.bt1 - ul.bt1)),
          w * (sr * fl.bt2 - sl * fr.bt2 + slsr * (ur.bt2 - ul.bt2))};
}

}  // namespace brume::solver
