// Scratch arrays of one integration stage, allocated once per run (make_stage_scratch).
#pragma once

#include <array>
#include <cstddef>
#include <cstdint>
#include <vector>

#include "solver/block_geometry.hpp"

namespace brume::solver {

// Cell-centred primitive variables of the stage's source state (density and B are read from the
// state itself: its density array and its faces).
struct PrimitiveArrays {
  std::array<std::vector<double>, 3> velocity;
  std::vector<double> pressure;  // empty when isothermal
};

// Constrained-transport scratch: face EMFs and mass-flux signs from the sweeps, edge EMFs.
struct CtScratch {
  // face_emf[d][0] = E_t1(d), face_emf[d][1] = E_t2(d) on the lower d-face of each cell.
  std::array<std::array<std::vector<double>, 2>, 3> face_emf;
  // Sign (−1, 0, 1) of the mass flux through the lower d-face of each cell.
  std::array<std::vector<std::int8_t>, 3> mass_sign;
  // Two rows of edge EMFs in the making: edge_emf writes E_e over the one face-EMF array that no
  // later row reads (see edge_emf_values), so that edge EMFs need no arrays of their own.
  std::size_t row_length = 0;
  std::vector<double> edge_rows;
};

// E_e on the edge along e at the lower corner (in t1(e), t2(e)) of each cell, after edge_emf(e):
// E_x and E_y replace the z-face EMFs (face_emf[z][0], face_emf[z][1]), E_z the y-face EMF E_z
// (face_emf[y][0]).
[[nodiscard]] inline double* edge_emf_values(CtScratch& ct, int e) {
  return e == 2 ? ct.face_emf[1][0].data() : ct.face_emf[2][std::size_t(e)].data();
}
[[nodiscard]] inline const double* edge_emf_values(const CtScratch& ct, int e) {
  return e == 2 ? ct.face_emf[1][0].data() : ct.face_emf[2][std::size_t(e)].data();
}

// Row buffers of the sweeps: the cell edges of two rows of cells (the row being reconstructed and
// the one below it along the sweep) and the fluxes of two rows of faces.
struct SweepRows {
  static constexpr int variables = 7;        // density, vn, vt1, vt2, pressure, bt1, bt2
  static constexpr int flux_components = 5;  // density, mn, mt1, mt2, energy
  std::size_t length = 0;                    // doubles per row (≥ the storage extent in x)
  std::vector<double> data;
  // Edge `side` (0: lower, 1: upper face of each cell) of variable v in row set `set` (0, 1).
  [[nodiscard]] double* edge(int set, int side, int v) {
    return data.data() + std::size_t((set * 2 + side) * variables + v) * length;
  }
  [[nodiscard]] double* flux(int set, int component) {
    return data.data() + std::size_t(4 * variables + set * flux_components + component) * length;
  }
};

struct StageScratch {
  PrimitiveArrays primitive;
  CtScratch ct;
  SweepRows rows;
};

[[nodiscard]] StageScratch make_stage_scratch(const BlockGeometry& g, bool magnetic,
                                              bool isothermal);

// Bytes of all arrays of the scratch (their capacity).
[[nodiscard]] std::size_t allocated_bytes(const StageScratch& s);

}  // namespace brume::solver
