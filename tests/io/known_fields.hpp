// Snapshot contents that tests can recognize anywhere: every field holds a value made from its
// number and the global position of the cell or face, exact in float32 too.
#pragma once

#include <array>
#include <filesystem>
#include <string>

#include "io/snapshot.hpp"
#include "solver/state.hpp"

namespace brume::testing {

// Field q (its position in io::all_snapshot_fields()) at global cell or face (i, j, k):
// 1000 q + i + 10 j + 100 k + 0.25, exact in float32 while i, j, k < 10.
[[nodiscard]] double known_value(std::size_t q, long i, long j, long k);

// A state of `block` holding known values in its interior cells and in every face of them
// (lower and upper); ghosts hold −7, which must never be written.
[[nodiscard]] solver::State known_state(const solver::BlockGeometry& block, bool magnetic,
                                        bool isothermal);

// The whole box of `cells` (lower corner `lower`, edges `size`) as one block with 2 ghost layers.
[[nodiscard]] solver::BlockGeometry whole_box(const std::array<int, 3>& cells,
                                              const std::array<double, 3>& lower = {0, 0, 0},
                                              const std::array<double, 3>& size = {1, 1, 1});

// Information for a snapshot of that box, with distinct unit factors.
[[nodiscard]] io::SnapshotInfo known_info(const solver::BlockGeometry& box);

// A fresh empty folder under the system's temporary directory.
[[nodiscard]] std::filesystem::path scratch_folder(const std::string& stem);

}  // namespace brume::testing
