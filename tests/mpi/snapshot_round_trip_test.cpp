// Snapshots in parallel: a box written compressed (chunked, shuffle + deflate, collective) by 1, 2
// or 4 ranks reads back exactly on 4 ranks in another layout, every block with its lower and upper
// faces; and a read failure on some ranks stops all of them with the lowest failing rank's
// message. Values are made from the global index, so any misplaced block shows. Common practice,
// no source.
#include <gtest/gtest.h>

#include <filesystem>
#include <string>

#include "io/first_failure.hpp"
#include "io/snapshot.hpp"
#include "io/snapshot_layout.hpp"
#include "io/snapshot_reader.hpp"
#include "solver/decomposition.hpp"
#include "tests/mpi/sub_communicator.hpp"

namespace brume::mpi_testing {
namespace {

namespace fs = std::filesystem;

const std::array<long, 3> box_cells{8, 8, 8};

double value_of(std::size_t field, long i, long j, long k) {
  return 1000.0 * double(field) + double(i) + 10.0 * double(j) + 100.0 * double(k) + 0.5;
}

// Visits every interior cell of the block, and for a face array every face of those cells
// (lower and upper), with its storage index and global position.
template <class Visit>
void for_each_value(const solver::BlockGeometry& g, int normal, Visit&& visit) {
  std::array<int, 3> n = g.cells;
  if (normal >= 0 && g.active(normal)) n[normal] += 1;
  for (int k = 0; k < n[2]; ++k)
    for (int j = 0; j < n[1]; ++j)
      for (int i = 0; i < n[0]; ++i)
        visit(g.index(i, j, k), g.offset[0] + i, g.offset[1] + j, g.offset[2] + k);
}

solver::BlockGeometry block_of(MPI_Comm comm, const std::array<int, 3>& layout) {
  const solver::Decomposition decomposition(comm, box_cells, layout, {true, true, true}, 2);
  return decomposition.block(solver::whole_box_geometry({8, 8, 8}, {0, 0, 0}, {1, 1, 1}, 2));
}

void write_known(const fs::path& file, int ranks, const std::array<int, 3>& layout) {
  SubCommunicator sub(ranks);
  if (!sub.member()) return;
  solver::State s = solver::make_state(block_of(sub.comm(), layout), true, false);
  const auto& all = io::all_snapshot_fields();
  for (std::size_t q = 0; q < all.size(); ++q) {
    std::vector<double>& v = io::field_storage(s, all[q]);
    for_each_value(s.geometry, all[q].staggered_axis(),
                   [&](std::ptrdiff_t c, long i, long j, long k) { v[c] = value_of(q, i, j, k); });
  }
  io::SnapshotInfo info;
  info.global_cells = box_cells;
  info.size = {1, 1, 1};
  info.reason = "test";
  info.deflate_level = 2;
  io::write_snapshot(file, s, info, sub.comm());
}

// Mismatched values of this rank's block, read on every rank of MPI_COMM_WORLD in `layout`.
long mismatches_read_back(const fs::path& file, const std::array<int, 3>& layout) {
  const io::SnapshotReader reader(file, MPI_COMM_WORLD);
  solver::State s = solver::make_state(block_of(MPI_COMM_WORLD, layout), true, false);
  reader.read_block(s);
  long wrong = 0;
  const auto& all = io::all_snapshot_fields();
  for (std::size_t q = 0; q < all.size(); ++q) {
    const std::vector<double>& v = io::field_storage(s, all[q]);
    for_each_value(s.geometry, all[q].staggered_axis(),
                   [&](std::ptrdiff_t c, long i, long j, long k) {
                     wrong += v[c] != value_of(q, i, j, k) ? 1 : 0;
                   });
  }
  return wrong;
}

fs::path shared_folder() {
  const fs::path folder = fs::temp_directory_path() / "brume-mpi-snapshot-round-trip";
  if (world_rank() == 0) {
    fs::remove_all(folder);
    fs::create_directories(folder);
  }
  MPI_Barrier(MPI_COMM_WORLD);
  return folder;
}

TEST(MpiSnapshot, CompressedFilesOfAnyRankCountReadBackExactlyInAnotherLayout) {
  const fs::path folder = shared_folder();
  const std::pair<int, std::array<int, 3>> writers[] = {
      {1, {1, 1, 1}}, {2, {2, 1, 1}}, {world_size(), {1, 2, 2}}};
  for (const auto& [ranks, layout] : writers) {
    const fs::path file = folder / ("written-by-" + std::to_string(ranks) + ".h5");
    write_known(file, ranks, layout);
    MPI_Barrier(MPI_COMM_WORLD);
    for (const std::array<int, 3>& read_layout :
         {std::array<int, 3>{1, 1, 4}, std::array<int, 3>{2, 2, 1}}) {
      long wrong = mismatches_read_back(file, read_layout);
      MPI_Allreduce(MPI_IN_PLACE, &wrong, 1, MPI_LONG, MPI_SUM, MPI_COMM_WORLD);
      EXPECT_EQ(wrong, 0) << ranks << " writers, read in " << read_layout[0] << "×"
                          << read_layout[1] << "×" << read_layout[2];
    }
  }
  MPI_Barrier(MPI_COMM_WORLD);
  if (world_rank() == 0) fs::remove_all(folder);
}

TEST(MpiSnapshot, AFailureOnSomeRanksReachesEveryRank) {
  const int rank = world_rank();
  const std::string mine = rank % 2 == 1 ? "failed on rank " + std::to_string(rank) : "";
  EXPECT_EQ(io::first_failure(MPI_COMM_WORLD, mine), "failed on rank 1");
  EXPECT_EQ(io::first_failure(MPI_COMM_WORLD, ""), "");
}

}  // namespace
}  // namespace brume::mpi_testing
