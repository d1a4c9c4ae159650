// Reading the attributes of an HDF5 object with their kind and count checked. The messages name
// the attribute and what was expected, but not the file: callers add that.
#pragma once

#include <hdf5.h>

#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

namespace brume::io {

class AttributeError : public std::runtime_error {
 public:
  using std::runtime_error::runtime_error;
};

[[nodiscard]] bool has_attribute(hid_t object, const std::string& name);

// Each throws AttributeError when the attribute is missing, of another kind or of another count.
[[nodiscard]] double read_real_attribute(hid_t object, const std::string& name);
[[nodiscard]] long long read_integer_attribute(hid_t object, const std::string& name);
[[nodiscard]] std::string read_text_attribute(hid_t object, const std::string& name);
[[nodiscard]] std::vector<double> read_real_attributes(hid_t object, const std::string& name,
                                                       hsize_t count);
[[nodiscard]] std::vector<long long> read_integer_attributes(hid_t object, const std::string& name,
                                                             hsize_t count);

// Every text attribute of `object` as (name, value), in name order; other kinds are skipped.
[[nodiscard]] std::vector<std::pair<std::string, std::string>> text_attributes(hid_t object);

}  // namespace brume::io
