// Which datasets a brume snapshot holds, where each lives in a solver::State, its unit and its
// shape in the file. Shared by the writer, the reader, the XDMF sidecars and `brume inspect`, so
// that the four agree on one list.
#pragma once

#include <array>
#include <string>
#include <vector>

#include "io/field_units.hpp"
#include "solver/state.hpp"

namespace brume::io {

// The format attribute at the root of every snapshot file.
inline constexpr const char* snapshot_format = "brume snapshot 1";

enum class StoredQuantity { density, momentum, total_energy, face_field };

struct SnapshotField {
  std::string name;  // dataset name under /fields
  StoredQuantity quantity;
  int axis;  // component of momentum and face_field; 0 otherwise
  std::string unit;
  double FieldUnits::*to_cgs;

  // Normal of a face array, −1 for cell-centred data.
  [[nodiscard]] int staggered_axis() const {
    return quantity == StoredQuantity::face_field ? axis : -1;
  }
};

// The datasets of a state, in the order they are written.
[[nodiscard]] std::vector<SnapshotField> snapshot_fields(bool magnetic, bool isothermal);

// Every dataset a snapshot may hold (the union over gas kinds).
[[nodiscard]] const std::vector<SnapshotField>& all_snapshot_fields();

[[nodiscard]] const std::vector<double>& field_storage(const solver::State& state,
                                                       const SnapshotField& field);
[[nodiscard]] std::vector<double>& field_storage(solver::State& state, const SnapshotField& field);

// Shape in the file, slowest axis first ([z][y][x]): the cells of the box, plus one face along the
// normal of a face array when that axis has more than one cell.
[[nodiscard]] std::array<long, 3> stored_shape(const std::array<long, 3>& global_cells,
                                               int staggered_axis);

}  // namespace brume::io
