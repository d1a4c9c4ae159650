#include "solver/halo_exchange.hpp"

#include <algorithm>
#include <cstddef>
#include <stdexcept>

#include "solver/boundary_layer_flags.hpp"

namespace brume::solver {

namespace {

// Visits the slots of layers p0 .. p0 + count − 1 along `axis` (interior-relative positions) over
// the full extents of the other two axes, in a fixed order with the unit-stride index innermost.
template <class Visit>
void for_each_slot(const BlockGeometry& g, int axis, int p0, int count, Visit&& visit) {
  const int a1 = axis == 0 ? 1 : 0;  // the two other axes, a1 < a2
  const int a2 = axis == 2 ? 1 : 2;
  const std::ptrdiff_t sa = g.stride(axis), s1 = g.stride(a1), s2 = g.stride(a2);
  const int e1 = g.extent(a1), e2 = g.extent(a2);
  const std::ptrdiff_t first = std::ptrdiff_t(p0 + g.ghost_layers) * sa;
  if (axis == 0) {  // layers are contiguous in memory: keep them innermost
    for (int c2 = 0; c2 < e2; ++c2)
      for (int c1 = 0; c1 < e1; ++c1)
        for (int m = 0; m < count; ++m)
          visit(first + c1 * s1 + c2 * s2 + m * sa);
  } else {
    for (int m = 0; m < count; ++m)
      for (int c2 = 0; c2 < e2; ++c2)
        for (int c1 = 0; c1 < e1; ++c1)
          visit(first + c1 * s1 + c2 * s2 + m * sa);
  }
}

constexpr int tag_towards_lower = 0;  // a block's lower layers, sent to its lower neighbour
constexpr int tag_towards_upper = 1;
// Fallback flags along `axis` towards the lower (upper) neighbour: tags apart from the fill's,
// one per axis, since two axes may have the same neighbour.
constexpr int flags_tag(int axis, int towards) {
  return 2 + 2 * axis + towards;
}

}  // namespace

HaloExchange::HaloExchange(const Decomposition& decomposition, const BoxBoundaries& boundaries,
                           const BlockGeometry& block, bool magnetic, bool isothermal)
    : comm_(decomposition.comm()),
      boundaries_(boundaries),
      block_(block),
      magnetic_(magnetic),
      isothermal_(isothermal) {
  const int field_count = 4 + (isothermal ? 0 : 1) + (magnetic ? 3 : 0);
  for (int d = 0; d < 3; ++d) {
    if (block.cells[d] != decomposition.block_cells()[d]) {
      throw std::invalid_argument("halo exchange: the block does not match the decomposition");
    }
    for (int side = 0; side < 2; ++side)
      neighbours_[d][side] = decomposition.neighbour(d, side);
    self_periodic_[d] =
        neighbours_[d][0] == decomposition.rank() && neighbours_[d][1] == decomposition.rank();
    if (!block.active(d) || self_periodic_[d]) continue;
    const std::size_t plane = block.storage_size() / std::size_t(block.extent(d));
    // At most ng + 1 layers per field (the shared face travels with the lower layers).
    const std::size_t size = plane * std::size_t(field_count) * std::size_t(block.ghost_layers + 1);
    for (int side = 0; side < 2; ++side) {
      send_[d][side].assign(size, 0.0);
      receive_[d][side].assign(size, 0.0);
      flags_send_[d][side].assign(layer_plane_size(block, d), 0);
      flags_receive_[d][side].assign(layer_plane_size(block, d), 0);
    }
  }
}

int HaloExchange::fields(State& state, int axis, std::array<Field, 8>& out) const {
  int n = 0;
  out[n++] = {state.density.data(), false, 1.0};
  for (int d = 0; d < 3; ++d)
    out[n++] = {state.momentum[d].data(), false, d == axis ? -1.0 : 1.0};
  if (!isothermal_) out[n++] = {state.energy.data(), false, 1.0};
  if (magnetic_) {
    for (int d = 0; d < 3; ++d)
      out[n++] = {state.face_field[d].data(), d == axis, d == axis ? -1.0 : 1.0};
  }
  return n;
}

void HaloExchange::fill(State& state) const {
  const BlockGeometry& g = state.geometry;
  if (g.cells != block_.cells || g.ghost_layers != block_.ghost_layers ||
      state.magnetic != magnetic_ || state.isothermal != isothermal_) {
    throw std::invalid_argument("halo exchange: the state does not match the exchange's block");
  }
  std::array<Field, 8> f;
  for (int axis = 0; axis < 3; ++axis) {
    if (!g.active(axis)) continue;
    const int count = fields(state, axis, f);
    if (self_periodic_[axis]) {
      fill_axis_locally(f, count, axis);
    } else {
      exchange_axis(f, count, axis);
    }
  }
}

// One rank spans a periodic axis: the same copies the exchange with itself would make.
void HaloExchange::fill_axis_locally(const std::array<Field, 8>& f, int count, int axis) const {
  const int n = block_.cells[axis];
  for (int a = 0; a < count; ++a) {
    fill_axis(f[a].data, block_, axis, BoundaryKind::periodic, BoundaryKind::periodic,
              f[a].staggered, f[a].parity);
    if (!f[a].staggered) continue;
    double* q = f[a].data;
    const std::ptrdiff_t shift = std::ptrdiff_t(n) * block_.stride(axis);
    for_each_slot(block_, axis, 0, 1, [&](std::ptrdiff_t s) { q[s + shift] = q[s]; });
  }
}

void HaloExchange::exchange_axis(const std::array<Field, 8>& f, int count, int axis) const {
  const int n = block_.cells[axis];
  const int ng = block_.ghost_layers;
  // Layers per field: sent down (and received from above) carry the shared face too.
  auto down_layers = [&](const Field& field) { return ng + (field.staggered ? 1 : 0); };
  const auto [down_size, up_size] = message_doubles(axis);
  const int lower = neighbours_[axis][0], upper = neighbours_[axis][1];
  std::array<MPI_Request, 4> requests{MPI_REQUEST_NULL, MPI_REQUEST_NULL, MPI_REQUEST_NULL,
                                      MPI_REQUEST_NULL};
  MPI_Irecv(receive_[axis][0].data(), up_size, MPI_DOUBLE, lower, tag_towards_upper, comm_,
            &requests[0]);
  MPI_Irecv(receive_[axis][1].data(), down_size, MPI_DOUBLE, upper, tag_towards_lower, comm_,
            &requests[1]);
  if (lower != MPI_PROC_NULL) {
    double* out = send_[axis][0].data();
    for (int a = 0; a < count; ++a) {
      const double* q = f[a].data;
      for_each_slot(block_, axis, 0, down_layers(f[a]), [&](std::ptrdiff_t s) { *out++ = q[s]; });
    }
  }
  if (upper != MPI_PROC_NULL) {
    double* out = send_[axis][1].data();
    for (int a = 0; a < count; ++a) {
      const double* q = f[a].data;
      for_each_slot(block_, axis, n - ng, ng, [&](std::ptrdiff_t s) { *out++ = q[s]; });
    }
  }
  MPI_Isend(send_[axis][0].data(), down_size, MPI_DOUBLE, lower, tag_towards_lower, comm_,
            &requests[2]);
  MPI_Isend(send_[axis][1].data(), up_size, MPI_DOUBLE, upper, tag_towards_upper, comm_,
            &requests[3]);
  // Physical box faces while the messages travel. fill_axis writes both sides; a side with a
  // neighbour is overwritten below by what the neighbour sent.
  if (lower == MPI_PROC_NULL || upper == MPI_PROC_NULL) {
    for (int a = 0; a < count; ++a) {
      fill_axis(f[a].data, block_, axis, boundaries_.lower[axis], boundaries_.upper[axis],
                f[a].staggered, f[a].parity);
    }
  }
  MPI_Waitall(4, requests.data(), MPI_STATUSES_IGNORE);
  if (lower != MPI_PROC_NULL) {
    const double* in = receive_[axis][0].data();
    for (int a = 0; a < count; ++a) {
      double* q = f[a].data;
      for_each_slot(block_, axis, -ng, ng, [&](std::ptrdiff_t s) { q[s] = *in++; });
    }
  }
  if (upper != MPI_PROC_NULL) {
    const double* in = receive_[axis][1].data();
    for (int a = 0; a < count; ++a) {
      double* q = f[a].data;
      for_each_slot(block_, axis, n, down_layers(f[a]), [&](std::ptrdiff_t s) { q[s] = *in++; });
    }
  }
}

void HaloExchange::exchange_flags(const BlockGeometry& g,
                                  std::vector<std::ptrdiff_t>& cells) const {
  if (g.cells != block_.cells || g.ghost_layers != block_.ghost_layers) {
    throw std::invalid_argument("halo exchange: the flags are not of the exchange's block");
  }
  const std::size_t interior = cells.size();
  std::array<MPI_Request, 12> requests;
  requests.fill(MPI_REQUEST_NULL);
  int r = 0;
  for (int axis = 0; axis < 3; ++axis) {
    if (!g.active(axis) || self_periodic_[axis]) continue;
    const int size = int(layer_plane_size(g, axis));
    const int lower = neighbours_[axis][0], upper = neighbours_[axis][1];
    auto& out = flags_send_[axis];
    auto& in = flags_receive_[axis];
    MPI_Irecv(in[0].data(), size, MPI_UNSIGNED_CHAR, lower, flags_tag(axis, tag_towards_upper),
              comm_, &requests[std::size_t(r++)]);
    MPI_Irecv(in[1].data(), size, MPI_UNSIGNED_CHAR, upper, flags_tag(axis, tag_towards_lower),
              comm_, &requests[std::size_t(r++)]);
    mark_layer(cells, interior, g, axis, 0, out[0].data());
    mark_layer(cells, interior, g, axis, g.cells[axis] - 1, out[1].data());
    MPI_Isend(out[0].data(), size, MPI_UNSIGNED_CHAR, lower, flags_tag(axis, tag_towards_lower),
              comm_, &requests[std::size_t(r++)]);
    MPI_Isend(out[1].data(), size, MPI_UNSIGNED_CHAR, upper, flags_tag(axis, tag_towards_upper),
              comm_, &requests[std::size_t(r++)]);
  }
  for (int axis = 0; axis < 3; ++axis) {
    if (g.active(axis) && self_periodic_[axis]) append_periodic_images(cells, interior, g, axis);
  }
  MPI_Waitall(r, requests.data(), MPI_STATUSES_IGNORE);
  for (int axis = 0; axis < 3; ++axis) {
    if (!g.active(axis) || self_periodic_[axis]) continue;
    if (neighbours_[axis][0] != MPI_PROC_NULL) {
      append_marked_layer(flags_receive_[axis][0].data(), g, axis, -1, cells);
    }
    if (neighbours_[axis][1] != MPI_PROC_NULL) {
      append_marked_layer(flags_receive_[axis][1].data(), g, axis, g.cells[axis], cells);
    }
  }
  if (cells.size() != interior) std::sort(cells.begin(), cells.end());
}

std::array<int, 2> HaloExchange::message_doubles(int axis) const {
  const int field_count = 4 + (isothermal_ ? 0 : 1) + (magnetic_ ? 3 : 0);
  const int staggered = magnetic_ ? 1 : 0;  // the face field normal to the axis
  const int plane = int(block_.storage_size() / std::size_t(block_.extent(axis)));
  const int ng = block_.ghost_layers;
  return {plane * (field_count * ng + staggered), plane * field_count * ng};
}

HaloExchange::Traffic HaloExchange::fill_traffic() const {
  Traffic t;
  for (int axis = 0; axis < 3; ++axis) {
    if (!exchanges(axis)) continue;
    const std::array<int, 2> doubles = message_doubles(axis);
    for (int side = 0; side < 2; ++side) {
      if (neighbours_[axis][side] == MPI_PROC_NULL) continue;
      t.messages += 1;
      t.bytes += (long long)doubles[std::size_t(side)] * (long long)sizeof(double);
    }
  }
  return t;
}

HaloExchange::Traffic HaloExchange::flag_traffic() const {
  Traffic t;
  for (int axis = 0; axis < 3; ++axis) {
    if (!exchanges(axis)) continue;
    for (int side = 0; side < 2; ++side) {
      if (neighbours_[axis][side] == MPI_PROC_NULL) continue;
      t.messages += 1;
      t.bytes += (long long)layer_plane_size(block_, axis);
    }
  }
  return t;
}

std::size_t HaloExchange::allocated_bytes() const {
  std::size_t bytes = 0;
  for (int axis = 0; axis < 3; ++axis) {
    for (int side = 0; side < 2; ++side) {
      bytes += (send_[axis][side].capacity() + receive_[axis][side].capacity()) * sizeof(double);
      bytes += flags_send_[axis][side].capacity() + flags_receive_[axis][side].capacity();
    }
  }
  return bytes;
}

bool HaloExchange::any_block(bool local) const {
  int mine = local ? 1 : 0, any = 0;
  MPI_Allreduce(&mine, &any, 1, MPI_INT, MPI_LOR, comm_);
  return any != 0;
}

}  // namespace brume::solver
