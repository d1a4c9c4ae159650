#include "app/inspect_report.hpp"

#include <cstdio>

#include "app/json_text.hpp"
#include "solver/units/constants.hpp"

namespace brume::app {

namespace {

std::string g(double value, int digits = 6) {
  char text[40];
  std::snprintf(text, sizeof text, "%.*g", digits, value);
  return text;
}

std::string padded(const std::string& text, std::size_t width) {
  return text.size() >= width ? text + " " : text + std::string(width - text.size(), ' ');
}

std::string shape_text(const std::vector<hsize_t>& shape) {
  std::string text = "[";
  for (std::size_t i = 0; i < shape.size(); ++i)
    text += (i == 0 ? "" : ", ") + std::to_string(shape[i]);
  return text + "]";
}

const io::FieldSummary* summary_of(const io::SnapshotIntegrity& integrity,
                                   const std::string& name) {
  for (const io::FieldSummary& s : integrity.fields) {
    if (s.name == name) return &s;
  }
  return nullptr;
}

std::string kind(const io::SnapshotReader& reader) {
  if (reader.run_record()) return "checkpoint (restart with brume run --restart)";
  return reader.header().reason == "numerical failure" ? "diagnostic snapshot of a failed step"
                                                       : "snapshot";
}

// The group /run of a checkpoint, one entry per line.
std::string run_record_lines(const io::RunRecord& record) {
  std::string text = "  run state      group /run\n";
  for (const auto& [name, value] : record.integers())
    text += "    " + padded(name, 22) + std::to_string(value) + "\n";
  for (const auto& [name, value] : record.reals())
    text += "    " + padded(name, 22) + g(value, 17) + "\n";
  for (const auto& [name, values] : record.arrays()) {
    std::string list;
    for (std::size_t n = 0; n < values.size() && n < 8; ++n)
      list += (n == 0 ? "" : ", ") + g(values[n], 9);
    text += "    " + padded(name, 22) + std::to_string(values.size()) + " values: " + list +
            (values.size() > 8 ? ", ..." : "") + "\n";
  }
  return text;
}

std::string precision(const io::SnapshotReader& reader) {
  for (const io::StoredDataset& d : reader.datasets()) {
    if (d.known) return d.type;
  }
  return "float64";
}

std::string field_lines(const io::SnapshotReader& reader, const io::SnapshotIntegrity& integrity) {
  std::string text = "    " + padded("name", 15) + padded("shape", 17) + padded("type", 9) +
                     padded("unit", 14) + padded("to_cgs", 14) + padded("non-finite", 12) +
                     padded("min", 14) + padded("max", 14) + "storage\n";
  for (const io::StoredDataset& d : reader.datasets()) {
    const io::FieldSummary* s = summary_of(integrity, d.name);
    text += "    " + padded(d.name, 15) + padded(shape_text(d.shape), 17) + padded(d.type, 9) +
            padded(d.unit.empty() ? "-" : d.unit, 14) +
            padded(d.to_cgs == 0.0 ? "-" : g(d.to_cgs), 14);
    if (s != nullptr) {
      text += padded(std::to_string(s->non_finite), 12) + padded(g(s->min), 14) +
              padded(g(s->max), 14) + d.storage + "\n";
    } else {
      text += "(not one of brume's fields: not checked)\n";
    }
  }
  return text;
}

}  // namespace

std::vector<std::string> integrity_problems(const io::SnapshotIntegrity& integrity) {
  std::vector<std::string> problems;
  for (const io::FieldSummary& s : integrity.fields) {
    if (s.non_finite > 0) {
      problems.push_back(std::to_string(s.non_finite) + " non-finite value" +
                         (s.non_finite == 1 ? "" : "s") + " in " + s.name);
    }
  }
  if (integrity.magnetic && !(integrity.divergence <= integrity.divergence_limit)) {
    problems.push_back("the face field is not divergence-free: max |div B| dx/|B| = " +
                       g(integrity.divergence, 3) + ", above the round-off limit " +
                       g(integrity.divergence_limit, 3));
  }
  return problems;
}

std::string inspect_text(const io::SnapshotReader& reader, const io::SnapshotIntegrity& integrity,
                         bool with_configuration) {
  const io::SnapshotHeader& h = reader.header();
  const double seconds = h.time * h.time_to_cgs;
  std::string text = reader.file().string() + "\n";
  text += "  kind           " + kind(reader) + "\n";
  text += "  format         " + h.format + "\n";
  text += "  reason         " + h.reason + "\n";
  text += "  time           " + g(h.time, 9) + " code units = " + g(seconds) +
          " s = " + g(seconds / units::cgs::megayear) + " Myr\n";
  text += "  step           " + std::to_string(h.step) + "\n";
  text += "  cells          " + std::to_string(h.cells[0]) + " × " + std::to_string(h.cells[1]) +
          " × " + std::to_string(h.cells[2]) + " (x × y × z; datasets are [z][y][x])\n";
  text += "  box            lower (" + g(h.lower[0]) + ", " + g(h.lower[1]) + ", " + g(h.lower[2]) +
          "), size (" + g(h.size[0]) + ", " + g(h.size[1]) + ", " + g(h.size[2]) +
          ") code units; code length = " + g(h.length_to_cgs) + " cm\n";
  text += "  gas            " + std::string(reader.magnetic() ? "magnetized" : "hydrodynamic") +
          (reader.isothermal() ? ", isothermal" : ", adiabatic") + "\n";
  text += "  precision      " + precision(reader) + "\n";
  text += "  fields\n" + field_lines(reader, integrity);
  if (reader.run_record()) text += run_record_lines(*reader.run_record());
  text += "  build\n";
  for (const auto& [name, value] : h.build)
    text += "    " + padded(name, 12) + value + "\n";
  std::size_t lines = 0;
  for (const char ch : h.configuration)
    lines += ch == '\n' ? 1 : 0;
  text += "  configuration  " + std::to_string(lines) + " lines of resolved YAML" +
          (with_configuration ? " (below)" : " (print them with --configuration)") + "\n";
  text += "  integrity\n";
  text += "    every field read; shapes match the cells\n";
  text += "    non-finite values  " + std::to_string(integrity.non_finite) + "\n";
  if (integrity.magnetic) {
    text += "    max |div B| dx/|B| " + g(integrity.divergence, 3) + " (round-off limit " +
            g(integrity.divergence_limit, 3) + " for " + precision(reader) + ")\n";
  }
  const std::vector<std::string> problems = integrity_problems(integrity);
  text += "  verdict        " + std::string(problems.empty() ? "sound" : "NOT SOUND") + "\n";
  for (const std::string& p : problems)
    text += "    " + p + "\n";
  if (with_configuration) {
    text += "\n# resolved configuration stored in " + reader.file().filename().string() + "\n";
    text += h.configuration;
    if (!h.configuration.empty() && h.configuration.back() != '\n') text += "\n";
  }
  return text;
}

std::string inspect_json(const io::SnapshotReader& reader, const io::SnapshotIntegrity& integrity) {
  const io::SnapshotHeader& h = reader.header();
  auto triple = [](const auto& v) {
    return "[" + json_number(double(v[0])) + ", " + json_number(double(v[1])) + ", " +
           json_number(double(v[2])) + "]";
  };
  std::string j = "{\n";
  j += "  \"file\": " + json_string(reader.file().string()) + ",\n";
  j += "  \"kind\": " + json_string(kind(reader)) + ",\n";
  j += "  \"format\": " + json_string(h.format) + ",\n";
  j += "  \"reason\": " + json_string(h.reason) + ",\n";
  j += "  \"time\": " + json_number(h.time) + ",\n";
  j += "  \"time_to_cgs\": " + json_number(h.time_to_cgs) + ",\n";
  j += "  \"step\": " + std::to_string(h.step) + ",\n";
  j += "  \"cells\": " + triple(h.cells) + ",\n";
  j += "  \"lower\": " + triple(h.lower) + ",\n";
  j += "  \"size\": " + triple(h.size) + ",\n";
  j += "  \"length_to_cgs\": " + json_number(h.length_to_cgs) + ",\n";
  j += "  \"magnetic\": " + std::string(reader.magnetic() ? "true" : "false") + ",\n";
  j += "  \"isothermal\": " + std::string(reader.isothermal() ? "true" : "false") + ",\n";
  j += "  \"fields\": [";
  for (std::size_t n = 0; n < reader.datasets().size(); ++n) {
    const io::StoredDataset& d = reader.datasets()[n];
    const io::FieldSummary* s = summary_of(integrity, d.name);
    j += std::string(n == 0 ? "\n" : ",\n") + "    {\"name\": " + json_string(d.name) +
         ", \"shape\": [";
    for (std::size_t i = 0; i < d.shape.size(); ++i)
      j += (i == 0 ? "" : ", ") + std::to_string(d.shape[i]);
    j += "], \"type\": " + json_string(d.type) + ", \"unit\": " + json_string(d.unit) +
         ", \"to_cgs\": " + json_number(d.to_cgs) + ", \"storage\": " + json_string(d.storage) +
         ", \"checked\": " + (s != nullptr ? "true" : "false");
    if (s != nullptr) {
      j += ", \"non_finite\": " + std::to_string(s->non_finite) +
           ", \"min\": " + json_number(s->min) + ", \"max\": " + json_number(s->max);
    }
    j += "}";
  }
  j += "\n  ],\n  \"build\": {";
  for (std::size_t n = 0; n < h.build.size(); ++n) {
    j += std::string(n == 0 ? "" : ", ") + json_string(h.build[n].first) + ": " +
         json_string(h.build[n].second);
  }
  j += "},\n";
  j += "  \"configuration\": " + json_string(h.configuration) + ",\n";
  j += "  \"non_finite\": " + std::to_string(integrity.non_finite) + ",\n";
  j += "  \"divergence\": " + (integrity.magnetic ? json_number(integrity.divergence) : "null") +
       ",\n";
  j += "  \"divergence_limit\": " +
       (integrity.magnetic ? json_number(integrity.divergence_limit) : "null") + ",\n";
  const std::vector<std::string> problems = integrity_problems(integrity);
  j += "  \"sound\": " + std::string(problems.empty() ? "true" : "false") + ",\n";
  j += "  \"problems\": [";
  for (std::size_t n = 0; n < problems.size(); ++n)
    j += (n == 0 ? "" : ", ") + json_string(problems[n]);
  return j + "]\n}\n";
}

}  // namespace brume::app
