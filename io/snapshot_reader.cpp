#include "io/snapshot_reader.hpp"

#include <algorithm>
#include <cmath>
#include <system_error>

#include "io/block_selection.hpp"
#include "io/first_failure.hpp"
#include "io/hdf5_attribute_reader.hpp"
#include "io/hdf5_error_text.hpp"
#include "io/provenance.hpp"
#include "io/run_record.hpp"

namespace brume::io {

namespace fs = std::filesystem;

namespace {

std::string shape_text(const std::vector<hsize_t>& shape) {
  std::string text = "[";
  for (std::size_t i = 0; i < shape.size(); ++i)
    text += (i == 0 ? "" : ", ") + std::to_string(shape[i]);
  return text + "]";
}

// The checks that need no HDF5: the path names a non-empty regular file in HDF5's format.
void check_is_hdf5(const fs::path& path) {
  const std::string where = path.string() + ": ";
  std::error_code error;
  const fs::file_status status = fs::status(path, error);
  if (!fs::exists(status)) throw SnapshotFileError(where + "no such file");
  if (fs::is_directory(status)) {
    throw SnapshotFileError(where + "is a folder, expected a brume snapshot file");
  }
  if (fs::file_size(path, error) == 0 && !error) {
    throw SnapshotFileError(where + "empty file, expected a brume snapshot (HDF5)");
  }
  if (H5Fis_hdf5(path.c_str()) <= 0) {
    H5Eclear2(H5E_DEFAULT);  // what HDF5 recorded says no more than this
    throw SnapshotFileError(where + "not an HDF5 file, expected a brume snapshot");
  }
}

H5Handle open_file(const fs::path& path, MPI_Comm comm) {
  H5Eset_auto2(H5E_DEFAULT, nullptr, nullptr);  // errors are reported by exceptions, not printed
  check_is_hdf5(path);
  H5Handle access(checked(H5Pcreate(H5P_FILE_ACCESS), "file access list"), H5Pclose);
  checked_status(H5Pset_fapl_mpio(access.get(), comm, MPI_INFO_NULL), "MPI-IO driver");
  const hid_t id = H5Fopen(path.c_str(), H5F_ACC_RDONLY, access.get());
  if (id < 0) {
    const std::string reason = hdf5_error_text();
    const std::string where = path.string() + ": ";
    if (reason.find("truncated") != std::string::npos) {
      throw SnapshotFileError(where + "truncated HDF5 file (HDF5: " + reason +
                              "): it was cut short or not written to the end");
    }
    throw SnapshotFileError(where + "cannot be opened as HDF5 (damaged or unreadable)" +
                            (reason.empty() ? std::string() : " (" + reason + ")"));
  }
  return H5Handle(id, H5Fclose);
}

std::string type_name(hid_t type) {
  const std::size_t bytes = H5Tget_size(type);
  switch (H5Tget_class(type)) {
    case H5T_FLOAT:
      return "float" + std::to_string(8 * bytes);
    case H5T_INTEGER:
      return (H5Tget_sign(type) == H5T_SGN_NONE ? "uint" : "int") + std::to_string(8 * bytes);
    case H5T_STRING:
      return "text";
    default:
      return "other";
  }
}

std::string storage_text(hid_t dataset) {
  H5Handle creation(H5Dget_create_plist(dataset), H5Pclose);
  if (!creation.valid()) return "unknown";
  const H5D_layout_t layout = H5Pget_layout(creation.get());
  std::string text = layout == H5D_CHUNKED   ? "chunked"
                     : layout == H5D_COMPACT ? "compact"
                                             : "contiguous";
  const int filters = H5Pget_nfilters(creation.get());
  for (int i = 0; i < filters; ++i) {
    unsigned flags = 0;
    unsigned values[8] = {};
    std::size_t count = 8;
    char name[64] = {};
    unsigned config = 0;
    const H5Z_filter_t id = H5Pget_filter2(creation.get(), static_cast<unsigned>(i), &flags, &count,
                                           values, sizeof name, name, &config);
    text += i == 0 ? ", " : " + ";
    if (id == H5Z_FILTER_DEFLATE) {
      text += "deflate " + std::to_string(count > 0 ? values[0] : 0);
    } else if (id == H5Z_FILTER_SHUFFLE) {
      text += "shuffle";
    } else {
      text += name[0] != '\0' ? std::string(name) : "filter " + std::to_string(id);
    }
  }
  return text;
}

const SnapshotField* known_field(const std::string& name) {
  for (const SnapshotField& f : all_snapshot_fields()) {
    if (f.name == name) return &f;
  }
  return nullptr;
}

std::size_t layout_position(const std::string& name) {
  const auto& fields = all_snapshot_fields();
  std::size_t n = 0;
  while (n < fields.size() && fields[n].name != name)
    ++n;
  return n;
}

// The build provenance in the order brume writes it, then any other attributes by name.
void order_as_provenance(std::vector<std::pair<std::string, std::string>>& build) {
  const auto reference = provenance();
  auto position = [&](const std::string& name) {
    std::size_t n = 0;
    while (n < reference.size() && reference[n].first != name)
      ++n;
    return n;
  };
  std::stable_sort(build.begin(), build.end(), [&](const auto& a, const auto& b) {
    return position(a.first) < position(b.first);
  });
}

herr_t collect_dataset(hid_t group, const char* name, const H5L_info_t* /*info*/, void* data) {
  H5O_info_t object{};
  if (H5Oget_info_by_name2(group, name, &object, H5O_INFO_BASIC, H5P_DEFAULT) >= 0 &&
      object.type == H5O_TYPE_DATASET)
    static_cast<std::vector<std::string>*>(data)->emplace_back(name);
  return 0;
}

}  // namespace

SnapshotReader::SnapshotReader(fs::path file, MPI_Comm comm)
    : path_(std::move(file)), comm_(comm), file_(open_file(path_, comm)) {
  read_header();
  read_datasets();
}

void SnapshotReader::read_header() {
  const hid_t root = file_.get();
  if (!has_attribute(root, "format")) {
    throw SnapshotFileError(where() +
                            "not a brume snapshot: the HDF5 file has no root attribute 'format' "
                            "(expected '" +
                            snapshot_format + "')");
  }
  SnapshotHeader& h = header_;
  try {
    h.format = read_text_attribute(root, "format");
    if (h.format != snapshot_format) {
      const bool brume = h.format.rfind("brume ", 0) == 0;
      throw SnapshotFileError(where() + (brume ? "" : "not a brume snapshot: ") +
                              "root attribute 'format' is '" + h.format + "', expected '" +
                              snapshot_format + "'");
    }
    h.time = read_real_attribute(root, "time");
    h.time_to_cgs = read_real_attribute(root, "time_to_cgs");
    h.step = read_integer_attribute(root, "step");
    h.reason = read_text_attribute(root, "reason");
    const auto cells = read_integer_attributes(root, "cells", 3);
    const auto lower = read_real_attributes(root, "lower", 3);
    const auto size = read_real_attributes(root, "size", 3);
    for (int d = 0; d < 3; ++d) {
      h.cells[d] = static_cast<long>(cells[d]);
      h.lower[d] = lower[d];
      h.size[d] = size[d];
    }
    h.length_to_cgs = read_real_attribute(root, "length_to_cgs");
    h.configuration = read_text_attribute(root, "configuration");
  } catch (const AttributeError& error) {
    throw SnapshotFileError(where() + "root " + error.what());
  }
  for (int d = 0; d < 3; ++d) {
    if (h.cells[d] < 1 || !(h.size[d] > 0.0) || !std::isfinite(h.size[d]) ||
        !std::isfinite(h.lower[d])) {
      throw SnapshotFileError(where() +
                              "root attributes 'cells', 'lower' and 'size' must hold positive "
                              "cell counts, a finite corner and positive edge lengths");
    }
  }
  if (H5Lexists(root, "build", H5P_DEFAULT) <= 0) {
    throw SnapshotFileError(where() + "group /build (the build provenance) is missing");
  }
  H5Handle build(checked(H5Gopen2(root, "build", H5P_DEFAULT), "opening /build"), H5Gclose);
  h.build = text_attributes(build.get());
  order_as_provenance(h.build);
  try {
    run_record_ = read_run_record(root);
  } catch (const std::exception& error) {
    throw SnapshotFileError(where() + error.what());
  }
}

void SnapshotReader::read_datasets() {
  const hid_t root = file_.get();
  if (H5Lexists(root, "fields", H5P_DEFAULT) <= 0) {
    throw SnapshotFileError(where() + "group /fields is missing");
  }
  H5Handle group(checked(H5Gopen2(root, "fields", H5P_DEFAULT), "opening /fields"), H5Gclose);
  std::vector<std::string> names;
  hsize_t position = 0;
  H5Literate(group.get(), H5_INDEX_NAME, H5_ITER_INC, &position, collect_dataset, &names);
  for (const std::string& name : names) {
    const std::string place = where() + "dataset /fields/" + name;
    H5Handle dataset(H5Dopen2(group.get(), name.c_str(), H5P_DEFAULT), H5Dclose);
    H5Handle space(dataset.valid() ? H5Dget_space(dataset.get()) : H5I_INVALID_HID, H5Sclose);
    H5Handle type(dataset.valid() ? H5Dget_type(dataset.get()) : H5I_INVALID_HID, H5Tclose);
    if (!space.valid() || !type.valid()) throw SnapshotFileError(place + " cannot be opened");
    StoredDataset d;
    d.name = name;
    const int rank = H5Sget_simple_extent_ndims(space.get());
    d.shape.assign(static_cast<std::size_t>(rank > 0 ? rank : 0), 0);
    H5Sget_simple_extent_dims(space.get(), d.shape.data(), nullptr);
    d.type = type_name(type.get());
    d.storage = storage_text(dataset.get());
    const SnapshotField* field = known_field(name);
    d.known = field != nullptr;
    try {
      if (d.known || has_attribute(dataset.get(), "unit"))
        d.unit = read_text_attribute(dataset.get(), "unit");
      if (d.known || has_attribute(dataset.get(), "to_cgs"))
        d.to_cgs = read_real_attribute(dataset.get(), "to_cgs");
    } catch (const AttributeError& error) {
      throw SnapshotFileError(place + ": " + error.what());
    }
    if (d.known) {
      if (H5Tget_class(type.get()) != H5T_FLOAT) {
        throw SnapshotFileError(place + " holds " + d.type +
                                " values, expected float64 or "
                                "float32");
      }
      const std::array<long, 3> expected = stored_shape(header_.cells, field->staggered_axis());
      const std::vector<hsize_t> wanted(expected.begin(), expected.end());
      if (d.shape != wanted) {
        throw SnapshotFileError(place + " has shape " + shape_text(d.shape) + ", expected " +
                                shape_text(wanted) + " ([z][y][x] for " +
                                std::to_string(header_.cells[0]) + " × " +
                                std::to_string(header_.cells[1]) + " × " +
                                std::to_string(header_.cells[2]) + " cells)");
      }
    }
    datasets_.push_back(std::move(d));
  }
  // brume's fields in the order they are written, then any others by name.
  std::stable_sort(datasets_.begin(), datasets_.end(), [](const auto& a, const auto& b) {
    return layout_position(a.name) < layout_position(b.name);
  });
  auto present = [&](const std::string& name) {
    for (const StoredDataset& d : datasets_) {
      if (d.name == name) return true;
    }
    return false;
  };
  magnetic_ = present("face_field_x") || present("face_field_y") || present("face_field_z");
  isothermal_ = !present("total_energy");
  for (const SnapshotField& f : snapshot_fields(magnetic_, isothermal_)) {
    if (!present(f.name)) {
      throw SnapshotFileError(
          where() + "dataset /fields/" + f.name + " is missing" +
          (f.quantity == StoredQuantity::face_field ? " (the other face fields are present)" : ""));
    }
  }
}

std::vector<SnapshotField> SnapshotReader::fields() const {
  return snapshot_fields(magnetic_, isothermal_);
}

void SnapshotReader::read_block(solver::State& state) const {
  if (state.magnetic != magnetic_ || state.isothermal != isothermal_) {
    auto kind = [](bool magnetic, bool isothermal) {
      return std::string(magnetic ? "magnetized" : "hydrodynamic") +
             (isothermal ? " isothermal" : " adiabatic") + " gas";
    };
    throw SnapshotFileError(where() + "holds " + kind(magnetic_, isothermal_) +
                            ", but the state to fill is " + kind(state.magnetic, state.isothermal));
  }
  const solver::BlockGeometry& g = state.geometry;
  for (int d = 0; d < 3; ++d) {
    if (g.offset[d] < 0 || g.offset[d] + g.cells[d] > header_.cells[d] ||
        g.active(d) != (header_.cells[d] > 1)) {
      throw std::invalid_argument(where() + "the block to read does not fit the box");
    }
  }
  H5Handle group(checked(H5Gopen2(file_.get(), "fields", H5P_DEFAULT), "opening /fields"),
                 H5Gclose);
  H5Handle transfer(checked(H5Pcreate(H5P_DATASET_XFER), "transfer list"), H5Pclose);
  checked_status(H5Pset_dxpl_mpio(transfer.get(), H5FD_MPIO_COLLECTIVE), "collective transfer");
  for (const SnapshotField& field : fields()) {
    std::string failure;
    try {
      const BlockSelection s =
          block_selection(g, header_.cells, field.staggered_axis(), FaceRange::bounding);
      H5Handle dataset(
          checked(H5Dopen2(group.get(), field.name.c_str(), H5P_DEFAULT), "opening " + field.name),
          H5Dclose);
      H5Handle file_space(checked(H5Dget_space(dataset.get()), "dataspace"), H5Sclose);
      H5Handle memory_space(
          checked(H5Screate_simple(3, s.memory_extent.data(), nullptr), "memory dataspace"),
          H5Sclose);
      select_block(memory_space.get(), file_space.get(), s, field.name);
      if (H5Dread(dataset.get(), H5T_NATIVE_DOUBLE, memory_space.get(), file_space.get(),
                  transfer.get(), field_storage(state, field).data()) < 0) {
        const std::string reason = hdf5_error_text();
        failure = where() + "reading dataset /fields/" + field.name + " failed" +
                  (reason.empty() ? std::string() : " (" + reason + ")");
      }
    } catch (const std::runtime_error& error) {
      failure = where() + error.what();
    }
    const std::string agreed = first_failure(comm_, failure);
    if (!agreed.empty()) throw SnapshotFileError(agreed);
  }
}

}  // namespace brume::io
