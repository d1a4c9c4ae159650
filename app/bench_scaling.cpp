#include "app/bench_scaling.hpp"

#include <mpi.h>

#include <cstdio>
#include <memory>
#include <vector>

#include "app/bench_options.hpp"
#include "app/bench_scaling_plan.hpp"
#include "app/bench_scaling_report.hpp"
#include "app/leading_ranks.hpp"
#include "app/quiet_barrier.hpp"
#include "app/user_error.hpp"

namespace brume::app {

namespace {

ScalingSizes scaling_sizes(const CommandLine& line) {
  ScalingSizes sizes;
  if (line.cells) {
    const int n = positive_count(line.cells, "--cells", 64);
    if (n < 4) throw UserError("command line: --cells expects at least 4 (a 4³ box)");
    sizes.strong_boxes = {n};
    sizes.weak_block = n;
  }
  sizes.steps = positive_count(line.steps, "--steps", 0);
  return sizes;
}

}  // namespace

int scaling_bench(const CommandLine& line, const io::Log& log) {
  int world = 1, rank = 0;
  MPI_Comm_size(MPI_COMM_WORLD, &world);
  MPI_Comm_rank(MPI_COMM_WORLD, &rank);
  // Every rank checks the same options and the same plan: a user error stops all of them.
  const std::vector<ScalingCase> plan = scaling_plan(scaling_sizes(line), world);
  std::vector<std::unique_ptr<LeadingRanks>> groups;  // groups[m]: the first 2^m ranks
  for (const int n : scaling_rank_counts(world))
    groups.push_back(std::make_unique<LeadingRanks>(MPI_COMM_WORLD, n));

  const bool table = !line.json && log.speaks();
  if (table) print_scaling_header(world);
  std::vector<ScalingEntry> entries;  // on rank 0, a member of every group
  for (const ScalingCase& c : plan) {
    for (const auto& group : groups) {
      if (group->count() != c.ranks || !group->member()) continue;
      ScalingEntry e{c.series, run_decomposed_case(c.work, group->comm())};
      if (rank == 0) entries.push_back(e);
    }
    quiet_barrier(MPI_COMM_WORLD);
    if (table) {
      set_efficiencies(entries);
      print_scaling_row(entries.back());
    }
  }
  if (table) {
    print_scaling_legend();
    if (world == 1) std::printf("one rank only: run it as mpiexec -n N brume bench scaling\n");
  }
  if (line.json && log.speaks()) {
    set_efficiencies(entries);
    print_scaling_json(entries);
  }
  return 0;
}

}  // namespace brume::app
