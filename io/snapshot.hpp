// One HDF5 file per snapshot: every field one dataset in the global layout of the box (x fastest,
// i.e. dimensions [z][y][x]), written collectively by all ranks; units as attributes (the factor to
// cgs), the resolved configuration and the build provenance in every file. The file is written
// under a temporary name and renamed when complete.
#pragma once

#include <mpi.h>

#include <array>
#include <filesystem>
#include <string>

#include "solver/state.hpp"

namespace brume::io {

// Factor that turns each code quantity into cgs.
struct FieldUnits {
  double length = 1.0;          // cm
  double time = 1.0;            // s
  double density = 1.0;         // g cm^-3
  double momentum = 1.0;        // g cm^-2 s^-1
  double energy_density = 1.0;  // erg cm^-3
  double magnetic_field = 1.0;  // G (code B includes 1/sqrt(4π): B_G = B_code × this)
};

struct SnapshotInfo {
  std::array<long, 3> global_cells{};
  std::array<double, 3> lower{};  // code units
  std::array<double, 3> size{};   // code units
  FieldUnits units;
  std::string configuration;  // resolved configuration (YAML)
  std::string reason;         // "scheduled", "final", "numerical failure", ...
  bool single_precision = false;
};

// Collective over `comm`: every rank passes its own block. Throws std::runtime_error on failure
// (the temporary file is removed, an existing file of the final name is untouched).
void write_snapshot(const std::filesystem::path& file, const solver::State& state,
                    const SnapshotInfo& info, MPI_Comm comm);

}  // namespace brume::io
