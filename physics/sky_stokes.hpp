// Column density and optically thin dust-polarization Stokes maps from the line-of-sight sums,
// and the polarization fraction and angles derived from them (docs/sky-maps.md).
#pragma once

#include <vector>

#include "physics/sky_column_sums.hpp"
#include "physics/sky_settings.hpp"

namespace brume::physics {

struct SkyStokesMaps {
  SkyMapGeometry geometry;
  // cm^-2; I, Q, U in units of the column density (emission per particle of mass μ m_H = 1).
  std::vector<double> column_density, i, q, u;
  std::vector<double> fraction;     // p = √(Q² + U²) / I; 0 where I ≤ 0
  std::vector<double> angle;        // ψ = ½ atan2(U, Q), degrees in (−90, 90]; 0 where I ≤ 0
  std::vector<double> field_angle;  // ψ + 90° wrapped into (−90, 90]
};

// `to_number_column`: the factor from Σ ρ_code (per cell along the axis) to cm^-2, i.e. the cell
// length in cm times ρ_u / (μ m_H).
[[nodiscard]] SkyStokesMaps sky_stokes_maps(const SkyColumnSums& sums, const SkySettings& settings,
                                            double to_number_column);

}  // namespace brume::physics
