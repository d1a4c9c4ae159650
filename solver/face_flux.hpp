// The flux through one face: reconstruct the primitive variables to both sides of the face and
// call the Riemann solver. Shared by the sweeps and by the first-order fallback so that both give
// the same number for the same face.
#pragma once

#include <cstddef>

#include "solver/block_geometry.hpp"
#include "solver/characteristic_plm.hpp"
#include "solver/reconstruction.hpp"
#include "solver/riemann/face_state.hpp"
#include "solver/stage_scratch.hpp"
#include "solver/state.hpp"

namespace brume::solver {

// What a sweep along direction d reads: primitives and face fields rotated into the face frame.
struct FaceReaders {
  ArrayReader density, vn, vt1, vt2, pressure;
  FaceAverageReader bt1, bt2;  // cell-centred tangential field (unused for hydrodynamics)
  const double* bn;            // the normal field on the faces (nullptr for hydrodynamics)
  std::ptrdiff_t step;         // linear step along d
};

[[nodiscard]] inline FaceReaders face_readers(const PrimitiveArrays& w, const State& source,
                                              int d) {
  const BlockGeometry& g = source.geometry;
  const int t1 = tangent1(d), t2 = tangent2(d);
  FaceReaders r{};
  r.density = {source.density.data()};  // ρ is both conserved and primitive
  r.vn = {w.velocity[d].data()};
  r.vt1 = {w.velocity[t1].data()};
  r.vt2 = {w.velocity[t2].data()};
  r.pressure = {w.pressure.empty() ? source.density.data() : w.pressure.data()};
  if (source.magnetic) {
    r.bt1 = {source.face_field[t1].data(), g.step(t1)};
    r.bt2 = {source.face_field[t2].data(), g.step(t2)};
    r.bn = source.face_field[d].data();
  } else {
    r.bt1 = {nullptr, 0};
    r.bt2 = {nullptr, 0};
    r.bn = nullptr;
  }
  r.step = g.step(d);
  return r;
}

// Flux through the lower d-face of cell c, each variable reconstructed on its own.
template <class Eos, bool Magnetic, class Recon, class Solver>
[[nodiscard]] inline FaceFlux face_flux_by_variable(const FaceReaders& r, std::ptrdiff_t c,
                                                    const Eos& eos) {
  const std::ptrdiff_t s = r.step;
  FaceState left{}, right{};
  face_states<Recon>(r.density, c, s, left.density, right.density);
  face_states<Recon>(r.vn, c, s, left.vn, right.vn);
  face_states<Recon>(r.vt1, c, s, left.vt1, right.vt1);
  face_states<Recon>(r.vt2, c, s, left.vt2, right.vt2);
  if constexpr (Eos::isothermal) {
    left.pressure = eos.sound_speed_sq(left.density, 0.0) * left.density;
    right.pressure = eos.sound_speed_sq(right.density, 0.0) * right.density;
  } else {
    face_states<Recon>(r.pressure, c, s, left.pressure, right.pressure);
  }
  double bn = 0.0;
  if constexpr (Magnetic) {
    face_states<Recon>(r.bt1, c, s, left.bt1, right.bt1);
    face_states<Recon>(r.bt2, c, s, left.bt2, right.bt2);
    bn = r.bn[c];
  }
  return Solver::template flux<Eos, Magnetic>(left, right, bn, eos);
}

// Flux through the lower d-face of cell c.
template <class Eos, bool Magnetic, class Recon, class Solver>
[[nodiscard]] inline FaceFlux face_flux(const FaceReaders& r, std::ptrdiff_t c, const Eos& eos) {
  if constexpr (limits_characteristics<Recon>) {
    const std::ptrdiff_t s = r.step;
    FaceState left{}, right{};
    // The same edges as the sweep's characteristic row (characteristic_plm.hpp).
    double lo[kWaveVariables], hi[kWaveVariables], unused[kWaveVariables];
    Recon::template cell_edges<Eos, Magnetic>(r, c - s, eos, unused, hi);
    Recon::template cell_edges<Eos, Magnetic>(r, c, eos, lo, unused);
    left = {hi[0], hi[1], hi[2], hi[3], hi[4], hi[5], hi[6]};
    right = {lo[0], lo[1], lo[2], lo[3], lo[4], lo[5], lo[6]};
    if constexpr (Eos::isothermal) {
      left.pressure = eos.sound_speed_sq(left.density, 0.0) * left.density;
      right.pressure = eos.sound_speed_sq(right.density, 0.0) * right.density;
    }
    return Solver::template flux<Eos, Magnetic>(left, right, Magnetic ? r.bn[c] : 0.0, eos);
  } else {
    return face_flux_by_variable<Eos, Magnetic, Recon, Solver>(r, c, eos);
  }
}

}  // namespace brume::solver
