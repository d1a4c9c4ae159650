#include "physics/structure_pencils.hpp"

#include <algorithm>
#include <climits>
#include <stdexcept>
#include <string>

namespace brume::physics {

namespace {

// The ranks whose blocks lie on the same lines along `axis`, ordered along it.
struct LineGroup {
  MPI_Comm comm = MPI_COMM_NULL;
  int rank = 0;
  int size = 1;
  LineGroup(const CellQuantities& q, int axis, MPI_Comm world) {
    const int a = (axis + 1) % 3 < (axis + 2) % 3 ? (axis + 1) % 3 : (axis + 2) % 3;
    const int b = 3 - axis - a;
    const long blocks_b = q.box_cells[b] / q.cells[b];
    const long color = (q.offset[a] / q.cells[a]) * blocks_b + q.offset[b] / q.cells[b];
    MPI_Comm_split(world, int(color), int(q.offset[axis] / q.cells[axis]), &comm);
    MPI_Comm_rank(comm, &rank);
    MPI_Comm_size(comm, &size);
  }
  ~LineGroup() { MPI_Comm_free(&comm); }
  LineGroup(const LineGroup&) = delete;
  LineGroup& operator=(const LineGroup&) = delete;
};

// Every rank takes the same decision (one collective), so that none is left waiting.
void require_uniform_blocks(const CellQuantities& q, MPI_Comm comm) {
  std::array<int, 7> local{};  // cells, −cells, and 1 for a block off the grid of blocks
  for (std::size_t d = 0; d < 3; ++d) {
    local[d] = q.cells[d];
    local[d + 3] = -q.cells[d];
    if (q.box_cells[d] % q.cells[d] != 0 || q.offset[d] % q.cells[d] != 0) local[6] = 1;
  }
  std::array<int, 7> extreme{};
  MPI_Allreduce(local.data(), extreme.data(), 7, MPI_INT, MPI_MAX, comm);
  bool uniform = extreme[6] == 0;
  for (std::size_t d = 0; d < 3; ++d)
    uniform = uniform && extreme[d] == -extreme[d + 3];
  if (!uniform) {
    throw std::invalid_argument(
        "structure functions: the blocks of the box must all have the same cell counts");
  }
}

// Share `s` of `total` lines over `parts` ranks: [first(s), first(s + 1)).
long first_line(long total, int parts, int s) {
  return total * s / parts;
}

}  // namespace

void gather_pencils(const CellQuantities& q, int axis, const std::vector<double>& cold,
                    MPI_Comm comm, PencilBuffers& buffers, StructurePencils& pencils) {
  require_uniform_blocks(q, comm);
  const auto d = std::size_t(axis);
  const std::size_t a = axis == 0 ? 1 : 0;
  const std::size_t b = axis == 2 ? 1 : 2;
  const LineGroup group(q, axis, comm);
  if (long(group.size) * q.cells[d] != q.box_cells[d]) {
    throw std::invalid_argument("structure functions: the blocks along axis " +
                                std::to_string(axis) + " do not span the box");
  }
  const std::array<long, 3> stride{1, long(q.cells[0]), long(q.cells[0]) * q.cells[1]};
  const long along = q.cells[d];
  const long across_a = q.cells[a];
  const long plane = across_a * q.cells[b];  // transverse cells of the block
  const int p = group.size;
  const long mine = first_line(plane, p, group.rank + 1) - first_line(plane, p, group.rank);
  const long values = long(field_count) * along * plane;
  if (values > long(INT_MAX) || long(field_count) * q.box_cells[d] * mine > long(INT_MAX)) {
    throw std::invalid_argument("structure functions: a block too large for one MPI message");
  }

  std::vector<double>& momentum_d = buffers.momentum;
  momentum_d.resize(q.size());
  for (std::size_t c = 0; c < q.size(); ++c)
    momentum_d[c] = q.density[c] * q.velocity[d][c];
  const std::array<const double*, field_count> source{q.velocity[d].data(), q.velocity[a].data(),
                                                      q.velocity[b].data(), momentum_d.data(),
                                                      cold.data()};

  // Send layout for rank s: [field][position][line of share s], packed in tiles of lines so
  // that the rows a tile reads stay in cache whatever the axis.
  constexpr long tile = 16;
  const auto ranks = static_cast<std::size_t>(p);
  std::vector<double>& send = buffers.send;
  send.resize(static_cast<std::size_t>(values));
  std::vector<int> send_counts(ranks), send_offsets(ranks);
  std::vector<int> receive_counts(ranks), receive_offsets(ranks);
  std::array<long, tile> start{};  // memory offset of the first cell of each line of a tile
  long at = 0;
  for (int s = 0; s < p; ++s) {
    const long first = first_line(plane, p, s);
    const long width = first_line(plane, p, s + 1) - first;
    send_offsets[std::size_t(s)] = int(at);
    send_counts[std::size_t(s)] = int(long(field_count) * along * width);
    receive_offsets[std::size_t(s)] = int(long(field_count) * along * mine * s);
    receive_counts[std::size_t(s)] = int(long(field_count) * along * mine);
    for (long t0 = 0; t0 < width; t0 += tile) {
      const long count = width - t0 < tile ? width - t0 : tile;
      for (long u = 0; u < count; ++u) {
        const long t = first + t0 + u;
        start[std::size_t(u)] = (t % across_a) * stride[a] + (t / across_a) * stride[b];
      }
      for (int f = 0; f < field_count; ++f) {
        const double* from = source[std::size_t(f)];
        double* to = send.data() + at + f * along * width + t0;
        for (long x = 0; x < along; ++x) {
          const double* row = from + x * stride[d];
          for (long u = 0; u < count; ++u)
            to[x * width + u] = row[start[std::size_t(u)]];
        }
      }
    }
    at += long(field_count) * along * width;
  }
  std::vector<double>& received = buffers.received;
  received.resize(std::size_t(long(field_count) * along * mine * p));
  MPI_Alltoallv(send.data(), send_counts.data(), send_offsets.data(), MPI_DOUBLE, received.data(),
                receive_counts.data(), receive_offsets.data(), MPI_DOUBLE, group.comm);

  pencils.axis = axis;
  pencils.length = q.box_cells[d];
  pencils.lines = mine;
  for (int f = 0; f < field_count; ++f) {
    std::vector<double>& out = pencils.fields[std::size_t(f)];
    out.resize(std::size_t(pencils.length * mine));
    for (int s = 0; s < p; ++s) {
      const double* from = received.data() + receive_offsets[std::size_t(s)] + f * along * mine;
      std::copy(from, from + along * mine, out.data() + s * along * mine);
    }
  }
}

// 1 for a cell colder than `cold_temperature`, else 0 (NaN is not cold).
std::vector<double> cold_cells(const CellQuantities& q, double cold_temperature) {
  std::vector<double> cold(q.size());
  for (std::size_t c = 0; c < q.size(); ++c)
    cold[c] = q.temperature[c] < cold_temperature ? 1.0 : 0.0;
  return cold;
}

}  // namespace brume::physics
