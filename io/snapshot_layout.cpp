#include "io/snapshot_layout.hpp"

namespace brume::io {

const std::vector<SnapshotField>& all_snapshot_fields() {
  using Q = StoredQuantity;
  static const std::vector<SnapshotField> fields = {
      {"density", Q::density, 0, "g cm^-3", &FieldUnits::density},
      {"momentum_x", Q::momentum, 0, "g cm^-2 s^-1", &FieldUnits::momentum},
      {"momentum_y", Q::momentum, 1, "g cm^-2 s^-1", &FieldUnits::momentum},
      {"momentum_z", Q::momentum, 2, "g cm^-2 s^-1", &FieldUnits::momentum},
      {"total_energy", Q::total_energy, 0, "erg cm^-3", &FieldUnits::energy_density},
      {"face_field_x", Q::face_field, 0, "G", &FieldUnits::magnetic_field},
      {"face_field_y", Q::face_field, 1, "G", &FieldUnits::magnetic_field},
      {"face_field_z", Q::face_field, 2, "G", &FieldUnits::magnetic_field},
  };
  return fields;
}

std::vector<SnapshotField> snapshot_fields(bool magnetic, bool isothermal) {
  std::vector<SnapshotField> fields;
  for (const SnapshotField& f : all_snapshot_fields()) {
    if (f.quantity == StoredQuantity::total_energy && isothermal) continue;
    if (f.quantity == StoredQuantity::face_field && !magnetic) continue;
    fields.push_back(f);
  }
  return fields;
}

const std::vector<double>& field_storage(const solver::State& state, const SnapshotField& field) {
  switch (field.quantity) {
    case StoredQuantity::density:
      return state.density;
    case StoredQuantity::momentum:
      return state.momentum[field.axis];
    case StoredQuantity::total_energy:
      return state.energy;
    case StoredQuantity::face_field:
      break;
  }
  return state.face_field[field.axis];
}

std::vector<double>& field_storage(solver::State& state, const SnapshotField& field) {
  const solver::State& read_only = state;
  return const_cast<std::vector<double>&>(field_storage(read_only, field));
}

std::array<long, 3> stored_shape(const std::array<long, 3>& global_cells, int staggered_axis) {
  std::array<long, 3> shape{};
  for (int d = 0; d < 3; ++d) {
    const bool face = d == staggered_axis && global_cells[d] > 1;
    shape[2 - d] = global_cells[d] + (face ? 1 : 0);
  }
  return shape;
}

}  // namespace brume::io
