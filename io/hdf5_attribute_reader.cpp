#include "io/hdf5_attribute_reader.hpp"

#include "io/hdf5_handles.hpp"

namespace brume::io {

namespace {

[[noreturn]] void fail(const std::string& name, const std::string& what) {
  throw AttributeError("attribute '" + name + "' " + what);
}

H5Handle open_attribute(hid_t object, const std::string& name) {
  if (!has_attribute(object, name)) fail(name, "is missing");
  const hid_t id = H5Aopen(object, name.c_str(), H5P_DEFAULT);
  if (id < 0) fail(name, "cannot be opened");
  return H5Handle(id, H5Aclose);
}

hsize_t element_count(hid_t attribute, const std::string& name) {
  H5Handle space(H5Aget_space(attribute), H5Sclose);
  const hssize_t n = space.valid() ? H5Sget_simple_extent_npoints(space.get()) : -1;
  if (n < 0) fail(name, "has an unreadable dataspace");
  return static_cast<hsize_t>(n);
}

H5T_class_t type_class(hid_t attribute) {
  H5Handle type(H5Aget_type(attribute), H5Tclose);
  return type.valid() ? H5Tget_class(type.get()) : H5T_NO_CLASS;
}

template <class T>
std::vector<T> read_numbers(hid_t object, const std::string& name, hsize_t count, hid_t memory,
                            bool integers_only) {
  const H5Handle attribute = open_attribute(object, name);
  const H5T_class_t kind = type_class(attribute.get());
  const bool numeric = kind == H5T_INTEGER || (!integers_only && kind == H5T_FLOAT);
  if (!numeric) fail(name, std::string("is not ") + (integers_only ? "an integer" : "a number"));
  const hsize_t found = element_count(attribute.get(), name);
  if (found != count) {
    fail(name, "holds " + std::to_string(found) + " value" + (found == 1 ? "" : "s") +
                   ", expected " + std::to_string(count));
  }
  std::vector<T> values(count);
  if (H5Aread(attribute.get(), memory, values.data()) < 0) fail(name, "cannot be read");
  return values;
}

}  // namespace

bool has_attribute(hid_t object, const std::string& name) {
  return H5Aexists(object, name.c_str()) > 0;
}

double read_real_attribute(hid_t object, const std::string& name) {
  return read_numbers<double>(object, name, 1, H5T_NATIVE_DOUBLE, false).front();
}

long long read_integer_attribute(hid_t object, const std::string& name) {
  return read_numbers<long long>(object, name, 1, H5T_NATIVE_LLONG, true).front();
}

std::vector<double> read_real_attributes(hid_t object, const std::string& name, hsize_t count) {
  return read_numbers<double>(object, name, count, H5T_NATIVE_DOUBLE, false);
}

std::vector<long long> read_integer_attributes(hid_t object, const std::string& name,
                                               hsize_t count) {
  return read_numbers<long long>(object, name, count, H5T_NATIVE_LLONG, true);
}

// Fixed-length strings (brume's own) and variable-length ones (h5py's default) both read.
std::string read_text_attribute(hid_t object, const std::string& name) {
  const H5Handle attribute = open_attribute(object, name);
  H5Handle stored(H5Aget_type(attribute.get()), H5Tclose);
  if (!stored.valid() || H5Tget_class(stored.get()) != H5T_STRING) fail(name, "is not text");
  if (element_count(attribute.get(), name) != 1) fail(name, "holds several texts, expected one");
  H5Handle memory(checked(H5Tcopy(H5T_C_S1), "string type"), H5Tclose);
  // HDF5 converts no text between character sets: read in the stored one.
  checked_status(H5Tset_cset(memory.get(), H5Tget_cset(stored.get())), "string character set");
  if (H5Tis_variable_str(stored.get()) > 0) {
    checked_status(H5Tset_size(memory.get(), H5T_VARIABLE), "string size");
    char* text = nullptr;
    if (H5Aread(attribute.get(), memory.get(), &text) < 0 || text == nullptr) {
      fail(name, "cannot be read");
    }
    std::string value(text);
    H5free_memory(text);
    return value;
  }
  const std::size_t size = H5Tget_size(stored.get());
  if (size == 0) fail(name, "has an unreadable size");
  checked_status(H5Tset_size(memory.get(), size), "string size");
  std::string value(size, '\0');
  if (H5Aread(attribute.get(), memory.get(), value.data()) < 0) fail(name, "cannot be read");
  value.resize(value.find('\0') == std::string::npos ? size : value.find('\0'));
  return value;
}

namespace {

herr_t collect_name(hid_t /*object*/, const char* name, const H5A_info_t* /*info*/, void* data) {
  static_cast<std::vector<std::string>*>(data)->emplace_back(name);
  return 0;
}

}  // namespace

std::vector<std::pair<std::string, std::string>> text_attributes(hid_t object) {
  std::vector<std::string> names;
  hsize_t position = 0;
  H5Aiterate2(object, H5_INDEX_NAME, H5_ITER_INC, &position, collect_name, &names);
  std::vector<std::pair<std::string, std::string>> texts;
  for (const std::string& name : names) {
    try {
      texts.emplace_back(name, read_text_attribute(object, name));
    } catch (const AttributeError&) {
      // not text: skipped, as documented
    }
  }
  return texts;
}

}  // namespace brume::io
