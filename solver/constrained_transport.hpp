// Constrained transport: edge EMFs from the face EMFs of the sweeps with the upwind
// ("contact-mode") reconstruction of Gardiner & Stone 2005, and the update of the face field by
// the discrete curl of the edge EMFs, which keeps the discrete div B of every cell unchanged.
//
// Edge component e lies along e; a = t1(e), b = t2(e) are the other two directions (for E_z:
// a = x, b = y). The edge stored at cell c sits at the lower corner of c in a and b. Inactive
// directions have step 0, and their "face EMF" is the cell-centred EMF (no variation along them).
#pragma once

#include <cstddef>
#include <cstdint>

#include "solver/reconstruction.hpp"
#include "solver/stage_scratch.hpp"
#include "solver/state.hpp"

namespace brume::solver {

// Cell-centred E_e = −(v × B)_e = v_b B_a − v_a B_b with a = t1(e), b = t2(e).
struct CellEmfReader {
  const double* va;
  const double* vb;
  FaceAverageReader ba, bb;
  double operator()(std::ptrdiff_t n) const { return vb[n] * ba(n) - va[n] * bb(n); }
};

[[nodiscard]] inline CellEmfReader cell_emf_reader(const PrimitiveArrays& w, const State& s,
                                                   int e) {
  const BlockGeometry& g = s.geometry;
  const int a = tangent1(e), b = tangent2(e);
  return {w.velocity[a].data(), w.velocity[b].data(),
          FaceAverageReader{s.face_field[a].data(), g.step(a)},
          FaceAverageReader{s.face_field[b].data(), g.step(b)}};
}

// Face EMFs and mass-flux signs of an inactive direction d: the cell-centred values.
void fill_inactive_face_emf(int d, const PrimitiveArrays& w, const State& source, CtScratch& ct);

// Upwind weight of the lower of two candidates: 1 for a positive mass flux, 0 for a negative one,
// ½ for none.
[[nodiscard]] inline double upwind_weight(std::int8_t sign) {
  return 0.5 * (1.0 + double(sign));
}

// upper + w (lower − upper): exact when both candidates agree.
[[nodiscard]] inline double upwind_pick(double w, double lower, double upper) {
  return upper + w * (lower - upper);
}

// Edge EMFs E_e for the edges of all interior faces.
// E = ¼ (E_a(j) + E_a(j−1) + E_b(i) + E_b(i−1)) + ¼ [(∂_b E)(j−¾) − (∂_b E)(j−¼)
//     + (∂_a E)(i−¾) − (∂_a E)(i−¼)] in half-cell differences, each derivative taken from the
// cell-minus-face differences of the row upwind of the mass flux through the face it lies on.
// Gardiner & Stone 2005, J. Comput. Phys. 205, 509, §3.2, eqs. 41–45 (numbers from memory: the
// upwind "E_z^c" form; also Stone & Gardiner 2009, New Astron. 14, 139). Sign of the terms fixed
// so that the edge EMF of a plane-parallel problem equals its 1D face EMF (checked in tests).
void edge_emf(int e, const PrimitiveArrays& w, const State& source, CtScratch& ct);

// target.B_d = base.B_d − dt (∇ × E)_d on all interior faces (both boundary faces included).
// Evans & Hawley 1988, ApJ 332, 659 (constrained transport).
void ct_update(const CtScratch& ct, double dt, const State& base, State& target);

// max over interior cells of |div B| Δx / max|B|, with the face differences of the field
// (zero for hydrodynamics); a measure of how well the discrete constraint holds.
[[nodiscard]] double relative_divergence(const State& s);

}  // namespace brume::solver
