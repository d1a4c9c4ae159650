#include "io/snapshot_integrity.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

#include "io/block_selection.hpp"

namespace brume::io {

namespace {

// The z-planes [first, first + count) of the box as a block without ghosts. Slabs hold at least
// two planes when the box has them, so that an active axis stays active in every slab.
solver::BlockGeometry slab(const SnapshotHeader& h, long first, long count) {
  solver::BlockGeometry g;
  g.ghost_layers = 0;
  for (int d = 0; d < 3; ++d) {
    g.cells[d] = static_cast<int>(d == 2 ? count : h.cells[d]);
    g.spacing[d] = h.size[d] / static_cast<double>(h.cells[d]);
    g.box_lower[d] = h.lower[d];
  }
  g.offset = {0, 0, first};
  g.lower = {h.lower[0], h.lower[1], h.lower[2] + static_cast<double>(first) * g.spacing[2]};
  return g;
}

long slab_count(const SnapshotHeader& h, long slab_cells) {
  const long plane = h.cells[0] * h.cells[1];
  const long wanted = (h.cells[2] * plane + slab_cells - 1) / std::max(slab_cells, 1L);
  return std::clamp(wanted, 1L, std::max(h.cells[2] / 2, 1L));
}

// Counts and extremes of the values this slab owns (FaceRange::owned: faces shared with the next
// slab are counted there).
void summarize(const std::vector<double>& values, const solver::BlockGeometry& g,
               const std::array<long, 3>& box, int staggered_axis, FieldSummary& summary) {
  const BlockSelection s = block_selection(g, box, staggered_axis, FaceRange::owned);
  const long ni = static_cast<long>(s.count[2]), nj = static_cast<long>(s.count[1]);
  const long nk = static_cast<long>(s.count[0]);
  for (long k = 0; k < nk; ++k) {
    for (long j = 0; j < nj; ++j) {
      const double* row = values.data() + g.index(0, static_cast<int>(j), static_cast<int>(k));
      for (long i = 0; i < ni; ++i) {
        const double v = row[i];
        const bool finite = std::isfinite(v);
        summary.non_finite += finite ? 0 : 1;
        summary.min = finite ? std::min(summary.min, v) : summary.min;
        summary.max = finite ? std::max(summary.max, v) : summary.max;
      }
    }
  }
  summary.values += ni * nj * nk;
}

// Largest |∇·B| Δx / |B| over the cells of the slab (see SnapshotIntegrity::divergence).
double divergence(const solver::State& s) {
  const solver::BlockGeometry& g = s.geometry;
  double width = std::numeric_limits<double>::infinity();
  for (int d = 0; d < 3; ++d) {
    if (g.active(d)) width = std::min(width, g.spacing[d]);
  }
  if (!std::isfinite(width)) return 0.0;  // a single cell has no divergence to measure
  std::array<double, 3> weight{};         // Δx / Δx_d on active axes, 0 elsewhere
  std::array<std::ptrdiff_t, 3> step{};
  for (int d = 0; d < 3; ++d) {
    weight[d] = g.active(d) ? width / g.spacing[d] : 0.0;
    step[d] = g.step(d);
  }
  const double* bx = s.face_field[0].data();
  const double* by = s.face_field[1].data();
  const double* bz = s.face_field[2].data();
  double largest = 0.0;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (std::ptrdiff_t c = row; c < row + g.cells[0]; ++c) {
        const double sum = weight[0] * (bx[c + step[0]] - bx[c]) +
                           weight[1] * (by[c + step[1]] - by[c]) +
                           weight[2] * (bz[c + step[2]] - bz[c]);
        const double scale =
            std::max({std::abs(bx[c]), std::abs(bx[c + step[0]]), std::abs(by[c]),
                      std::abs(by[c + step[1]]), std::abs(bz[c]), std::abs(bz[c + step[2]])});
        const double measure = scale > 0.0 ? std::abs(sum) / scale : 0.0;
        largest = std::isnan(measure) ? measure : std::max(largest, measure);
      }
    }
  }
  return largest;
}

}  // namespace

double divergence_limit(bool single_precision) {
  return single_precision ? 1e-4 : 1e-10;
}

SnapshotIntegrity check_integrity(const SnapshotReader& reader, long slab_cells) {
  const SnapshotHeader& h = reader.header();
  const std::vector<SnapshotField> fields = reader.fields();
  SnapshotIntegrity result;
  result.magnetic = reader.magnetic();
  bool single = false;
  for (const StoredDataset& d : reader.datasets())
    single = single || (d.known && d.type == "float32");
  result.divergence_limit = divergence_limit(single);
  for (const SnapshotField& f : fields) {
    FieldSummary summary;
    summary.name = f.name;
    summary.min = std::numeric_limits<double>::infinity();
    summary.max = -std::numeric_limits<double>::infinity();
    result.fields.push_back(summary);
  }
  const long slabs = slab_count(h, slab_cells);
  long first = 0;
  for (long n = 0; n < slabs; ++n) {
    // Balanced: planes / slabs rounded down or up, so every slab keeps at least two planes.
    const long count = (h.cells[2] * (n + 1)) / slabs - (h.cells[2] * n) / slabs;
    solver::State state =
        solver::make_state(slab(h, first, count), reader.magnetic(), reader.isothermal());
    reader.read_block(state);
    for (std::size_t f = 0; f < fields.size(); ++f) {
      summarize(field_storage(state, fields[f]), state.geometry, h.cells,
                fields[f].staggered_axis(), result.fields[f]);
    }
    if (result.magnetic) {
      const double measure = divergence(state);
      result.divergence = std::isnan(measure) || std::isnan(result.divergence)
                              ? std::numeric_limits<double>::quiet_NaN()
                              : std::max(result.divergence, measure);
    }
    first += count;
  }
  for (FieldSummary& summary : result.fields) {
    if (summary.non_finite == summary.values) summary.min = summary.max = 0.0;
    result.non_finite += summary.non_finite;
  }
  return result;
}

}  // namespace brume::io
