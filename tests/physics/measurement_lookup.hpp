// Finding a Measurement's arrays, numbers and notes by name in the diagnostics tests.
#pragma once

#include <gtest/gtest.h>

#include <stdexcept>
#include <string>

#include "io/measurement.hpp"

namespace brume::physics::testing {

inline const io::MeasuredArray& array_named(const io::Measurement& m, const std::string& name) {
  for (const io::MeasuredArray& a : m.arrays) {
    if (a.name == name) return a;
  }
  throw std::out_of_range("no array " + name + " in " + m.name);
}

inline bool has_array(const io::Measurement& m, const std::string& name) {
  for (const io::MeasuredArray& a : m.arrays) {
    if (a.name == name) return true;
  }
  return false;
}

inline double number_named(const io::Measurement& m, const std::string& name) {
  for (const io::MeasuredNumber& n : m.numbers) {
    if (n.name == name) return n.value;
  }
  throw std::out_of_range("no number " + name + " in " + m.name);
}

inline std::string note_named(const io::Measurement& m, const std::string& name) {
  for (const auto& [key, text] : m.notes) {
    if (key == name) return text;
  }
  return "";
}

}  // namespace brume::physics::testing
