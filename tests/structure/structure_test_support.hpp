// Running the structure-function diagnostic on one synthetic block and reading its arrays.
#pragma once

#include <gtest/gtest.h>
#include <mpi.h>

#include <stdexcept>
#include <string>

#include "physics/structure_functions.hpp"
#include "tests/support/structure_synthetic_cells.hpp"

namespace brume::testing {

inline physics::RunContext one_rank_context(const std::array<long, 3>& box) {
  physics::RunContext context;
  context.box_cells = box;
  context.comm = MPI_COMM_SELF;
  return context;
}

template <class CellFunction>
io::Measurement measure_one_block(const physics::StructureSettings& settings,
                                  const std::array<long, 3>& box, CellFunction cell,
                                  double spacing = 1.0) {
  const physics::CellQuantities q = synthetic_block(box, {1, 1, 1}, {0, 0, 0}, spacing, cell);
  return physics::StructureFunctions(settings).measure(q, one_rank_context(box));
}

inline const io::MeasuredArray& array_named(const io::Measurement& m, const std::string& name) {
  for (const io::MeasuredArray& a : m.arrays) {
    if (a.name == name) return a;
  }
  throw std::logic_error("no array " + name);
}

inline double number_named(const io::Measurement& m, const std::string& name) {
  for (const io::MeasuredNumber& n : m.numbers) {
    if (n.name == name) return n.value;
  }
  throw std::logic_error("no number " + name);
}

// Per-axis array value at (axis, lag index).
inline double on_axis(const io::MeasuredArray& a, std::size_t axis, std::size_t lag) {
  return a.values[axis * a.shape[1] + lag];
}

inline physics::StructureSettings every_lag_settings() {
  physics::StructureSettings s;
  s.lag_set = physics::StructureLagSet::every_cell;
  return s;
}

}  // namespace brume::testing
