// GhostFiller::exchange_flags: every block must end with its own flagged interior cells plus the
// flagged cells of its neighbours in its first ghost layer across each block face, including the
// periodic wrap onto itself and excluding physical box faces, exactly as they lie in the whole box
// (the first-order fallback then corrects both sides of every face alike). Random flags over a
// 12 × 12 × 6 box; common practice, no source.
#include <gtest/gtest.h>

#include <algorithm>
#include <random>
#include <string>
#include <vector>

#include "solver/halo_exchange.hpp"
#include "solver/stage_checks.hpp"
#include "tests/mpi/decomposed_run.hpp"
#include "tests/mpi/sub_communicator.hpp"

namespace brume::mpi_testing {
namespace {

using solver::BoundaryKind;

constexpr int ghost_layers = 2;
const std::array<long, 3> box_cells{12, 12, 6};

// Flags of the whole box, k slowest; about one cell in five.
std::vector<char> random_flags() {
  std::mt19937_64 random(20260317);
  std::bernoulli_distribution flagged(0.2);
  std::vector<char> flags(std::size_t(box_cells[0] * box_cells[1] * box_cells[2]));
  for (char& f : flags)
    f = flagged(random) ? 1 : 0;
  return flags;
}

// What a block of geometry `b` must hold: its flagged interior cells, and the flagged cells one
// layer beyond each face that has a neighbour (periodic or another block), ascending.
std::vector<std::ptrdiff_t> expected_list(const std::vector<char>& flags,
                                          const solver::BlockGeometry& b,
                                          const solver::BoxBoundaries& boundaries) {
  std::vector<std::ptrdiff_t> out;
  for (int k = -1; k <= b.cells[2]; ++k) {
    for (int j = -1; j <= b.cells[1]; ++j) {
      for (int i = -1; i <= b.cells[0]; ++i) {
        const std::array<int, 3> p{i, j, k};
        int outside = 0;
        bool keep = true;
        std::array<long, 3> global{};
        for (int d = 0; d < 3; ++d) {
          const bool beyond = p[d] < 0 || p[d] >= b.cells[d];
          outside += beyond ? 1 : 0;
          global[d] = b.offset[d] + p[d];
          if (global[d] < 0 || global[d] >= box_cells[d]) {
            const BoundaryKind kind = global[d] < 0 ? boundaries.lower[d] : boundaries.upper[d];
            keep = keep && kind == BoundaryKind::periodic;
            global[d] = (global[d] + box_cells[d]) % box_cells[d];
          }
        }
        if (outside > 1 || !keep) continue;  // edges and corners, physical faces
        const std::size_t slot =
            std::size_t(global[0] + box_cells[0] * (global[1] + box_cells[1] * global[2]));
        if (flags[slot] != 0) out.push_back(b.index(i, j, k));
      }
    }
  }
  std::sort(out.begin(), out.end());
  return out;
}

// Blocks whose list differs from the expected one, summed over the ranks (every rank gets it).
long wrong_blocks(int ranks, const std::array<int, 3>& per_axis,
                  const solver::BoxBoundaries& boundaries, bool exchange = true) {
  const std::vector<char> flags = random_flags();
  SubCommunicator sub(ranks);
  if (!sub.member()) return 0;
  std::array<bool, 3> periodic{};
  for (int d = 0; d < 3; ++d)
    periodic[d] = boundaries.lower[d] == BoundaryKind::periodic;
  const solver::Decomposition decomposition(sub.comm(), box_cells, per_axis, periodic,
                                            ghost_layers);
  const solver::BlockGeometry b = decomposition.block(
      solver::whole_box_geometry({int(box_cells[0]), int(box_cells[1]), int(box_cells[2])},
                                 {0, 0, 0}, {1, 1, 0.5}, ghost_layers));
  std::vector<std::ptrdiff_t> list;
  for (int k = 0; k < b.cells[2]; ++k)
    for (int j = 0; j < b.cells[1]; ++j)
      for (int i = 0; i < b.cells[0]; ++i) {
        const std::size_t slot =
            std::size_t((b.offset[0] + i) +
                        box_cells[0] * ((b.offset[1] + j) + box_cells[1] * (b.offset[2] + k)));
        if (flags[slot] != 0) list.push_back(b.index(i, j, k));
      }
  if (exchange) {
    solver::HaloExchange(decomposition, boundaries, b, true, false).exchange_flags(b, list);
  }
  long wrong = list == expected_list(flags, b, boundaries) ? 0 : 1;
  // The single-block box boundaries give the one-rank answer.
  if (ranks == 1 && exchange) {
    std::vector<std::ptrdiff_t> alone;
    for (const std::ptrdiff_t c : list)
      if (solver::is_interior(b, c)) alone.push_back(c);
    solver::BoxGhostFiller(boundaries).exchange_flags(b, alone);
    wrong += alone == list ? 0 : 1;
  }
  long total = 0;
  MPI_Allreduce(&wrong, &total, 1, MPI_LONG, MPI_SUM, sub.comm());
  return total;
}

void expect_flags_as_in_the_box(const solver::BoxBoundaries& boundaries) {
  const std::vector<std::pair<int, std::array<int, 3>>> layouts{
      {1, {1, 1, 1}}, {2, {2, 1, 1}}, {2, {1, 2, 1}}, {2, {1, 1, 2}}, {3, {3, 1, 1}},
      {3, {1, 3, 1}}, {4, {4, 1, 1}}, {4, {2, 2, 1}}, {4, {1, 2, 2}}, {4, {2, 1, 2}}};
  for (const auto& [ranks, per_axis] : layouts) {
    if (ranks > world_size()) continue;
    EXPECT_EQ(wrong_blocks(ranks, per_axis, boundaries), 0) << layout_name(ranks, per_axis);
  }
}

TEST(MpiFlagExchange, PeriodicBoxHasEveryNeighbourFlag) {
  expect_flags_as_in_the_box(solver::BoxBoundaries{});
}

TEST(MpiFlagExchange, PhysicalFacesSendNoFlags) {
  solver::BoxBoundaries boundaries;
  boundaries.lower[0] = BoundaryKind::outflow;
  boundaries.upper[0] = BoundaryKind::outflow;
  boundaries.lower[2] = BoundaryKind::reflecting;
  boundaries.upper[2] = BoundaryKind::reflecting;
  expect_flags_as_in_the_box(boundaries);
}

// The comparison must be able to fail: without the exchange the neighbours' flags are missing.
TEST(MpiFlagExchange, ComparisonSeesMissingFlags) {
  const long wrong = wrong_blocks(world_size() >= 2 ? 2 : 1, {0, 0, 0}, {}, false);
  if (world_rank() == 0) {
    EXPECT_GT(wrong, 0);
  }
}

}  // namespace
}  // namespace brume::mpi_testing
