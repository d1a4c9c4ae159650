#include "io/run_record.hpp"

#include <algorithm>
#include <utility>

#include "io/hdf5_attribute_reader.hpp"
#include "io/hdf5_handles.hpp"

namespace brume::io {

namespace {

template <class T>
void assign(std::vector<std::pair<std::string, T>>& list, const std::string& name, T value) {
  const auto entry =
      std::find_if(list.begin(), list.end(), [&](const auto& e) { return e.first == name; });
  if (entry != list.end()) {
    entry->second = std::move(value);
  } else {
    list.emplace_back(name, std::move(value));
  }
}

template <class T>
T find(const std::vector<std::pair<std::string, T>>& list, const std::string& name,
       const char* kind) {
  for (const auto& [n, value] : list) {
    if (n == name) return value;
  }
  throw RunRecordError("group /run has no " + std::string(kind) + " entry '" + name + "'");
}

herr_t collect_name(hid_t, const char* name, const H5A_info_t*, void* data) {
  static_cast<std::vector<std::string>*>(data)->emplace_back(name);
  return 0;
}

}  // namespace

void RunRecord::set(const std::string& name, double value) {
  assign(reals_, name, value);
}

void RunRecord::set(const std::string& name, long long value) {
  assign(integers_, name, value);
}

void RunRecord::set(const std::string& name, std::vector<double> values) {
  assign(arrays_, name, std::move(values));
}

std::vector<double> RunRecord::array(const std::string& name) const {
  for (const auto& [n, values] : arrays_) {
    if (n == name) return values;
  }
  // HDF5 attributes of one element are written as scalars: read back as a real entry.
  for (const auto& [n, value] : reals_) {
    if (n == name) return {value};
  }
  return {};
}

double RunRecord::real(const std::string& name) const {
  return find(reals_, name, "real");
}

long long RunRecord::integer(const std::string& name) const {
  return find(integers_, name, "integer");
}

void write_run_record(hid_t file, const RunRecord& record) {
  H5Handle group(
      checked(H5Gcreate2(file, "run", H5P_DEFAULT, H5P_DEFAULT, H5P_DEFAULT), "group run"),
      H5Gclose);
  for (const auto& [name, value] : record.reals())
    write_attribute(group.get(), name, value);
  for (const auto& [name, value] : record.integers())
    write_attribute(group.get(), name, value);
  for (const auto& [name, values] : record.arrays()) {
    if (!values.empty()) write_attribute(group.get(), name, values.data(), values.size());
  }
}

std::optional<RunRecord> read_run_record(hid_t file) {
  if (H5Lexists(file, "run", H5P_DEFAULT) <= 0) return std::nullopt;
  H5Handle group(checked(H5Gopen2(file, "run", H5P_DEFAULT), "opening /run"), H5Gclose);
  std::vector<std::string> names;
  hsize_t position = 0;
  checked_status(
      H5Aiterate2(group.get(), H5_INDEX_NAME, H5_ITER_INC, &position, collect_name, &names),
      "listing /run");
  RunRecord record;
  for (const std::string& name : names) {
    H5Handle attribute(
        checked(H5Aopen(group.get(), name.c_str(), H5P_DEFAULT), "attribute " + name), H5Aclose);
    H5Handle type(checked(H5Aget_type(attribute.get()), "type of " + name), H5Tclose);
    try {
      H5Handle space(checked(H5Aget_space(attribute.get()), "shape of " + name), H5Sclose);
      const bool scalar = H5Sget_simple_extent_type(space.get()) == H5S_SCALAR;
      const auto count = static_cast<hsize_t>(H5Sget_simple_extent_npoints(space.get()));
      if (H5Tget_class(type.get()) == H5T_FLOAT && !scalar) {
        record.set(name, read_real_attributes(group.get(), name, count));
      } else if (H5Tget_class(type.get()) == H5T_FLOAT) {
        record.set(name, read_real_attribute(group.get(), name));
      } else if (H5Tget_class(type.get()) == H5T_INTEGER) {
        record.set(name, read_integer_attribute(group.get(), name));
      } else {
        throw RunRecordError("entry '" + name + "' of group /run is neither real nor integer");
      }
    } catch (const AttributeError& error) {
      throw RunRecordError(std::string("group /run: ") + error.what());
    }
  }
  return record;
}

}  // namespace brume::io
