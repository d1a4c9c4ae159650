// brume bench: cell-updates per second per core and bytes per cell of the main schemes on one
// rank; `brume bench scaling` measures them over rank counts (bench_scaling.hpp).
#include <cstdio>
#include <string>
#include <vector>

#include "app/bench_case.hpp"
#include "app/bench_json.hpp"
#include "app/bench_options.hpp"
#include "app/bench_scaling.hpp"
#include "app/commands.hpp"
#include "app/user_error.hpp"

namespace brume::app {
namespace {

std::vector<BenchCase> bench_cases(const CommandLine& line) {
  std::vector<int> sizes = {64, 128};
  if (line.cells) sizes = {positive_count(line.cells, "--cells", 64)};
  const struct {
    const char *physics, *reconstruction, *riemann;
  } schemes[] = {{"mhd", "plm", "hlld"}, {"mhd", "ppm", "hlld"}, {"hydro", "plm", "hllc"}};
  std::vector<BenchCase> cases;
  for (const int n : sizes) {
    if (n < 4) throw UserError("command line: --cells expects at least 4 (a 4³ box)");
    const int steps = positive_count(line.steps, "--steps", default_steps(n));
    for (const auto& s : schemes)
      cases.push_back({s.physics, s.reconstruction, s.riemann, n, steps});
  }
  return cases;
}

void print_json(const std::vector<BenchResult>& results) {
  std::printf("{\"cases\": [");
  for (std::size_t n = 0; n < results.size(); ++n) {
    std::printf("%s\n  {%s}", n == 0 ? "" : ",", bench_case_fields(results[n]).c_str());
  }
  std::fputs(bench_json_trailer("allocated arrays (state and integrator)").c_str(), stdout);
}

void print_table(const BenchResult& r) {
  std::printf("%-6s %-4s %-5s %5d³ %5d  %6d  %10.3f  %10.3f  %9.1f\n", r.setup.physics.c_str(),
              r.setup.reconstruction.c_str(), r.setup.riemann.c_str(), r.setup.cells, r.ranks,
              r.setup.steps, 1e-6 * r.cell_updates_per_second_per_core,
              1e-6 * r.best_cell_updates_per_second_per_core, r.bytes_per_cell);
  std::fflush(stdout);
}

}  // namespace

int bench_command(const CommandLine& line, const io::Log& log) {
  if (line.positional.size() == 1 && line.positional.front() == "scaling") {
    return scaling_bench(line, log);
  }
  if (!line.positional.empty()) {
    throw UserError("command line: brume bench takes no argument or the word 'scaling', found '" +
                    line.positional.front() + "' (brume bench [scaling] [--json] [--cells N] " +
                    "[--steps N])");
  }
  const std::vector<BenchCase> cases = bench_cases(line);
  const bool table = !line.json && log.speaks();
  if (table) {
    std::printf("3D periodic box, smooth flow, VL2 + CT, CFL 0.4; one warm-up step not timed\n");
    std::printf("%-6s %-4s %-5s %6s %5s  %6s  %10s  %10s  %9s\n", "physics", "rec", "flux", "cells",
                "ranks", "steps", "M upd/s/c", "best step", "B/cell");
  }
  std::vector<BenchResult> results;
  for (const BenchCase& c : cases) {
    results.push_back(run_bench_case(c));
    if (table) print_table(results.back());
  }
  if (table) {
    std::printf(
        "M upd/s/c: million cell-updates per second per core over all timed steps "
        "(time-step limit + step);\nbest step: the same for the fastest step; "
        "B/cell: bytes of all allocated arrays per interior cell\n");
  }
  if (line.json && log.speaks()) print_json(results);
  return 0;
}

}  // namespace brume::app
