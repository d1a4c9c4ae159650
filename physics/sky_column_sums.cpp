#include "physics/sky_column_sums.hpp"

#include <mpi.h>

#include <limits>
#include <stdexcept>
#include <string>

namespace brume::physics {

namespace {

struct PatchArrays {
  double* mass;
  double* alignment;
  double* q;
  double* u;
};

// The terms of one cell (sky_column_sums.hpp). A field-free cell is unpolarized and its
// alignment term vanishes (the mean of cos²γ over random orientations is 2/3).
struct CellTerms {
  double mass, alignment, q, u;
};

inline CellTerms cell_terms(double rho, double cut, double bu, double bv, double ba) {
  const double r = rho <= cut ? rho : 0.0;
  const double plane = bu * bu + bv * bv;
  const double total = plane + ba * ba;
  const double weight = total > 0.0 ? r / total : 0.0;
  return {r, weight * (plane - (2.0 / 3.0) * total), weight * (bu * bu - bv * bv),
          weight * (2.0 * bu * bv)};
}

// Cells in (k, j, i) order: for every line of sight the cells are added in increasing order along
// the axis, the innermost loop runs along x with unit stride.
template <int axis>
void add_cells(const CellQuantities& q, double cut, PatchArrays p) {
  constexpr int u = (axis + 1) % 3;
  constexpr int v = (axis + 2) % 3;
  const double* rho = q.density.data();
  const double* bu = q.field[u].data();
  const double* bv = q.field[v].data();
  const double* ba = q.field[axis].data();
  const std::size_t nx = std::size_t(q.cells[0]);
  const std::size_t ny = std::size_t(q.cells[1]);
  for (int k = 0; k < q.cells[2]; ++k) {
    for (int j = 0; j < q.cells[1]; ++j) {
      const std::size_t row = q.at(0, j, k);
      if constexpr (axis == 0) {
        const std::size_t at = std::size_t(k) * ny + std::size_t(j);
        CellTerms sum{p.mass[at], p.alignment[at], p.q[at], p.u[at]};
        for (std::size_t i = 0; i < nx; ++i) {
          const std::size_t c = row + i;
          const CellTerms t = cell_terms(rho[c], cut, bu[c], bv[c], ba[c]);
          sum.mass += t.mass;
          sum.alignment += t.alignment;
          sum.q += t.q;
          sum.u += t.u;
        }
        p.mass[at] = sum.mass;
        p.alignment[at] = sum.alignment;
        p.q[at] = sum.q;
        p.u[at] = sum.u;
      } else {
        const std::size_t base = (axis == 1 ? std::size_t(k) : std::size_t(j)) * nx;
        for (std::size_t i = 0; i < nx; ++i) {
          const std::size_t c = row + i;
          const CellTerms t = cell_terms(rho[c], cut, bu[c], bv[c], ba[c]);
          p.mass[base + i] += t.mass;
          p.alignment[base + i] += t.alignment;
          p.q[base + i] += t.q;
          p.u[base + i] += t.u;
        }
      }
    }
  }
}

std::size_t patch_size(const CellQuantities& q, int axis) {
  const auto t = sky_patch_axes(axis);
  return std::size_t(q.cells[std::size_t(t[0])]) * std::size_t(q.cells[std::size_t(t[1])]);
}

// The blocks of one pencil, ordered along the axis: they must tile the box along it and share
// their transverse extent, as brume's Cartesian decompositions do.
void check_pencil(const CellQuantities& q, int axis, MPI_Comm pencil) {
  const auto t = sky_patch_axes(axis);
  const std::array<long, 4> mine{q.offset[std::size_t(axis)], long(q.cells[std::size_t(axis)]),
                                 long(q.cells[std::size_t(t[0])]),
                                 long(q.cells[std::size_t(t[1])])};
  int size = 1;
  MPI_Comm_size(pencil, &size);
  std::vector<long> all(4 * std::size_t(size));
  MPI_Allgather(mine.data(), 4, MPI_LONG, all.data(), 4, MPI_LONG, pencil);
  long next = 0;
  for (int r = 0; r < size; ++r) {
    const long* b = all.data() + 4 * r;
    if (b[0] != next || b[2] != mine[2] || b[3] != mine[3]) {
      throw std::logic_error("sky_maps: the blocks along " + axis_letter(axis) +
                             " do not form a regular pencil (block " + std::to_string(r) +
                             " starts at " + std::to_string(b[0]) + ", expected " +
                             std::to_string(next) + ")");
    }
    next += b[1];
  }
  if (next != q.box_cells[std::size_t(axis)]) {
    throw std::logic_error("sky_maps: the blocks along " + axis_letter(axis) + " cover " +
                           std::to_string(next) + " of " +
                           std::to_string(q.box_cells[std::size_t(axis)]) + " cells");
  }
}

}  // namespace

std::array<int, 2> sky_patch_axes(int axis) {
  return {axis == 0 ? 1 : 0, axis == 2 ? 1 : 2};
}

void add_block_to_patch(const CellQuantities& q, int axis, double density_cut,
                        std::span<double> patch) {
  const std::size_t n = patch_size(q, axis);
  if (patch.size() != sky_sum_count * n) {
    throw std::logic_error("sky_maps: patch of " + std::to_string(patch.size()) +
                           " values, expected " + std::to_string(sky_sum_count * n));
  }
  const double cut = density_cut > 0.0 ? density_cut : std::numeric_limits<double>::infinity();
  const PatchArrays p{patch.data(), patch.data() + n, patch.data() + 2 * n, patch.data() + 3 * n};
  if (axis == 0) add_cells<0>(q, cut, p);
  if (axis == 1) add_cells<1>(q, cut, p);
  if (axis == 2) add_cells<2>(q, cut, p);
}

SkyColumnSums sky_column_sums(const CellQuantities& q, const RunContext& context, int axis,
                              double density_cut) {
  const auto t = sky_patch_axes(axis);
  const long cells_t0 = q.box_cells[std::size_t(t[0])];
  const long colour = q.offset[std::size_t(t[1])] * cells_t0 + q.offset[std::size_t(t[0])];
  if (colour > long(std::numeric_limits<int>::max())) {
    throw std::logic_error("sky_maps: the box is too wide for the pencil colours");
  }
  MPI_Comm pencil = MPI_COMM_NULL;
  MPI_Comm_split(context.comm, int(colour), int(q.offset[std::size_t(axis)]), &pencil);
  int rank = 0, size = 1;
  MPI_Comm_rank(pencil, &rank);
  MPI_Comm_size(pencil, &size);
  try {
    check_pencil(q, axis, pencil);
  } catch (...) {
    MPI_Comm_free(&pencil);
    throw;
  }

  // The running sums travel along the pencil: receive, continue, pass on.
  const std::size_t n = patch_size(q, axis);
  std::vector<double> patch(sky_sum_count * n, 0.0);
  const int count = int(patch.size());
  if (rank > 0) MPI_Recv(patch.data(), count, MPI_DOUBLE, rank - 1, 0, pencil, MPI_STATUS_IGNORE);
  add_block_to_patch(q, axis, density_cut, patch);
  if (rank + 1 < size) MPI_Send(patch.data(), count, MPI_DOUBLE, rank + 1, 0, pencil);
  MPI_Comm_free(&pencil);

  // The last block of each pencil places its finished sums; every other value is +0, and x + 0
  // is exact, so the sum over ranks only assembles the maps (−0 is turned into +0 first).
  SkyColumnSums result;
  result.geometry = sky_map_geometry(axis, q.box_cells, context.box_size);
  const SkyMapGeometry& g = result.geometry;
  const std::size_t pixels = g.pixels();
  std::vector<double> maps(sky_sum_count * pixels, 0.0);
  if (rank + 1 == size) {
    const int n0 = q.cells[std::size_t(t[0])];
    const int n1 = q.cells[std::size_t(t[1])];
    const bool u_is_t0 = g.u == t[0];
    for (int s = 0; s < sky_sum_count; ++s) {
      for (int a1 = 0; a1 < n1; ++a1) {
        for (int a0 = 0; a0 < n0; ++a0) {
          const long g0 = q.offset[std::size_t(t[0])] + a0;
          const long g1 = q.offset[std::size_t(t[1])] + a1;
          const long gu = u_is_t0 ? g0 : g1;
          const long gv = u_is_t0 ? g1 : g0;
          maps[std::size_t(s) * pixels + std::size_t(gv * g.cells_u + gu)] =
              patch[std::size_t(s) * n + std::size_t(a1) * std::size_t(n0) + std::size_t(a0)] + 0.0;
        }
      }
    }
  }
  MPI_Allreduce(MPI_IN_PLACE, maps.data(), int(maps.size()), MPI_DOUBLE, MPI_SUM, context.comm);
  for (int s = 0; s < sky_sum_count; ++s) {
    result.maps[std::size_t(s)].assign(maps.begin() + std::ptrdiff_t(std::size_t(s) * pixels),
                                       maps.begin() + std::ptrdiff_t(std::size_t(s + 1) * pixels));
  }
  return result;
}

}  // namespace brume::physics
