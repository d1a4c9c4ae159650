// Owning handles for HDF5 identifiers, and the few attribute writers brume needs, so that every
// identifier is closed on every path out of a function.
#pragma once

#include <hdf5.h>

#include <string>
#include <utility>

namespace brume::io {

class H5Handle {
 public:
  using Closer = herr_t (*)(hid_t);
  H5Handle(hid_t id, Closer closer) : id_(id), closer_(closer) {}
  H5Handle(const H5Handle&) = delete;
  H5Handle& operator=(const H5Handle&) = delete;
  H5Handle(H5Handle&& other) noexcept
      : id_(std::exchange(other.id_, H5I_INVALID_HID)), closer_(other.closer_) {}
  ~H5Handle() {
    if (id_ >= 0) closer_(id_);
  }
  [[nodiscard]] hid_t get() const { return id_; }
  [[nodiscard]] bool valid() const { return id_ >= 0; }
  // Closes now and reports whether HDF5 succeeded (a failed close of a file means lost data).
  bool close() {
    const herr_t status = id_ >= 0 ? closer_(id_) : 0;
    id_ = H5I_INVALID_HID;
    return status >= 0;
  }

 private:
  hid_t id_;
  Closer closer_;
};

// Throws std::runtime_error naming `what` when an HDF5 call failed.
hid_t checked(hid_t id, const std::string& what);
void checked_status(herr_t status, const std::string& what);

void write_attribute(hid_t object, const std::string& name, double value);
void write_attribute(hid_t object, const std::string& name, long long value);
void write_attribute(hid_t object, const std::string& name, const std::string& value);
void write_attribute(hid_t object, const std::string& name, const double* values, hsize_t count);
void write_attribute(hid_t object, const std::string& name, const long long* values, hsize_t count);

}  // namespace brume::io
