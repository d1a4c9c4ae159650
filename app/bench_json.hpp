// The parts of `brume bench --json` that the single-rank and the scaling benchmarks share, so that
// both print the same field names: the fields of every case entry and the closing trailer.
#pragma once

#include <string>

#include "app/bench_case.hpp"

namespace brume::app {

// `"physics": …, "reconstruction": …, …, "bytes_per_cell": …` of one entry, without braces.
[[nodiscard]] std::string bench_case_fields(const BenchResult& r);

// What follows the list of cases: where bytes per cell come from, the compiler and its flags,
// and the closing brace of the document.
[[nodiscard]] std::string bench_json_trailer(const std::string& bytes_per_cell_source);

}  // namespace brume::app
