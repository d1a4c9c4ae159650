// Snapshot write bandwidth: a CELLS³ MHD box (the bench flow) written REPEATS times as brume
// writes its snapshots (collective parallel HDF5, temporary name, fsync, rename), on as many ranks
// as the job has. Prints the bytes of field data per second, mean and best:
//   mpiexec -n 2 brume_snapshot_write_driver 128 5 /tmp/out [float32|deflate]
#include <mpi.h>

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <filesystem>
#include <string>

#include "app/bench_state.hpp"
#include "io/snapshot.hpp"
#include "solver/decomposition.hpp"

namespace {

int measure(int argc, char** argv) {
  if (argc < 4) {
    std::fprintf(stderr,
                 "usage: brume_snapshot_write_driver CELLS REPEATS FOLDER [float32|deflate]\n");
    return 2;
  }
  const long n = std::stol(argv[1]);
  const int repeats = std::stoi(argv[2]);
  const std::filesystem::path folder = argv[3];
  const std::string variant = argc > 4 ? argv[4] : "float64";
  const std::array<long, 3> cells{n, n, n};
  brume::solver::Decomposition decomposition(MPI_COMM_WORLD, cells, {0, 0, 0}, {true, true, true},
                                             2);
  const auto whole = brume::solver::whole_box_geometry({int(n), int(n), int(n)}, {0.0, 0.0, 0.0},
                                                       {1.0, 1.0, 1.0}, 2);
  brume::solver::State state = brume::solver::make_state(decomposition.block(whole), true, false);
  brume::app::set_bench_flow(state, 5.0 / 3.0);
  brume::io::SnapshotInfo info;
  info.global_cells = cells;
  info.size = {1.0, 1.0, 1.0};
  info.reason = "bench";
  info.single_precision = variant == "float32";
  info.deflate_level = variant == "deflate" ? 4 : 0;
  std::filesystem::create_directories(folder);
  const double values = 8.0 * double(n * n * n);  // 5 cell fields + 3 face fields
  const double bytes = values * (info.single_precision ? 4.0 : 8.0);
  double total = 0.0, best = 1e300;
  for (int r = 0; r < repeats; ++r) {
    const auto file = folder / ("write-bench-" + std::to_string(r) + ".h5");
    MPI_Barrier(MPI_COMM_WORLD);
    const auto start = std::chrono::steady_clock::now();
    brume::io::write_snapshot(file, state, info, decomposition.comm());
    const double seconds =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    double slowest = 0.0;
    MPI_Allreduce(&seconds, &slowest, 1, MPI_DOUBLE, MPI_MAX, MPI_COMM_WORLD);
    total += slowest;
    best = std::min(best, slowest);
    if (decomposition.rank() == 0) std::filesystem::remove(file);
  }
  if (decomposition.rank() == 0) {
    std::printf("%ld^3 %s on %d ranks: %.1f MB of field data, mean %.0f MB/s, best %.0f MB/s\n", n,
                variant.c_str(), decomposition.size(), bytes / 1e6, bytes * repeats / total / 1e6,
                bytes / best / 1e6);
  }
  return 0;
}

}  // namespace

int main(int argc, char** argv) {
  MPI_Init(&argc, &argv);
  const int code = measure(argc, argv);  // every MPI object is freed before MPI_Finalize
  MPI_Finalize();
  return code;
}
