#include "tests/io/known_fields.hpp"

#include <cstdlib>
#include <stdexcept>

#include "io/snapshot_layout.hpp"

namespace brume::testing {

double known_value(std::size_t q, long i, long j, long k) {
  return 1000.0 * double(q) + double(i) + 10.0 * double(j) + 100.0 * double(k) + 0.25;
}

solver::State known_state(const solver::BlockGeometry& g, bool magnetic, bool isothermal) {
  solver::State s = solver::make_state(g, magnetic, isothermal);
  const auto& all = io::all_snapshot_fields();
  for (std::size_t q = 0; q < all.size(); ++q) {
    const io::SnapshotField& f = all[q];
    if ((f.quantity == io::StoredQuantity::total_energy && isothermal) ||
        (f.quantity == io::StoredQuantity::face_field && !magnetic))
      continue;
    std::vector<double>& values = io::field_storage(s, f);
    values.assign(values.size(), -7.0);
    const int normal = f.staggered_axis();
    std::array<int, 3> n = g.cells;
    if (normal >= 0 && g.active(normal)) n[normal] += 1;  // the upper faces too
    for (int k = 0; k < n[2]; ++k)
      for (int j = 0; j < n[1]; ++j)
        for (int i = 0; i < n[0]; ++i)
          values[g.index(i, j, k)] =
              known_value(q, g.offset[0] + i, g.offset[1] + j, g.offset[2] + k);
  }
  s.time = 0.375;
  s.step = 12;
  return s;
}

solver::BlockGeometry whole_box(const std::array<int, 3>& cells, const std::array<double, 3>& lower,
                                const std::array<double, 3>& size) {
  return solver::whole_box_geometry(
      cells, lower, {lower[0] + size[0], lower[1] + size[1], lower[2] + size[2]}, 2);
}

io::SnapshotInfo known_info(const solver::BlockGeometry& box) {
  io::SnapshotInfo info;
  for (int d = 0; d < 3; ++d) {
    info.global_cells[d] = box.cells[d];
    info.lower[d] = box.box_lower[d];
    info.size[d] = box.spacing[d] * box.cells[d];
  }
  info.units = {3.0e18, 3.0e13, 2.0e-24, 2.0e-19, 2.0e-14, 5.0e-7};
  info.configuration = "box:\n  cells: [" + std::to_string(box.cells[0]) + ", " +
                       std::to_string(box.cells[1]) + ", " + std::to_string(box.cells[2]) + "]\n";
  info.reason = "test";
  return info;
}

std::filesystem::path scratch_folder(const std::string& stem) {
  std::string pattern = (std::filesystem::temp_directory_path() / (stem + "-XXXXXX")).string();
  if (mkdtemp(pattern.data()) == nullptr) throw std::runtime_error("mkdtemp failed: " + pattern);
  return pattern;
}

}  // namespace brume::testing
