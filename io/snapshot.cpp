#include "io/snapshot.hpp"

#include <fcntl.h>
#include <unistd.h>

#include <cstdio>
#include <stdexcept>
#include <vector>

#include "io/hdf5_handles.hpp"
#include "io/provenance.hpp"

namespace brume::io {

namespace {

// The part of a block's storage array that it writes, and where that lands in the global dataset.
struct Selection {
  hsize_t memory_extent[3];  // storage extents, [z][y][x]
  hsize_t memory_start[3];
  hsize_t count[3];
  hsize_t file_extent[3];
  hsize_t file_start[3];
};

// `staggered_axis` is the normal of a face array (−1 for cell data). A block writes its interior
// cells, and for a face array the faces at its lower side along the normal; the block at the upper
// end of the box writes the last face too, so that each face is written by exactly one rank.
Selection selection(const solver::BlockGeometry& g, const std::array<long, 3>& global,
                    int staggered_axis) {
  Selection s{};
  for (int d = 0; d < 3; ++d) {
    const int z = 2 - d;  // HDF5 order: slowest first
    const bool face = d == staggered_axis && g.active(d);
    const bool last = g.offset[d] + g.cells[d] == global[d];
    s.memory_extent[z] = static_cast<hsize_t>(g.extent(d));
    s.memory_start[z] = static_cast<hsize_t>(g.ghosts(d));
    s.count[z] = static_cast<hsize_t>(g.cells[d] + (face && last ? 1 : 0));
    s.file_extent[z] = static_cast<hsize_t>(global[d] + (face ? 1 : 0));
    s.file_start[z] = static_cast<hsize_t>(g.offset[d]);
  }
  return s;
}

void write_dataset(hid_t group, const std::string& name, const double* data, const Selection& s,
                   bool single_precision, const std::string& unit, double to_cgs, hid_t transfer) {
  H5Handle file_space(checked(H5Screate_simple(3, s.file_extent, nullptr), "file dataspace"),
                      H5Sclose);
  H5Handle dataset(
      checked(H5Dcreate2(group, name.c_str(), single_precision ? H5T_IEEE_F32LE : H5T_IEEE_F64LE,
                         file_space.get(), H5P_DEFAULT, H5P_DEFAULT, H5P_DEFAULT),
              "creating dataset " + name),
      H5Dclose);
  H5Handle memory_space(checked(H5Screate_simple(3, s.memory_extent, nullptr), "memory dataspace"),
                        H5Sclose);
  checked_status(H5Sselect_hyperslab(memory_space.get(), H5S_SELECT_SET, s.memory_start, nullptr,
                                     s.count, nullptr),
                 "memory selection of " + name);
  checked_status(H5Sselect_hyperslab(file_space.get(), H5S_SELECT_SET, s.file_start, nullptr,
                                     s.count, nullptr),
                 "file selection of " + name);
  checked_status(H5Dwrite(dataset.get(), H5T_NATIVE_DOUBLE, memory_space.get(), file_space.get(),
                          transfer, data),
                 "writing dataset " + name);
  write_attribute(dataset.get(), "unit", unit);
  write_attribute(dataset.get(), "to_cgs", to_cgs);
}

void write_file(const std::string& path, const solver::State& state, const SnapshotInfo& info,
                MPI_Comm comm) {
  H5Handle access(checked(H5Pcreate(H5P_FILE_ACCESS), "file access list"), H5Pclose);
  checked_status(H5Pset_fapl_mpio(access.get(), comm, MPI_INFO_NULL), "MPI-IO driver");
  H5Handle file(checked(H5Fcreate(path.c_str(), H5F_ACC_TRUNC, H5P_DEFAULT, access.get()),
                        "creating " + path),
                H5Fclose);
  H5Handle transfer(checked(H5Pcreate(H5P_DATASET_XFER), "transfer list"), H5Pclose);
  checked_status(H5Pset_dxpl_mpio(transfer.get(), H5FD_MPIO_COLLECTIVE), "collective transfer");

  const hid_t root = file.get();
  write_attribute(root, "format", std::string("brume snapshot 1"));
  write_attribute(root, "time", state.time);
  write_attribute(root, "time_to_cgs", info.units.time);
  write_attribute(root, "step", static_cast<long long>(state.step));
  write_attribute(root, "reason", info.reason);
  const long long cells[3] = {info.global_cells[0], info.global_cells[1], info.global_cells[2]};
  write_attribute(root, "cells", cells, 3);
  write_attribute(root, "lower", info.lower.data(), 3);
  write_attribute(root, "size", info.size.data(), 3);
  write_attribute(root, "length_to_cgs", info.units.length);
  write_attribute(root, "configuration", info.configuration);
  {
    H5Handle build(
        checked(H5Gcreate2(root, "build", H5P_DEFAULT, H5P_DEFAULT, H5P_DEFAULT), "group build"),
        H5Gclose);
    for (const auto& [name, value] : provenance())
      write_attribute(build.get(), name, value);
  }
  H5Handle fields(
      checked(H5Gcreate2(root, "fields", H5P_DEFAULT, H5P_DEFAULT, H5P_DEFAULT), "group fields"),
      H5Gclose);
  const solver::BlockGeometry& g = state.geometry;
  const Selection cell = selection(g, info.global_cells, -1);
  const bool f32 = info.single_precision;
  const FieldUnits& u = info.units;
  write_dataset(fields.get(), "density", state.density.data(), cell, f32, "g cm^-3", u.density,
                transfer.get());
  const char* momenta[3] = {"momentum_x", "momentum_y", "momentum_z"};
  for (int d = 0; d < 3; ++d) {
    write_dataset(fields.get(), momenta[d], state.momentum[d].data(), cell, f32, "g cm^-2 s^-1",
                  u.momentum, transfer.get());
  }
  if (!state.isothermal) {
    write_dataset(fields.get(), "total_energy", state.energy.data(), cell, f32, "erg cm^-3",
                  u.energy_density, transfer.get());
  }
  if (state.magnetic) {
    const char* faces[3] = {"face_field_x", "face_field_y", "face_field_z"};
    for (int d = 0; d < 3; ++d) {
      write_dataset(fields.get(), faces[d], state.face_field[d].data(),
                    selection(g, info.global_cells, d), f32, "G", u.magnetic_field, transfer.get());
    }
  }
  fields.close();
  if (!file.close()) throw std::runtime_error("HDF5: closing " + path + " failed");
}

// fsync the closed file, so that the rename never publishes data still in the page cache.
bool flushed_to_disk(const std::string& path) {
  const int fd = ::open(path.c_str(), O_RDONLY | O_CLOEXEC);
  if (fd < 0) return false;
  const bool ok = ::fsync(fd) == 0;
  return ::close(fd) == 0 && ok;
}

}  // namespace

void write_snapshot(const std::filesystem::path& file, const solver::State& state,
                    const SnapshotInfo& info, MPI_Comm comm) {
  int rank = 0;
  MPI_Comm_rank(comm, &rank);
  H5Eset_auto2(H5E_DEFAULT, nullptr, nullptr);  // errors are reported by exceptions, not printed
  // Every rank must agree on the temporary name: take rank 0's process id.
  long id = static_cast<long>(::getpid());
  MPI_Bcast(&id, 1, MPI_LONG, 0, comm);
  const std::string temporary = file.string() + ".partial-" + std::to_string(id);
  int failed = 0;
  std::string reason;
  try {
    write_file(temporary, state, info, comm);
  } catch (const std::exception& error) {
    failed = 1;
    reason = error.what();
  }
  int any_failed = 0;
  MPI_Allreduce(&failed, &any_failed, 1, MPI_INT, MPI_MAX, comm);
  if (rank == 0) {
    if (any_failed == 0 && !flushed_to_disk(temporary)) {
      any_failed = 1;
      reason = "flushing " + temporary + " to disk failed";
    }
    if (any_failed != 0) {
      failed = 1;
      std::remove(temporary.c_str());
    } else if (std::rename(temporary.c_str(), file.c_str()) != 0) {
      std::remove(temporary.c_str());
      failed = 1;
      reason = "renaming " + temporary + " to " + file.string() + " failed";
    }
  }
  MPI_Allreduce(&failed, &any_failed, 1, MPI_INT, MPI_MAX, comm);
  if (any_failed != 0) {
    throw std::runtime_error(
        "cannot write snapshot " + file.string() +
        (reason.empty() ? std::string(" (failed on another rank)") : ": " + reason));
  }
}

}  // namespace brume::io
