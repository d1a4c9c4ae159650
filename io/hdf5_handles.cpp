#include "io/hdf5_handles.hpp"

#include <stdexcept>

namespace brume::io {

hid_t checked(hid_t id, const std::string& what) {
  if (id < 0) throw std::runtime_error("HDF5: " + what + " failed");
  return id;
}

void checked_status(herr_t status, const std::string& what) {
  if (status < 0) throw std::runtime_error("HDF5: " + what + " failed");
}

namespace {

void write_numeric(hid_t object, const std::string& name, hid_t type, const void* values,
                   hsize_t count) {
  H5Handle space(checked(count == 1 ? H5Screate(H5S_SCALAR) : H5Screate_simple(1, &count, nullptr),
                         "dataspace of attribute " + name),
                 H5Sclose);
  H5Handle attribute(
      checked(H5Acreate2(object, name.c_str(), type, space.get(), H5P_DEFAULT, H5P_DEFAULT),
              "creating attribute " + name),
      H5Aclose);
  checked_status(H5Awrite(attribute.get(), type, values), "writing attribute " + name);
}

}  // namespace

void write_attribute(hid_t object, const std::string& name, double value) {
  write_numeric(object, name, H5T_NATIVE_DOUBLE, &value, 1);
}

void write_attribute(hid_t object, const std::string& name, long long value) {
  write_numeric(object, name, H5T_NATIVE_LLONG, &value, 1);
}

void write_attribute(hid_t object, const std::string& name, const double* values, hsize_t count) {
  write_numeric(object, name, H5T_NATIVE_DOUBLE, values, count);
}

void write_attribute(hid_t object, const std::string& name, const long long* values,
                     hsize_t count) {
  write_numeric(object, name, H5T_NATIVE_LLONG, values, count);
}

void write_attribute(hid_t object, const std::string& name, const std::string& value) {
  H5Handle type(checked(H5Tcopy(H5T_C_S1), "string type"), H5Tclose);
  checked_status(H5Tset_size(type.get(), value.empty() ? 1 : value.size()), "string size");
  checked_status(H5Tset_cset(type.get(), H5T_CSET_UTF8), "string character set");
  H5Handle space(checked(H5Screate(H5S_SCALAR), "scalar dataspace"), H5Sclose);
  H5Handle attribute(
      checked(H5Acreate2(object, name.c_str(), type.get(), space.get(), H5P_DEFAULT, H5P_DEFAULT),
              "creating attribute " + name),
      H5Aclose);
  const std::string text = value.empty() ? std::string(1, '\0') : value;
  checked_status(H5Awrite(attribute.get(), type.get(), text.data()), "writing attribute " + name);
}

}  // namespace brume::io
