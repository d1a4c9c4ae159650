// Reading a brume snapshot (used by `brume inspect`, and by restarts): the file is checked to be
// one of brume's on opening (HDF5, the format attribute, every root attribute, every field with
// the shape the cells imply), then blocks of the fields are read from the global layout,
// collectively, into a solver::State.
#pragma once

#include <mpi.h>

#include <array>
#include <filesystem>
#include <optional>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

#include "io/hdf5_handles.hpp"
#include "io/run_record.hpp"
#include "io/snapshot_layout.hpp"
#include "solver/state.hpp"

namespace brume::io {

// A file that is missing, not HDF5, truncated, foreign or damaged. The message names the file and
// what is wrong with it.
class SnapshotFileError : public std::runtime_error {
 public:
  using std::runtime_error::runtime_error;
};

// The root attributes of a snapshot and its build provenance.
struct SnapshotHeader {
  std::string format;
  double time = 0.0;  // code units
  double time_to_cgs = 1.0;
  long long step = 0;
  std::string reason;
  std::array<long, 3> cells{};    // x, y, z
  std::array<double, 3> lower{};  // code units, x, y, z
  std::array<double, 3> size{};
  double length_to_cgs = 1.0;
  std::string configuration;  // resolved configuration (YAML)
  std::vector<std::pair<std::string, std::string>> build;
};

// A dataset under /fields as the file stores it.
struct StoredDataset {
  std::string name;
  std::vector<hsize_t> shape;  // slowest axis first
  std::string type;            // "float64", "float32", or another kind ("int32", "text", ...)
  std::string unit;            // "" when absent (possible for datasets that are not brume's)
  double to_cgs = 0.0;         // 0 when absent
  std::string storage;         // "contiguous", "chunked", "chunked, shuffle + deflate 4", ...
  bool known = false;          // one of brume's fields (snapshot_layout.hpp)
};

class SnapshotReader {
 public:
  // Collective over `comm`. Throws SnapshotFileError for a missing, non-HDF5, truncated, foreign
  // or inconsistent file.
  SnapshotReader(std::filesystem::path file, MPI_Comm comm);

  [[nodiscard]] const std::filesystem::path& file() const { return path_; }
  [[nodiscard]] const SnapshotHeader& header() const { return header_; }
  [[nodiscard]] const std::vector<StoredDataset>& datasets() const { return datasets_; }
  [[nodiscard]] bool magnetic() const { return magnetic_; }
  [[nodiscard]] bool isothermal() const { return isothermal_; }
  // The group /run of a checkpoint; empty for a plain snapshot.
  [[nodiscard]] const std::optional<RunRecord>& run_record() const { return run_record_; }
  // The fields of this file, in the order they were written.
  [[nodiscard]] std::vector<SnapshotField> fields() const;

  // Collective. Reads every field of the block `state.geometry` (its interior cells; for a face
  // array the lower and upper face of each cell) from the global layout; ghosts are untouched.
  // Throws SnapshotFileError when the state's kind (magnetic, isothermal) differs from the file's
  // or a read fails on any rank; std::invalid_argument for a block outside the box.
  void read_block(solver::State& state) const;

 private:
  void read_header();
  void read_datasets();
  [[nodiscard]] std::string where() const { return path_.string() + ": "; }

  std::filesystem::path path_;
  MPI_Comm comm_;
  H5Handle file_;
  SnapshotHeader header_;
  std::vector<StoredDataset> datasets_;
  bool magnetic_ = false;
  bool isothermal_ = true;
  std::optional<RunRecord> run_record_;
};

}  // namespace brume::io
