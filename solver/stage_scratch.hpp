// Scratch arrays of one integration stage, allocated once per run (make_stage_scratch).
#pragma once

#include <array>
#include <cstdint>
#include <vector>

#include "solver/block_geometry.hpp"

namespace brume::solver {

// Cell-centred primitive variables of the stage's source state (B is read from its faces).
struct PrimitiveArrays {
  std::vector<double> density;
  std::array<std::vector<double>, 3> velocity;
  std::vector<double> pressure;  // empty when isothermal
};

// Constrained-transport scratch: face EMFs and mass-flux signs from the sweeps, edge EMFs.
struct CtScratch {
  // face_emf[d][0] = E_t1(d), face_emf[d][1] = E_t2(d) on the lower d-face of each cell.
  std::array<std::array<std::vector<double>, 2>, 3> face_emf;
  // Sign (−1, 0, 1) of the mass flux through the lower d-face of each cell.
  std::array<std::vector<std::int8_t>, 3> mass_sign;
  // edge_emf[e]: E_e on the edge along e at the lower corner (in t1(e), t2(e)) of each cell.
  std::array<std::vector<double>, 3> edge_emf;
};

// Face fluxes of one (or, for z sweeps, two alternating) planes of faces.
// Components: density, normal momentum, t1 momentum, t2 momentum, energy.
struct FluxPlanes {
  static constexpr int components = 5;
  std::array<std::array<std::vector<double>, components>, 2> plane;
};

struct StageScratch {
  PrimitiveArrays primitive;
  CtScratch ct;
  FluxPlanes planes;
};

[[nodiscard]] StageScratch make_stage_scratch(const BlockGeometry& g, bool magnetic,
                                              bool isothermal);

}  // namespace brume::solver
