#include "io/provenance.hpp"

#include <fftw3.h>
#include <hdf5.h>
#include <mpi.h>
#include <yaml-cpp/yaml.h>

#include <Eigen/Core>

#include "brume/provenance.hpp"

namespace brume::io {

namespace {

std::string hdf5_runtime_version() {
  unsigned major = 0, minor = 0, release = 0;
  H5get_libversion(&major, &minor, &release);
  return std::to_string(major) + "." + std::to_string(minor) + "." + std::to_string(release);
}

std::string mpi_library_version() {
  char text[MPI_MAX_LIBRARY_VERSION_STRING];
  int length = 0;
  MPI_Get_library_version(text, &length);
  std::string version(text, static_cast<std::size_t>(length));
  const auto end = version.find_first_of(",\n");
  return end == std::string::npos ? version : version.substr(0, end);
}

}  // namespace

std::vector<std::pair<std::string, std::string>> provenance() {
  return {
      {"version", build::version},
      {"commit", build::commit},
      {"compiler", build::compiler},
      {"build_type", build::build_type},
      {"flags", build::flags},
      {"mpi", mpi_library_version() + " (MPI " + build::mpi_standard + ")"},
      {"hdf5", hdf5_runtime_version() + " (parallel)"},
      {"fftw", fftw_version},
      {"yaml-cpp", build::yaml_cpp_version},
      {"eigen", std::to_string(EIGEN_WORLD_VERSION) + "." + std::to_string(EIGEN_MAJOR_VERSION) +
                    "." + std::to_string(EIGEN_MINOR_VERSION)},
  };
}

}  // namespace brume::io
