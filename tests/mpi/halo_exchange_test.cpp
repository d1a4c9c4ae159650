// The halo exchange must fill every ghost cell and ghost face of every block exactly as the
// single-block box boundaries (BoxGhostFiller) fill the whole box: a random state, scattered over
// 1, 2 or 4 blocks, is compared bit for bit after the fill. Common practice, no source.
#include <gtest/gtest.h>

#include <bit>
#include <cstdint>
#include <random>
#include <string>

#include "solver/halo_exchange.hpp"
#include "tests/mpi/sub_communicator.hpp"

namespace brume::mpi_testing {
namespace {

using solver::BoundaryKind;

constexpr int ghost_layers = 3;
const std::array<long, 3> box_cells{12, 12, 6};

// Every stored array of a state with its staggered axis (−1 for cell arrays).
std::vector<std::pair<std::vector<double>*, int>> arrays(solver::State& s) {
  std::vector<std::pair<std::vector<double>*, int>> out{{&s.density, -1},
                                                        {&s.momentum[0], -1},
                                                        {&s.momentum[1], -1},
                                                        {&s.momentum[2], -1},
                                                        {&s.energy, -1}};
  for (int d = 0; d < 3; ++d)
    out.emplace_back(&s.face_field[d], d);
  return out;
}

// The whole box with random interior cells and faces, then its ghosts filled by the box
// boundaries. On a periodic axis the upper box face is the lower one (one face, stored twice).
solver::State reference_box(const solver::BoxBoundaries& boundaries) {
  const solver::BlockGeometry g =
      solver::whole_box_geometry({int(box_cells[0]), int(box_cells[1]), int(box_cells[2])},
                                 {0, 0, 0}, {1.5, 1, 0.75}, ghost_layers);
  solver::State s = solver::make_state(g, true, false);
  std::mt19937_64 random(20260101);
  std::uniform_real_distribution<double> value(-1.0, 1.0);
  for (auto& [q, normal] : arrays(s)) {
    for (double& x : *q)
      x = value(random);  // ghosts too: the filler must overwrite them
    if (normal < 0 || boundaries.lower[normal] != BoundaryKind::periodic) continue;
    const std::ptrdiff_t shift = std::ptrdiff_t(g.cells[normal]) * g.stride(normal);
    for (int k = -g.ghosts(2); k < g.cells[2] + g.ghosts(2); ++k)
      for (int j = -g.ghosts(1); j < g.cells[1] + g.ghosts(1); ++j)
        for (int i = -g.ghosts(0); i < g.cells[0] + g.ghosts(0); ++i) {
          const std::array<int, 3> p{i, j, k};
          if (p[normal] == 0) (*q)[g.index(i, j, k) + shift] = (*q)[g.index(i, j, k)];
        }
  }
  solver::BoxGhostFiller(boundaries).fill(s);
  return s;
}

// Fills the ghosts of each block of `per_axis` over the first `ranks` ranks and counts the
// slots that differ from the reference in any bit (summed over the blocks, on every rank).
long mismatches(int ranks, const std::array<int, 3>& per_axis,
                const solver::BoxBoundaries& boundaries, std::string& first, bool fill = true) {
  solver::State whole = reference_box(boundaries);
  SubCommunicator sub(ranks);
  if (!sub.member()) return 0;
  std::array<bool, 3> periodic{};
  for (int d = 0; d < 3; ++d)
    periodic[d] = boundaries.lower[d] == BoundaryKind::periodic;
  const solver::Decomposition decomposition(sub.comm(), box_cells, per_axis, periodic,
                                            ghost_layers);
  const solver::BlockGeometry& G = whole.geometry;
  const solver::BlockGeometry b = decomposition.block(G);
  solver::State block = solver::make_state(b, true, false);
  auto whole_arrays = arrays(whole);
  auto block_arrays = arrays(block);
  // Global storage slot of block slot (i, j, k).
  auto global = [&](int i, int j, int k) {
    return G.index(int(i + b.offset[0]), int(j + b.offset[1]), int(k + b.offset[2]));
  };
  // Interior of the block (faces up to n along their normal) from the box; ghosts get garbage.
  for (std::size_t a = 0; a < block_arrays.size(); ++a) {
    std::vector<double>& q = *block_arrays[a].first;
    std::fill(q.begin(), q.end(), -7.0e300);
    const int normal = block_arrays[a].second;
    for (int k = 0; k < b.cells[2] + int(normal == 2); ++k)
      for (int j = 0; j < b.cells[1] + int(normal == 1); ++j)
        for (int i = 0; i < b.cells[0] + int(normal == 0); ++i)
          q[b.index(i, j, k)] = (*whole_arrays[a].first)[global(i, j, k)];
  }
  if (fill) solver::HaloExchange(decomposition, boundaries, b, true, false).fill(block);
  long count = 0;
  const int ng = ghost_layers;
  for (std::size_t a = 0; a < block_arrays.size(); ++a) {
    const int normal = block_arrays[a].second;
    const std::vector<double>& q = *block_arrays[a].first;
    const std::vector<double>& r = *whole_arrays[a].first;
    for (int k = -ng; k < b.cells[2] + ng + int(normal == 2); ++k)
      for (int j = -ng; j < b.cells[1] + ng + int(normal == 1); ++j)
        for (int i = -ng; i < b.cells[0] + ng + int(normal == 0); ++i) {
          const double x = q[b.index(i, j, k)], y = r[global(i, j, k)];
          if (std::bit_cast<std::uint64_t>(x) == std::bit_cast<std::uint64_t>(y)) continue;
          if (count++ == 0) {
            first = "array " + std::to_string(a) + " slot (" + std::to_string(i) + ", " +
                    std::to_string(j) + ", " + std::to_string(k) + ") of the block at " +
                    std::to_string(b.offset[0]) + ", " + std::to_string(b.offset[1]) + ", " +
                    std::to_string(b.offset[2]);
          }
        }
  }
  long total = 0;
  MPI_Allreduce(&count, &total, 1, MPI_LONG, MPI_SUM, sub.comm());
  return total;
}

void expect_same_as_box_boundaries(const solver::BoxBoundaries& boundaries) {
  const std::vector<std::pair<int, std::array<int, 3>>> layouts{
      {1, {1, 1, 1}}, {2, {2, 1, 1}}, {2, {1, 2, 1}}, {2, {1, 1, 2}}, {4, {4, 1, 1}},
      {4, {2, 2, 1}}, {4, {1, 2, 2}}, {4, {2, 1, 2}}, {4, {1, 4, 1}}};
  for (const auto& [ranks, per_axis] : layouts) {
    if (ranks > world_size()) continue;
    std::string first;
    const long count = mismatches(ranks, per_axis, boundaries, first);
    EXPECT_EQ(count, 0) << per_axis[0] << "×" << per_axis[1] << "×" << per_axis[2] << ", first at "
                        << first;
  }
}

TEST(MpiHaloExchange, PeriodicBoxMatchesBoxBoundaries) {
  expect_same_as_box_boundaries(solver::BoxBoundaries{});
}

TEST(MpiHaloExchange, MixedBoundariesMatchBoxBoundaries) {
  solver::BoxBoundaries boundaries;
  boundaries.lower[1] = BoundaryKind::outflow;
  boundaries.upper[1] = BoundaryKind::reflecting;
  boundaries.lower[2] = BoundaryKind::reflecting;
  boundaries.upper[2] = BoundaryKind::outflow;
  expect_same_as_box_boundaries(boundaries);
}

// The comparison must be able to fail: without the fill, the ghosts keep their garbage.
TEST(MpiHaloExchange, ComparisonSeesUnfilledGhosts) {
  std::string first;
  const long count =
      mismatches(world_size() >= 2 ? 2 : 1, {0, 0, 0}, solver::BoxBoundaries{}, first, false);
  if (world_rank() == 0) {
    EXPECT_GT(count, 0);
  }
}

}  // namespace
}  // namespace brume::mpi_testing
