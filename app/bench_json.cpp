#include "app/bench_json.hpp"

#include <cstdio>

#include "app/json_text.hpp"
#include "io/provenance.hpp"

namespace brume::app {

namespace {

std::string provenance_value(const char* name) {
  for (const auto& [key, value] : io::provenance()) {
    if (key == name) return value;
  }
  return "";
}

}  // namespace

std::string bench_case_fields(const BenchResult& r) {
  char text[640];
  std::snprintf(text, sizeof text,
                "\"physics\": \"%s\", \"reconstruction\": \"%s\", \"riemann\": \"%s\", "
                "\"cells\": %ld, \"cells_per_dimension\": %d, \"ranks\": %d, \"steps\": %d, "
                "\"seconds\": %.6g, \"cell_updates_per_second_per_core\": %.6g, "
                "\"best_step_cell_updates_per_second_per_core\": %.6g, \"bytes_per_cell\": %.6g",
                r.setup.physics.c_str(), r.setup.reconstruction.c_str(), r.setup.riemann.c_str(),
                r.interior_cells, r.setup.cells, r.ranks, r.setup.steps, r.seconds,
                r.cell_updates_per_second_per_core, r.best_cell_updates_per_second_per_core,
                r.bytes_per_cell);
  return text;
}

std::string bench_json_trailer(const std::string& bytes_per_cell_source) {
  return "\n ],\n \"bytes_per_cell_source\": " + json_string(bytes_per_cell_source) +
         ",\n \"compiler\": " + json_string(provenance_value("compiler")) +
         ",\n \"flags\": " + json_string(provenance_value("flags")) + "}\n";
}

}  // namespace brume::app
