// The sums along every line of sight of one projection, taken cell by cell in increasing global
// order along the axis whatever the decomposition: each block continues the running sums of the
// block before it on its pencil, so the maps are bitwise the same on any number of ranks
// (DESIGN.md §4).
#pragma once

#include <array>
#include <span>
#include <vector>

#include "physics/cell_quantities.hpp"
#include "physics/run_context.hpp"
#include "physics/sky_map_geometry.hpp"

namespace brume::physics {

// What each cell adds, with b the cell-centred field, (b_u, b_v) its part in the plane of the sky,
// cos²γ = (b_u² + b_v²) / b² and ρ its code density (0 when denser than the cut):
enum SkySum : int {
  sky_mass,       // ρ
  sky_alignment,  // ρ (cos²γ − 2/3), 0 where b = 0
  sky_q,          // ρ cos²γ cos 2ψ = ρ (b_u² − b_v²) / b², 0 where b = 0
  sky_u,          // ρ cos²γ sin 2ψ = 2 ρ b_u b_v / b², 0 where b = 0
  sky_sum_count
};

struct SkyColumnSums {
  SkyMapGeometry geometry;
  std::array<std::vector<double>, sky_sum_count> maps;  // Σ over cells, [v][u]
};

// The block's transverse patch along `axis`: its two other axes t0 < t1, stored [t1][t0].
[[nodiscard]] std::array<int, 2> sky_patch_axes(int axis);

// Adds the block's cells, in increasing order along `axis`, to the running sums of its patch:
// `patch` holds sky_sum_count arrays of cells[t0] × cells[t1] values, one after the other.
void add_block_to_patch(const CellQuantities& cells, int axis, double density_cut,
                        std::span<double> patch);

// Collective over context.comm; every rank gets the whole maps. density_cut in code density,
// 0 for none.
[[nodiscard]] SkyColumnSums sky_column_sums(const CellQuantities& cells, const RunContext& context,
                                            int axis, double density_cut);

}  // namespace brume::physics
