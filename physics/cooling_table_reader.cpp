#include "physics/cooling_table_reader.hpp"

#include <cerrno>
#include <cmath>
#include <cstdlib>
#include <fstream>
#include <vector>

#include "io/config/error.hpp"

namespace brume::physics {

namespace {

// The words of a line before its comment.
std::vector<std::string> words(const std::string& line) {
  std::vector<std::string> out;
  std::string word;
  for (const char c : line.substr(0, line.find('#'))) {
    if (c == ' ' || c == '\t' || c == '\r' || c == ',') {
      if (!word.empty()) out.push_back(word);
      word.clear();
    } else {
      word += c;
    }
  }
  if (!word.empty()) out.push_back(word);
  return out;
}

// The whole word as a finite number, or NaN.
double number(const std::string& word) {
  errno = 0;
  char* end = nullptr;
  const double value = std::strtod(word.c_str(), &end);
  if (end != word.c_str() + word.size() || errno == ERANGE || !std::isfinite(value)) {
    return std::nan("");
  }
  return value;
}

}  // namespace

CoolingTable read_cooling_table(const std::string& path, const std::string& key_path) {
  std::ifstream in(path);
  if (!in) {
    throw config::Error(path, 0, 0, key_path, "cannot open the cooling table for reading");
  }
  const std::string expected =
      "expected two positive numbers: a temperature in K and the cooling function in "
      "erg cm^3 s^-1";
  std::vector<double> temperature;
  std::vector<double> lambda;
  std::string line;
  int line_number = 0;
  while (std::getline(in, line)) {
    ++line_number;
    const std::vector<std::string> w = words(line);
    if (w.empty()) continue;
    if (w.size() != 2) {
      throw config::Error(path, line_number, 0, key_path,
                          "found " + std::to_string(w.size()) + " columns; " + expected);
    }
    const double t = number(w[0]);
    const double l = number(w[1]);
    if (!(t > 0.0) || !(l > 0.0)) {
      throw config::Error(path, line_number, 0, key_path,
                          "found '" + w[0] + " " + w[1] + "'; " + expected);
    }
    if (!temperature.empty() && !(t > temperature.back())) {
      throw config::Error(path, line_number, 0, key_path,
                          "temperature " + w[0] +
                              " K does not exceed the previous row's; temperatures must be "
                              "strictly increasing");
    }
    temperature.push_back(t);
    lambda.push_back(l);
  }
  if (temperature.size() < 2) {
    throw config::Error(path, line_number, 0, key_path,
                        "found " + std::to_string(temperature.size()) +
                            " data rows; a cooling table needs at least two");
  }
  return CoolingTable(temperature, lambda);
}

}  // namespace brume::physics
