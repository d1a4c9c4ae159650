#include "physics/stirring_field.hpp"

#include <algorithm>
#include <cmath>
#include <cstdlib>
#include <numbers>

namespace brume::physics {

StirringField::PhaseTable StirringField::phase_table(int reach, int cells, long offset,
                                                     long box_cells) {
  PhaseTable t;
  t.reach = reach;
  t.cells = cells;
  const std::size_t size = std::size_t(2 * reach + 1) * std::size_t(cells);
  t.re.resize(size);
  t.im.resize(size);
  for (int n = -reach; n <= reach; ++n) {
    for (int i = 0; i < cells; ++i) {
      // The phase 2π n (2g + 1) / (2N) reduced exactly in integers first: every block gets the
      // same bits for the same global cell, and the wrap is exact.
      const long twice = 2 * box_cells;
      long turns = (long(n) * (2 * (offset + i) + 1)) % twice;
      if (turns < 0) turns += twice;
      const double angle = 2.0 * std::numbers::pi * double(turns) / double(twice);
      const std::size_t at = std::size_t(n + reach) * std::size_t(cells) + std::size_t(i);
      t.re[at] = std::cos(angle);
      t.im[at] = std::sin(angle);
    }
  }
  return t;
}

StirringField::StirringField(const std::vector<StirringMode>& modes,
                             const solver::BlockGeometry& block,
                             const std::array<long, 3>& box_cells)
    : cells_(block.cells) {
  std::array<int, 3> reach{};
  for (const StirringMode& mode : modes) {
    mode_nx_.push_back(mode.n[0]);
    mode_ny_.push_back(mode.n[1]);
    mode_nz_.push_back(mode.n[2]);
    for (std::size_t d = 0; d < 3; ++d)
      reach[d] = std::max(reach[d], std::abs(mode.n[d]));
  }
  highest_x_ = reach[0];
  for (std::size_t d = 0; d < 3; ++d) {
    phases_[d] = phase_table(reach[d], cells_[d], block.offset[d], box_cells[d]);
    acceleration_[d].assign(std::size_t(block.interior_cells()), 0.0);
  }
  gathered_.assign(6 * std::size_t(highest_x_ + 1), 0.0);
}

void StirringField::evaluate(const std::vector<double>& amplitudes) {
  const std::size_t nx = std::size_t(cells_[0]);
  const PhaseTable& px = phases_[0];
  const PhaseTable& py = phases_[1];
  const PhaseTable& pz = phases_[2];
  const std::size_t modes = mode_nx_.size();
  for (int k = 0; k < cells_[2]; ++k) {
    for (int j = 0; j < cells_[1]; ++j) {
      std::fill(gathered_.begin(), gathered_.end(), 0.0);
      for (std::size_t m = 0; m < modes; ++m) {
        const std::size_t y =
            std::size_t(mode_ny_[m] + py.reach) * std::size_t(py.cells) + std::size_t(j);
        const std::size_t z =
            std::size_t(mode_nz_[m] + pz.reach) * std::size_t(pz.cells) + std::size_t(k);
        const double yz_re = py.re[y] * pz.re[z] - py.im[y] * pz.im[z];
        const double yz_im = py.re[y] * pz.im[z] + py.im[y] * pz.re[z];
        const double* a = amplitudes.data() + 6 * m;
        double* c = gathered_.data() + 6 * std::size_t(mode_nx_[m]);
        for (std::size_t d = 0; d < 3; ++d) {
          c[2 * d] += a[2 * d] * yz_re - a[2 * d + 1] * yz_im;
          c[2 * d + 1] += a[2 * d] * yz_im + a[2 * d + 1] * yz_re;
        }
      }
      const std::size_t row = (std::size_t(k) * std::size_t(cells_[1]) + std::size_t(j)) * nx;
      double* ax = acceleration_[0].data() + row;
      double* ay = acceleration_[1].data() + row;
      double* az = acceleration_[2].data() + row;
      std::fill(ax, ax + nx, 0.0);
      std::fill(ay, ay + nx, 0.0);
      std::fill(az, az + nx, 0.0);
      for (int n = 0; n <= highest_x_; ++n) {
        const double* c = gathered_.data() + 6 * std::size_t(n);
        const double* xre = px.re.data() + std::size_t(n + px.reach) * nx;
        const double* xim = px.im.data() + std::size_t(n + px.reach) * nx;
        // 2 Re[C e^{i k_x x}] = 2 (C_re cos − C_im sin)
        const double cxr = 2.0 * c[0], cxi = 2.0 * c[1];
        const double cyr = 2.0 * c[2], cyi = 2.0 * c[3];
        const double czr = 2.0 * c[4], czi = 2.0 * c[5];
        for (std::size_t i = 0; i < nx; ++i) {
          ax[i] += cxr * xre[i] - cxi * xim[i];
          ay[i] += cyr * xre[i] - cyi * xim[i];
          az[i] += czr * xre[i] - czi * xim[i];
        }
      }
    }
  }
}

}  // namespace brume::physics
