// What a diagnostic returns: plain named arrays and numbers with units, for io/ to write (HDF5
// statistics files, time-series tables) and for plots to read. Diagnostics never write files.
#pragma once

#include <cstddef>
#include <string>
#include <utility>
#include <vector>

namespace brume::io {

// An n-dimensional array of doubles, C order (last index fastest), with its unit.
struct MeasuredArray {
  std::string name;         // dataset name, lower_snake_case ("density_pdf_volume")
  std::string unit;         // unit of the values as stored ("1" for pure numbers)
  double to_cgs = 1.0;      // factor that turns the stored values into cgs (1 for pure numbers)
  std::string description;  // one line: what the values are
  std::vector<std::size_t> shape;
  std::vector<double> values;  // product of shape entries
};

struct MeasuredNumber {
  std::string name;
  double value = 0.0;
  std::string unit = "1";
  double to_cgs = 1.0;
  std::string description;
};

// One diagnostic's result: a group in a statistics file.
struct Measurement {
  std::string name;         // group name ("spectra", "distributions", ...)
  std::string description;  // one line
  std::vector<MeasuredArray> arrays;
  std::vector<MeasuredNumber> numbers;
  // Text attributes: conventions (the polarization angle's), settings used, and warnings that a
  // result lies outside its validity (they are printed too).
  std::vector<std::pair<std::string, std::string>> notes;
  std::vector<std::string> warnings;
};

// Appends an array and returns it for filling.
inline MeasuredArray& add_array(Measurement& m, std::string name, std::string unit, double to_cgs,
                                std::string description, std::vector<std::size_t> shape) {
  std::size_t size = 1;
  for (const std::size_t n : shape)
    size *= n;
  m.arrays.push_back(MeasuredArray{std::move(name), std::move(unit), to_cgs, std::move(description),
                                   std::move(shape), std::vector<double>(size, 0.0)});
  return m.arrays.back();
}

// Appends a number.
inline void add_number(Measurement& m, std::string name, double value, std::string unit,
                       double to_cgs, std::string description) {
  m.numbers.push_back(
      MeasuredNumber{std::move(name), value, std::move(unit), to_cgs, std::move(description)});
}

}  // namespace brume::io
