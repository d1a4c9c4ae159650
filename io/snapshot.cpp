#include "io/snapshot.hpp"

#include <unistd.h>

#include <cstdio>
#include <stdexcept>
#include <vector>

#include "io/atomic_file.hpp"
#include "io/block_selection.hpp"
#include "io/chunk_shape.hpp"
#include "io/hdf5_handles.hpp"
#include "io/provenance.hpp"
#include "io/run_record.hpp"
#include "io/snapshot_layout.hpp"

namespace brume::io {

namespace {

// Contiguous layout, or chunked with byte shuffle and deflate (the shuffle groups the bytes of
// equal significance, which deflate then compresses far better for floating-point data) and a
// Fletcher-32 checksum per chunk, so that a damaged chunk fails to read instead of reading wrong.
H5Handle creation_list(const std::array<hsize_t, 3>& shape, int deflate_level) {
  H5Handle list(checked(H5Pcreate(H5P_DATASET_CREATE), "dataset creation list"), H5Pclose);
  if (deflate_level > 0) {
    const std::array<hsize_t, 3> chunk = chunk_shape(shape);
    checked_status(H5Pset_chunk(list.get(), 3, chunk.data()), "chunk shape");
    checked_status(H5Pset_shuffle(list.get()), "shuffle filter");
    checked_status(H5Pset_deflate(list.get(), static_cast<unsigned>(deflate_level)),
                   "deflate filter");
    checked_status(H5Pset_fletcher32(list.get()), "checksum filter");
    // Every element is written: filling chunks first would only cost time.
    checked_status(H5Pset_fill_time(list.get(), H5D_FILL_TIME_NEVER), "fill time");
  }
  return list;
}

void write_dataset(hid_t group, const SnapshotField& field, const solver::State& state,
                   const SnapshotInfo& info, hid_t transfer) {
  const BlockSelection s =
      block_selection(state.geometry, info.global_cells, field.staggered_axis(), FaceRange::owned);
  H5Handle file_space(checked(H5Screate_simple(3, s.file_extent.data(), nullptr), "file dataspace"),
                      H5Sclose);
  const H5Handle creation = creation_list(s.file_extent, info.deflate_level);
  const std::string& name = field.name;
  H5Handle dataset(checked(H5Dcreate2(group, name.c_str(),
                                      info.single_precision ? H5T_IEEE_F32LE : H5T_IEEE_F64LE,
                                      file_space.get(), H5P_DEFAULT, creation.get(), H5P_DEFAULT),
                           "creating dataset " + name),
                   H5Dclose);
  H5Handle memory_space(
      checked(H5Screate_simple(3, s.memory_extent.data(), nullptr), "memory dataspace"), H5Sclose);
  select_block(memory_space.get(), file_space.get(), s, name);
  checked_status(H5Dwrite(dataset.get(), H5T_NATIVE_DOUBLE, memory_space.get(), file_space.get(),
                          transfer, field_storage(state, field).data()),
                 "writing dataset " + name);
  write_attribute(dataset.get(), "unit", field.unit);
  write_attribute(dataset.get(), "to_cgs", info.units.*field.to_cgs);
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
  write_attribute(root, "format", std::string(snapshot_format));
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
  for (const SnapshotField& field : snapshot_fields(state.magnetic, state.isothermal))
    write_dataset(fields.get(), field, state, info, transfer.get());
  fields.close();
  if (info.run_record) write_run_record(root, *info.run_record);
  if (!file.close()) throw std::runtime_error("HDF5: closing " + path + " failed");
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
    if (any_failed == 0 && !flush_to_disk(temporary)) {
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
