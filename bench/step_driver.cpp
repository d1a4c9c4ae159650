// One `brume bench` case from the command line, for profiles:
//   valgrind --tool=callgrind brume_step_driver mhd plm hlld 32 2
#include <cstdio>
#include <string>

#include "app/bench_case.hpp"

int main(int argc, char** argv) {
  if (argc != 6) {
    std::fprintf(stderr, "usage: brume_step_driver PHYSICS RECONSTRUCTION RIEMANN CELLS STEPS\n");
    return 2;
  }
  brume::app::BenchCase c{argv[1], argv[2], argv[3], std::stoi(argv[4]), std::stoi(argv[5])};
  const brume::app::BenchResult r = brume::app::run_bench_case(c);
  std::printf("%s %s %s %d^3: %.4g cell-updates/s, %.1f B/cell\n", argv[1], argv[2], argv[3],
              c.cells, r.cell_updates_per_second_per_core, r.bytes_per_cell);
  return 0;
}
