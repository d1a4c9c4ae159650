// One HDF5 file per snapshot: every field one dataset in the global layout of the box (x fastest,
// i.e. dimensions [z][y][x]), written collectively by all ranks; units as attributes (the factor to
// cgs), the resolved configuration and the build provenance in every file. The file is written
// under a temporary name and renamed when complete. The datasets are listed in snapshot_layout.hpp.
#pragma once

#include <mpi.h>

#include <array>
#include <filesystem>
#include <optional>
#include <string>

#include "io/field_units.hpp"
#include "io/run_record.hpp"
#include "solver/state.hpp"

namespace brume::io {

struct SnapshotInfo {
  std::array<long, 3> global_cells{};
  std::array<double, 3> lower{};  // code units
  std::array<double, 3> size{};   // code units
  FieldUnits units;
  std::string configuration;  // resolved configuration (YAML)
  std::string reason;         // "scheduled", "final", "numerical failure", ...
  bool single_precision = false;
  // 0: contiguous datasets; 1–9: chunked (io/chunk_shape.hpp), byte-shuffled and deflated at this
  // zlib level, with a Fletcher-32 checksum per chunk.
  int deflate_level = 0;
  // Present in checkpoints: the run's own state, written as the group /run (io/run_record.hpp).
  std::optional<RunRecord> run_record;
};

// Collective over `comm`: every rank passes its own block. Throws std::runtime_error on failure
// (the temporary file is removed, an existing file of the final name is untouched).
void write_snapshot(const std::filesystem::path& file, const solver::State& state,
                    const SnapshotInfo& info, MPI_Comm comm);

}  // namespace brume::io
