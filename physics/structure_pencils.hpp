// Whole lines of the box along one axis, for exact periodic shifts by any lag: the blocks of the
// ranks that share a line are redistributed (MPI_Alltoallv among them) so that each rank holds
// complete lines for a share of the transverse cells. Every line holds the same values in the
// same order whatever the number of ranks, which makes sums along a line rank-count independent.
#pragma once

#include <mpi.h>

#include <array>
#include <vector>

#include "physics/cell_quantities.hpp"

namespace brume::physics {

enum PencilField : int { longitudinal, transverse_1, transverse_2, momentum, cold, field_count };

struct StructurePencils {
  int axis = 0;
  long length = 0;  // cells along the axis: the whole box
  long lines = 0;   // complete lines held by this rank
  // Per field, [position along the axis][line], the line index fastest: v_axis, the two other
  // velocity components (axes in increasing order), ρ v_axis, and 1 for T < cold_temperature
  // else 0.
  std::array<std::vector<double>, field_count> fields;
};

// 1 for a cell colder than `cold_temperature`, else 0 (NaN is not cold), per cell of the block.
[[nodiscard]] std::vector<double> cold_cells(const CellQuantities& cells, double cold_temperature);

// Buffers kept from one axis to the next (one allocation per measurement, not per axis).
struct PencilBuffers {
  std::vector<double> momentum, send, received;
};

// Fills `pencils` for `axis`. Collective over `comm`, which must hold every block of the box,
// all of the same cell counts (std::invalid_argument otherwise). `cold` from cold_cells().
void gather_pencils(const CellQuantities& cells, int axis, const std::vector<double>& cold,
                    MPI_Comm comm, PencilBuffers& buffers, StructurePencils& pencils);

}  // namespace brume::physics
