// One HDF5 file of measurements of the box at one time (`statistics-NNNN.h5` in a run folder,
// or what `brume analyze` writes for a snapshot): one group per io::Measurement, one dataset per
// array with its unit, to_cgs and description, the numbers as scalar datasets likewise, the notes
// and warnings as attributes of the group. Written by one rank under a temporary name, flushed,
// then renamed; an existing file is never replaced.
#pragma once

#include <hdf5.h>

#include <filesystem>
#include <string>
#include <vector>

#include "io/measurement.hpp"

namespace brume::io {

inline constexpr const char* statistics_format = "brume-statistics-1";

struct StatisticsHeader {
  double time = 0.0;         // code units
  double time_to_cgs = 1.0;  // s per code time
  long step = 0;
  std::string source;         // the run folder or the snapshot the measurements were made on
  std::string configuration;  // the resolved configuration (YAML) they were made with
};

// Writes `a` as a float64 dataset of its shape under `group`, with the attributes unit, to_cgs and
// description. Throws std::runtime_error for a shape that does not match the values.
void write_measured_array(hid_t group, const MeasuredArray& a);

// Throws std::runtime_error when the file exists or cannot be written (nothing is left behind).
void write_statistics(const std::filesystem::path& file, const StatisticsHeader& header,
                      const std::vector<Measurement>& measurements);

}  // namespace brume::io
