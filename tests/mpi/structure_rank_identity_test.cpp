// The structure functions of a random box are bitwise the same on 1, 2, 3 and 4 ranks in several
// decompositions, including ones that split the lines of a line group unevenly, and every rank
// gets the whole result (DESIGN.md §4: line sums in line order, exact sums across lines).
// Tolerance: none (every bit, NaN included).
#include <gtest/gtest.h>

#include <bit>
#include <cstdint>
#include <string>
#include <vector>

#include "physics/structure_functions.hpp"
#include "tests/mpi/sub_communicator.hpp"
#include "tests/support/structure_synthetic_cells.hpp"

namespace brume::mpi_testing {
namespace {

using testing::hashed_uniform;
using testing::SyntheticCell;

SyntheticCell random_cell(long i, long j, long k) {
  SyntheticCell c;
  c.density = 1.0 + 0.9 * hashed_uniform(i, j, k, 11);
  c.velocity = {hashed_uniform(i, j, k, 12), 3.0 * hashed_uniform(i, j, k, 13),
                0.1 * hashed_uniform(i, j, k, 14)};
  c.temperature = 1000.0 * (1.0 + hashed_uniform(i, j, k, 15));  // 15 % below 300 K
  return c;
}

physics::StructureSettings settings() {
  physics::StructureSettings s;
  s.lag_set = physics::StructureLagSet::every_cell;
  s.cold_temperature = 300.0;
  s.fit_lowest_lag = 1;
  s.fit_highest_lag = 8;
  s.minimum_cold_pairs = 1;
  return s;
}

io::Measurement measured(const std::array<long, 3>& box, const std::array<int, 3>& layout, int rank,
                         MPI_Comm comm) {
  const physics::CellQuantities q =
      testing::synthetic_block(box, layout, testing::block_coords(rank, layout), 0.25, random_cell);
  physics::RunContext context;
  context.box_cells = box;
  context.comm = comm;
  return physics::StructureFunctions(settings()).measure(q, context);
}

// "" when every array and number has the same bits, else the first difference.
std::string first_difference(const io::Measurement& a, const io::Measurement& b) {
  if (a.arrays.size() != b.arrays.size()) return "array count";
  for (std::size_t i = 0; i < a.arrays.size(); ++i) {
    const auto& x = a.arrays[i].values;
    const auto& y = b.arrays[i].values;
    if (x.size() != y.size()) return a.arrays[i].name + ": size";
    for (std::size_t v = 0; v < x.size(); ++v) {
      if (std::bit_cast<std::uint64_t>(x[v]) != std::bit_cast<std::uint64_t>(y[v])) {
        return a.arrays[i].name + "[" + std::to_string(v) + "]";
      }
    }
  }
  if (a.numbers.size() != b.numbers.size()) return "number count";
  for (std::size_t i = 0; i < a.numbers.size(); ++i) {
    if (std::bit_cast<std::uint64_t>(a.numbers[i].value) !=
        std::bit_cast<std::uint64_t>(b.numbers[i].value)) {
      return a.numbers[i].name;
    }
  }
  return "";
}

void expect_identical(const std::array<long, 3>& box,
                      const std::vector<std::pair<int, std::array<int, 3>>>& layouts) {
  const io::Measurement reference = measured(box, {1, 1, 1}, 0, MPI_COMM_SELF);
  ASSERT_GT(reference.arrays.size(), 10u);
  for (const auto& [ranks, layout] : layouts) {
    if (ranks > world_size()) continue;
    const SubCommunicator sub(ranks);
    if (!sub.member()) continue;
    int rank = 0;
    MPI_Comm_rank(sub.comm(), &rank);
    const io::Measurement run = measured(box, layout, rank, sub.comm());
    EXPECT_EQ(first_difference(reference, run), "")
        << layout[0] << " x " << layout[1] << " x " << layout[2] << " blocks, rank " << rank;
  }
}

TEST(MpiStructureIdentity, SameBitsOnOneTwoAndFourRanks) {
  // Box 12 × 9 × 6: 2 × 1 × 2 and 4 × 1 × 1 share 27 and 54 lines unevenly over 2 and 4 ranks.
  expect_identical(
      {12, 9, 6}, {{2, {2, 1, 1}}, {3, {1, 3, 1}}, {2, {1, 1, 2}}, {4, {2, 1, 2}}, {4, {4, 1, 1}}});
}

TEST(MpiStructureIdentity, SameBitsForACubeOfSixteen) {
  expect_identical({16, 16, 16}, {{2, {1, 2, 1}}, {4, {2, 2, 1}}, {4, {1, 2, 2}}, {4, {1, 1, 4}}});
}

}  // namespace
}  // namespace brume::mpi_testing
