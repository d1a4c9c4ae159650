// The arrays of a state as plain pointers and neighbour steps, copied out of the State once per
// pass: loops that read them through the State would reload them after every store (they may
// alias), which stops vectorization.
#pragma once

#include <cstddef>

#include "solver/primitive.hpp"
#include "solver/state.hpp"

namespace brume::solver {

template <bool Magnetic>
struct CellView {
  const double *rho, *mx, *my, *mz, *en;
  const double *bx, *by, *bz;  // face fields (nullptr for hydrodynamics)
  std::ptrdiff_t sx, sy, sz;   // neighbour steps

  explicit CellView(const State& s)
      : rho(s.density.data()),
        mx(s.momentum[0].data()),
        my(s.momentum[1].data()),
        mz(s.momentum[2].data()),
        en(s.energy.data()),
        bx(Magnetic ? s.face_field[0].data() : nullptr),
        by(Magnetic ? s.face_field[1].data() : nullptr),
        bz(Magnetic ? s.face_field[2].data() : nullptr),
        sx(s.geometry.step(0)),
        sy(s.geometry.step(1)),
        sz(s.geometry.step(2)) {}

  // Cell-centred B_d: the average of the two d-faces (zero for hydrodynamics).
  [[nodiscard]] double field(int d, std::ptrdiff_t c) const {
    if constexpr (Magnetic) {
      const double* b = d == 0 ? bx : d == 1 ? by : bz;
      const std::ptrdiff_t s = d == 0 ? sx : d == 1 ? sy : sz;
      return 0.5 * (b[c] + b[c + s]);
    } else {
      (void)d, (void)c;
      return 0.0;
    }
  }
  [[nodiscard]] double field_sq(std::ptrdiff_t c) const {
    if constexpr (Magnetic) {
      const double x = field(0, c), y = field(1, c), z = field(2, c);
      return x * x + y * y + z * z;
    } else {
      (void)c;
      return 0.0;
    }
  }
  template <class Eos>
  [[nodiscard]] double pressure(std::ptrdiff_t c, const Eos& eos) const {
    const double e = Eos::isothermal ? 0.0 : en[c];
    return pressure_from_conserved(rho[c], mx[c], my[c], mz[c], e, field_sq(c), eos);
  }
};

}  // namespace brume::solver
