// Ghost filling of a decomposed block: the ghost cells and ghost faces that lie in a neighbour's
// block are received from it (non-blocking MPI), those beyond a physical box face are filled by
// the box boundary condition (fill_axis).
//
// Axes are filled in turn, x, then y, then z, each over the full extents of the other axes
// (ghosts included), so that edge and corner ghosts travel along with the faces, as the CT stencil
// needs. Buffers are allocated once, in the constructor; a fill allocates nothing.
//
// Shared faces. The face between two neighbouring blocks along d belongs to the upper block (its
// face 0): at every fill the lower block's face slot n is overwritten with the upper block's face
// 0, so both hold bitwise the same value whatever the two blocks computed. At a periodic wrap the
// first block along d owns the box's face (its face 0 is also the last block's face n). At a
// non-periodic box face the block at that face owns it.
//
// Fallback flags (exchange_flags) travel along all three axes at once: only the cells across a
// block face matter to the fallback, not those across edges or corners.
#pragma once

#include <mpi.h>

#include <array>
#include <cstddef>
#include <vector>

#include "solver/box_boundaries.hpp"
#include "solver/decomposition.hpp"
#include "solver/ghost_filler.hpp"

namespace brume::solver {

class HaloExchange final : public GhostFiller {
 public:
  // `decomposition` must outlive the exchange; `block` is this rank's block (with the ghost
  // layers of the scheme); the states filled later must have that geometry and these fields.
  HaloExchange(const Decomposition& decomposition, const BoxBoundaries& boundaries,
               const BlockGeometry& block, bool magnetic, bool isothermal);
  // Collective over the decomposition's communicator: every rank must call it.
  void fill(State& state) const override;
  // Collective: the flags of the first and last interior layers go to the neighbours.
  void exchange_flags(const BlockGeometry& g, std::vector<std::ptrdiff_t>& cells) const override;
  // Collective: a logical or over every rank.
  [[nodiscard]] bool any_block(bool local) const override;

  // What this rank sends in one fill, or in one exchange of fallback flags: point-to-point
  // messages and their bytes (an axis one rank spans, or a box face, sends nothing).
  struct Traffic {
    int messages = 0;
    long long bytes = 0;
  };
  [[nodiscard]] Traffic fill_traffic() const;
  [[nodiscard]] Traffic flag_traffic() const;
  // Bytes of the message buffers (their capacity), for `brume bench`.
  [[nodiscard]] std::size_t allocated_bytes() const;

 private:
  // One stored array as the exchange along an axis sees it.
  struct Field {
    double* data = nullptr;
    bool staggered = false;  // a face array whose faces are normal to the axis
    double parity = 1.0;     // sign in a mirror (reflecting boundaries)
  };
  int fields(State& state, int axis, std::array<Field, 8>& out) const;
  void fill_axis_locally(const std::array<Field, 8>& f, int count, int axis) const;
  void exchange_axis(const std::array<Field, 8>& f, int count, int axis) const;
  // Doubles sent towards the lower neighbour (with the shared faces) and towards the upper one.
  [[nodiscard]] std::array<int, 2> message_doubles(int axis) const;
  [[nodiscard]] bool exchanges(int axis) const {
    return block_.active(axis) && !self_periodic_[axis];
  }

  MPI_Comm comm_;
  BoxBoundaries boundaries_;
  BlockGeometry block_;
  bool magnetic_;
  bool isothermal_;
  std::array<std::array<int, 2>, 3> neighbours_{};
  bool self_periodic_[3] = {false, false, false};  // one rank spans this periodic axis
  // [axis][side]: side 0 is the lower side of the block, side 1 the upper side.
  mutable std::array<std::array<std::vector<double>, 2>, 3> send_;
  mutable std::array<std::array<std::vector<double>, 2>, 3> receive_;
  // Planes of fallback flags, [axis][side] as above.
  mutable std::array<std::array<std::vector<unsigned char>, 2>, 3> flags_send_;
  mutable std::array<std::array<std::vector<unsigned char>, 2>, 3> flags_receive_;
};

}  // namespace brume::solver
