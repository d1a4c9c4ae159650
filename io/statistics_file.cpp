#include "io/statistics_file.hpp"

#include <unistd.h>

#include <cstdio>
#include <stdexcept>

#include "io/atomic_file.hpp"
#include "io/hdf5_handles.hpp"
#include "io/provenance.hpp"

namespace brume::io {

namespace {

H5Handle create_group(hid_t parent, const std::string& name) {
  return H5Handle(checked(H5Gcreate2(parent, name.c_str(), H5P_DEFAULT, H5P_DEFAULT, H5P_DEFAULT),
                          "creating group " + name),
                  H5Gclose);
}

void describe(hid_t dataset, const std::string& unit, double to_cgs,
              const std::string& description) {
  write_attribute(dataset, "unit", unit);
  write_attribute(dataset, "to_cgs", to_cgs);
  write_attribute(dataset, "description", description);
}

void write_number(hid_t group, const MeasuredNumber& n) {
  H5Handle space(checked(H5Screate(H5S_SCALAR), "scalar dataspace"), H5Sclose);
  H5Handle dataset(checked(H5Dcreate2(group, n.name.c_str(), H5T_IEEE_F64LE, space.get(),
                                      H5P_DEFAULT, H5P_DEFAULT, H5P_DEFAULT),
                           "creating dataset " + n.name),
                   H5Dclose);
  checked_status(
      H5Dwrite(dataset.get(), H5T_NATIVE_DOUBLE, H5S_ALL, H5S_ALL, H5P_DEFAULT, &n.value),
      "writing dataset " + n.name);
  describe(dataset.get(), n.unit, n.to_cgs, n.description);
}

void write_measurement(hid_t root, const Measurement& m) {
  const H5Handle group = create_group(root, m.name);
  write_attribute(group.get(), "description", m.description);
  for (const auto& [key, text] : m.notes)
    write_attribute(group.get(), key, text);
  std::string warnings;
  for (const std::string& w : m.warnings)
    warnings += (warnings.empty() ? "" : "\n") + w;
  write_attribute(group.get(), "warnings", warnings);
  for (const MeasuredArray& a : m.arrays)
    write_measured_array(group.get(), a);
  for (const MeasuredNumber& n : m.numbers)
    write_number(group.get(), n);
}

void write_file(const std::string& path, const StatisticsHeader& header,
                const std::vector<Measurement>& measurements) {
  H5Handle file(
      checked(H5Fcreate(path.c_str(), H5F_ACC_EXCL, H5P_DEFAULT, H5P_DEFAULT), "creating " + path),
      H5Fclose);
  const hid_t root = file.get();
  write_attribute(root, "format", std::string(statistics_format));
  write_attribute(root, "time", header.time);
  write_attribute(root, "time_to_cgs", header.time_to_cgs);
  write_attribute(root, "step", static_cast<long long>(header.step));
  write_attribute(root, "source", header.source);
  write_attribute(root, "configuration", header.configuration);
  {
    const H5Handle build = create_group(root, "build");
    for (const auto& [name, value] : provenance())
      write_attribute(build.get(), name, value);
  }
  for (const Measurement& m : measurements)
    write_measurement(root, m);
  if (!file.close()) throw std::runtime_error("HDF5: closing " + path + " failed");
}

}  // namespace

void write_measured_array(hid_t group, const MeasuredArray& a) {
  std::vector<hsize_t> shape(a.shape.begin(), a.shape.end());
  std::size_t size = 1;
  for (const std::size_t n : a.shape)
    size *= n;
  if (size != a.values.size()) {
    throw std::runtime_error("measurement array " + a.name + " holds " +
                             std::to_string(a.values.size()) + " values for a shape of " +
                             std::to_string(size));
  }
  H5Handle space(
      checked(H5Screate_simple(int(shape.size()), shape.data(), nullptr), "dataspace of " + a.name),
      H5Sclose);
  H5Handle dataset(checked(H5Dcreate2(group, a.name.c_str(), H5T_IEEE_F64LE, space.get(),
                                      H5P_DEFAULT, H5P_DEFAULT, H5P_DEFAULT),
                           "creating dataset " + a.name),
                   H5Dclose);
  if (size > 0) {
    checked_status(
        H5Dwrite(dataset.get(), H5T_NATIVE_DOUBLE, H5S_ALL, H5S_ALL, H5P_DEFAULT, a.values.data()),
        "writing dataset " + a.name);
  }
  describe(dataset.get(), a.unit, a.to_cgs, a.description);
}

void write_statistics(const std::filesystem::path& file, const StatisticsHeader& header,
                      const std::vector<Measurement>& measurements) {
  if (std::filesystem::exists(file)) {
    throw std::runtime_error("cannot write " + file.string() +
                             ": the file exists (brume never replaces an output)");
  }
  H5Eset_auto2(H5E_DEFAULT, nullptr, nullptr);  // errors are reported by exceptions, not printed
  const std::string temporary =
      file.string() + ".partial-" + std::to_string(static_cast<long>(::getpid()));
  try {
    write_file(temporary, header, measurements);
    if (!flush_to_disk(temporary)) throw std::runtime_error("flushing " + temporary + " failed");
    // link() fails if the final name appeared meanwhile, where rename() would replace it.
    if (::link(temporary.c_str(), file.c_str()) != 0)
      throw std::runtime_error("publishing " + file.string() + " failed");
    std::remove(temporary.c_str());
  } catch (const std::exception& error) {
    std::remove(temporary.c_str());
    throw std::runtime_error("cannot write " + file.string() + ": " + error.what());
  }
}

}  // namespace brume::io
