// Writes the fields of a synthetic box and brume's spectra of it to one statistics file, for
// tests/physics/spectra_reference.py to recompute the spectra with numpy and compare.
#pragma once

#include <filesystem>
#include <string>

#include "io/statistics_file.hpp"
#include "physics/cell_quantities.hpp"

namespace brume::testing {

// `whole` is the whole box as one block (the fields, [z][y][x]); `spectra` brume's measurement.
inline void write_spectra_reference_file(const std::filesystem::path& file,
                                         const physics::CellQuantities& whole,
                                         const std::array<double, 3>& box_size,
                                         const io::Measurement& spectra) {
  io::Measurement fields;
  fields.name = "fields";
  fields.description = "the synthetic fields the spectra were measured on";
  const std::vector<std::size_t> shape = {std::size_t(whole.cells[2]), std::size_t(whole.cells[1]),
                                          std::size_t(whole.cells[0])};
  io::add_array(fields, "density", "1", 1.0, "rho", shape).values = whole.density;
  const char* axes[3] = {"x", "y", "z"};
  for (std::size_t d = 0; d < 3; ++d) {
    io::add_array(fields, std::string("velocity_") + axes[d], "1", 1.0, "v", shape).values =
        whole.velocity[d];
    io::add_array(fields, std::string("field_") + axes[d], "1", 1.0, "B", shape).values =
        whole.field[d];
    fields.numbers.push_back({std::string("box_size_") + axes[d], box_size[d], "1", 1.0, "L"});
  }
  std::filesystem::remove(file);
  io::write_statistics(file, io::StatisticsHeader{}, {fields, spectra});
}

}  // namespace brume::testing
