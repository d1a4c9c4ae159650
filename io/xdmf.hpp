// XDMF (version 3, XML) descriptions of snapshots, so that general-purpose viewers open them:
// one sidecar per snapshot file and one time series per run folder. The light data (grid,
// time) is in the XML; the fields stay in the HDF5 file, named by a path relative to it.
//
// The box is a 3DCoRectMesh whose nodes are the cell corners; the cell-centred fields are
// attributes on its cells. Each face array is a grid of its own whose nodes are the face centres
// (staggered by half a cell off its normal), with the field on the nodes. Dimensions, origin and
// spacing are all listed slowest axis first, (z, y, x), the order of the HDF5 datasets.
#pragma once

#include <array>
#include <filesystem>
#include <string>
#include <vector>

#include "io/snapshot.hpp"
#include "solver/state.hpp"

namespace brume::io {

// What the XML says about one snapshot file.
struct XdmfSnapshot {
  std::string data_file;  // the HDF5 file, relative to the XDMF file (the same folder)
  double time = 0.0;      // code units
  std::array<long, 3> cells{};
  std::array<double, 3> lower{};  // code units, x, y, z
  std::array<double, 3> size{};
  bool single_precision = false;
  bool magnetic = false;
  bool isothermal = false;
  double time_to_cgs = 1.0;
  double length_to_cgs = 1.0;
};

[[nodiscard]] XdmfSnapshot xdmf_snapshot(std::string data_file, const solver::State& state,
                                         const SnapshotInfo& info);

// The sidecar of one snapshot: a domain with the grid "cells" and, when magnetized, the grids
// "face_field_x", "face_field_y" and "face_field_z".
[[nodiscard]] std::string snapshot_xdmf(const XdmfSnapshot& snapshot);

// The run's time series: the same grids, each a temporal collection over `snapshots` (in order).
[[nodiscard]] std::string time_series_xdmf(const std::vector<XdmfSnapshot>& snapshots);

// snapshot-0003.h5 → snapshot-0003.xmf
[[nodiscard]] std::filesystem::path sidecar_path(const std::filesystem::path& data_file);

// The time series file in the run folder.
inline constexpr const char* time_series_file = "snapshots.xmf";

}  // namespace brume::io
