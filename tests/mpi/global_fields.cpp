#include "tests/mpi/global_fields.hpp"

#include <mpi.h>

#include <bit>
#include <cstdint>
#include <cstdio>
#include <cstring>

namespace brume::mpi_testing {

namespace {

// Slots along each axis of the region a block sends for face array `normal` (−1: cell array).
std::array<int, 3> region(const solver::BlockGeometry& g, int normal) {
  std::array<int, 3> n = g.cells;
  if (normal >= 0 && g.active(normal)) n[normal] += 1;
  return n;
}

}  // namespace

GlobalFields gather(const solver::State& state, const solver::Decomposition& decomposition) {
  const solver::BlockGeometry& g = state.geometry;
  std::vector<const std::vector<double>*> arrays{&state.density, &state.momentum[0],
                                                 &state.momentum[1], &state.momentum[2]};
  if (!state.isothermal) arrays.push_back(&state.energy);
  const int cell_count = int(arrays.size());
  std::vector<int> normals(arrays.size(), -1);
  if (state.magnetic) {
    for (int d = 0; d < 3; ++d) {
      arrays.push_back(&state.face_field[d]);
      normals.push_back(d);
    }
  }
  // Block message: the offset, then every array's region, k slowest.
  std::vector<double> block;
  for (int d = 0; d < 3; ++d)
    block.push_back(double(g.offset[d]));
  for (std::size_t a = 0; a < arrays.size(); ++a) {
    const auto n = region(g, normals[a]);
    for (int k = 0; k < n[2]; ++k)
      for (int j = 0; j < n[1]; ++j)
        for (int i = 0; i < n[0]; ++i)
          block.push_back((*arrays[a])[std::size_t(g.index(i, j, k))]);
  }
  const MPI_Comm comm = decomposition.comm();
  const int size = decomposition.size();
  std::vector<double> all(decomposition.rank() == 0 ? block.size() * std::size_t(size) : 0);
  MPI_Gather(block.data(), int(block.size()), MPI_DOUBLE, all.data(), int(block.size()), MPI_DOUBLE,
             0, comm);
  GlobalFields out;
  if (decomposition.rank() != 0) return out;

  out.cells = decomposition.box_cells();
  std::array<std::array<long, 3>, 4> extents;  // global slots per axis: cells, then faces
  for (int a = -1; a < 3; ++a) {
    for (int d = 0; d < 3; ++d)
      extents[std::size_t(a + 1)][std::size_t(d)] =
          out.cells[d] + (a == d && out.cells[d] > 1 ? 1 : 0);
  }
  auto total = [](const std::array<long, 3>& e) { return std::size_t(e[0] * e[1] * e[2]); };
  out.cell_arrays.assign(std::size_t(cell_count), std::vector<double>(total(extents[0])));
  std::array<std::vector<char>, 3> written;
  for (int d = 0; d < 3 && state.magnetic; ++d) {
    out.faces[d].assign(total(extents[std::size_t(d) + 1]), 0.0);
    written[d].assign(out.faces[d].size(), 0);
  }
  for (int r = 0; r < size; ++r) {
    const double* in = all.data() + std::size_t(r) * block.size();
    const std::array<long, 3> offset{long(in[0]), long(in[1]), long(in[2])};
    in += 3;
    for (std::size_t a = 0; a < arrays.size(); ++a) {
      const int normal = normals[a];
      const auto n = region(g, normal);
      const auto& e = extents[std::size_t(normal + 1)];
      std::vector<double>& target = normal < 0 ? out.cell_arrays[a] : out.faces[normal];
      for (int k = 0; k < n[2]; ++k) {
        for (int j = 0; j < n[1]; ++j) {
          for (int i = 0; i < n[0]; ++i) {
            const double value = *in++;
            const std::size_t slot =
                std::size_t(offset[0] + i + e[0] * ((offset[1] + j) + e[1] * (offset[2] + k)));
            if (normal >= 0 && written[normal][slot] != 0 &&
                std::bit_cast<std::uint64_t>(target[slot]) != std::bit_cast<std::uint64_t>(value)) {
              ++out.shared_face_mismatches;
            }
            if (normal >= 0) written[normal][slot] = 1;
            target[slot] = value;
          }
        }
      }
    }
  }
  return out;
}

std::string first_difference(const GlobalFields& a, const GlobalFields& b) {
  auto compare = [](const std::vector<double>& x, const std::vector<double>& y,
                    const std::string& name) -> std::string {
    if (x.size() != y.size()) return name + ": sizes differ";
    for (std::size_t s = 0; s < x.size(); ++s) {
      if (std::bit_cast<std::uint64_t>(x[s]) != std::bit_cast<std::uint64_t>(y[s])) {
        char text[160];
        std::snprintf(text, sizeof text, "%s differs at global slot %zu: %.17g vs %.17g",
                      name.c_str(), s, x[s], y[s]);
        return text;
      }
    }
    return {};
  };
  if (a.cell_arrays.size() != b.cell_arrays.size()) return "different sets of cell arrays";
  for (std::size_t c = 0; c < a.cell_arrays.size(); ++c) {
    const std::string why =
        compare(a.cell_arrays[c], b.cell_arrays[c], "cell array " + std::to_string(c));
    if (!why.empty()) return why;
  }
  for (int d = 0; d < 3; ++d) {
    const std::string why = compare(a.faces[d], b.faces[d], "face field " + std::to_string(d));
    if (!why.empty()) return why;
  }
  return {};
}

}  // namespace brume::mpi_testing
