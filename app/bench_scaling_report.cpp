#include "app/bench_scaling_report.hpp"

#include <cstdio>
#include <string>

#include "app/bench_json.hpp"

namespace brume::app {

namespace {

template <class T>
std::string joined(const std::array<T, 3>& v, const char* between) {
  return std::to_string(v[0]) + between + std::to_string(v[1]) + between + std::to_string(v[2]);
}

}  // namespace

double halo_share(const DecomposedResult& r) {
  const double step = r.step.seconds / double(r.step.setup.steps);
  return r.halo_seconds_per_step / step;
}

void print_scaling_header(int world_ranks) {
  std::printf(
      "3D periodic box, smooth flow, VL2 + CT, CFL 0.4, as brume run steps it; %d rank%s in the "
      "job, ranks beyond a case's count wait\n",
      world_ranks, world_ranks == 1 ? "" : "s");
  std::printf("%-6s %-5s %-3s %-4s %12s %7s %11s %5s %9s %9s %5s %5s %8s %6s %8s %6s\n", "series",
              "phys", "rec", "flux", "box", "layout", "block", "steps", "M upd/s/c", "best step",
              "eff", "best", "halo ms", "halo%", "reduce", "B/cell");
}

void print_scaling_row(const ScalingEntry& e) {
  const DecomposedResult& r = e.result;
  const BenchResult& s = r.step;
  std::printf(
      "%-6s %-5s %-3s %-4s %12s %7s %11s %5d %9.3f %9.3f %5.2f %5.2f %8.3f %6.1f %8.1f %6.0f%s\n",
      e.series.c_str(), s.setup.physics.c_str(), s.setup.reconstruction.c_str(),
      s.setup.riemann.c_str(), joined(r.box_cells, "x").c_str(),
      joined(r.ranks_per_axis, "x").c_str(), joined(r.block_cells, "x").c_str(), s.setup.steps,
      1e-6 * s.cell_updates_per_second_per_core, 1e-6 * s.best_cell_updates_per_second_per_core,
      e.efficiency, e.best_step_efficiency, 1e3 * r.halo_seconds_per_step, 100.0 * halo_share(r),
      1e6 * r.reduction_seconds_per_step, s.bytes_per_cell,
      r.oversubscribed ? "  oversubscribed" : "");
  std::fflush(stdout);
}

void print_scaling_legend() {
  std::printf(
      "M upd/s/c: million cell-updates per second per core (box cells × steps / (wall time × "
      "ranks); a step lasts as long as its slowest rank); best step: the same for the fastest "
      "step\neff: per-core rate over the 1-rank per-core rate of the same series (best: of the "
      "fastest steps)\nhalo ms: the halo exchange of one step timed alone (2 ghost fills + 2 "
      "flag exchanges), slowest rank; halo%%: its share of the mean step\nreduce: the global "
      "reductions of one step timed alone, microseconds; B/cell: allocated bytes per cell of "
      "one block, halo buffers included\n");
}

void print_scaling_json(const std::vector<ScalingEntry>& entries) {
  std::printf("{\"cases\": [");
  for (std::size_t n = 0; n < entries.size(); ++n) {
    const ScalingEntry& e = entries[n];
    const DecomposedResult& r = e.result;
    std::printf(
        "%s\n  {%s, \"scaling\": \"%s\", \"box_cells\": [%s], \"block_cells\": [%s], "
        "\"ranks_per_axis\": [%s], \"efficiency\": %.6g, \"best_step_efficiency\": %.6g, "
        "\"halo_seconds_per_step\": %.6g, \"halo_share\": %.6g, \"halo_messages_per_step\": %d, "
        "\"halo_bytes_per_step\": %lld, \"reduction_seconds_per_step\": %.6g, "
        "\"oversubscribed\": %s}",
        n == 0 ? "" : ",", bench_case_fields(r.step).c_str(), e.series.c_str(),
        joined(r.box_cells, ", ").c_str(), joined(r.block_cells, ", ").c_str(),
        joined(r.ranks_per_axis, ", ").c_str(), e.efficiency, e.best_step_efficiency,
        r.halo_seconds_per_step, halo_share(r), r.halo_messages_per_step, r.halo_bytes_per_step,
        r.reduction_seconds_per_step, r.oversubscribed ? "true" : "false");
  }
  std::fputs(bench_json_trailer("allocated arrays (state, integrator and halo buffers) per cell of "
                                "one block")
                 .c_str(),
             stdout);
}

}  // namespace brume::app
