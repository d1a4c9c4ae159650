// Whether a snapshot's fields are sound: every value read, counted when not finite, and for a
// magnetized state the discrete divergence of the face field, as `brume inspect` reports them.
// The file is read in slabs of z-planes, so that memory stays bounded for any box.
#pragma once

#include <string>
#include <vector>

#include "io/snapshot_reader.hpp"

namespace brume::io {

struct FieldSummary {
  std::string name;
  long long values = 0;
  long long non_finite = 0;
  double min = 0.0;  // over the finite values; both 0 when there is none
  double max = 0.0;
};

struct SnapshotIntegrity {
  std::vector<FieldSummary> fields;  // in the order of SnapshotReader::fields()
  bool magnetic = false;
  // Largest |∇·B| Δx / |B| over the cells: the divergence of the face field (sum of face
  // differences over the cell widths) times the smallest cell width of the active axes, over
  // the largest |B| on the cell's faces; cells with no field count as 0. Magnetized only.
  double divergence = 0.0;
  double divergence_limit = 0.0;  // the largest value round-off explains (below)
  long long non_finite = 0;       // over all fields

  [[nodiscard]] bool sound() const { return non_finite == 0 && !(divergence > divergence_limit); }
};

// Largest divergence measure that round-off explains. Storing rounds each face value by up to ε/2
// and the measure combines six faces: ≤ 3ε (3.6e-7 in float32, 6.7e-16 in float64); the solver's
// own round-off in double adds ~1e-13 over a long run (~1e-16 per step, a random walk over 10^6
// steps). The limits, 1e-4 for float32 and 1e-10 for float64, stay ≥ 100 times above that, while
// a damaged or mismatched face array gives O(1). Common practice, no source.
[[nodiscard]] double divergence_limit(bool single_precision);

// Reads every field of the file through `reader` (opened on one rank: MPI_COMM_SELF).
// `slab_cells` bounds the cells read at once. Throws SnapshotFileError when a read fails.
[[nodiscard]] SnapshotIntegrity check_integrity(const SnapshotReader& reader,
                                                long slab_cells = 1L << 21);

}  // namespace brume::io
