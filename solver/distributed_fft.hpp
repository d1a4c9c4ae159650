// The forward real-to-complex 3D discrete Fourier transform of a periodic field held as rank
// blocks (any 3D Cartesian block decomposition), through FFTW's MPI interface (Frigo & Johnson
// 2005, Proc. IEEE 93, 216). The blocks are moved to FFTW's slab layout with one MPI_Alltoallv;
// the plan and every buffer are made once, in the constructor, and reused by every transform.
//
// Index order follows the global arrays [z][y][x] (x fastest): FFTW's first dimension is z, so
// each rank owns a slab of z planes (possibly none) and the last dimension holds the nx/2 + 1
// non-negative x wave numbers. The transform is unnormalized: F(k) = Σ_x f(x) e^{-2πi k·x/N}.
#pragma once

#include <mpi.h>

#include <array>
#include <complex>
#include <cstddef>
#include <span>
#include <vector>

struct fftw_plan_s;  // fftw3.h: fftw_plan is a pointer to it

namespace brume::solver {

class DistributedFft {
 public:
  // Collective over `comm`. The blocks of all ranks must tile `box_cells` exactly; `slots` is
  // the number of coefficient buffers kept at once (3 for the components of a vector field).
  DistributedFft(MPI_Comm comm, const std::array<long, 3>& box_cells,
                 const std::array<long, 3>& block_offset, const std::array<int, 3>& block_cells,
                 int slots);
  ~DistributedFft();
  DistributedFft(const DistributedFft&) = delete;
  DistributedFft& operator=(const DistributedFft&) = delete;

  // Collective: transforms this rank's block (flat, i fastest, block_cells values) into the
  // coefficients of `slot`.
  void forward(std::span<const double> block, int slot);

  // This rank's coefficients of `slot`: planes() × rows() × row_length(), C order.
  [[nodiscard]] std::span<const std::complex<double>> coefficients(int slot) const;

  [[nodiscard]] long first_plane() const { return first_plane_; }  // global z index
  [[nodiscard]] long planes() const { return planes_; }
  [[nodiscard]] long rows() const { return box_[1]; }                // ny
  [[nodiscard]] long row_length() const { return box_[0] / 2 + 1; }  // nx/2 + 1
  [[nodiscard]] const std::array<long, 3>& box_cells() const { return box_; }
  [[nodiscard]] MPI_Comm comm() const { return comm_; }
  // Same box and block, on a communicator of the same ranks in the same order.
  [[nodiscard]] bool matches(MPI_Comm comm, const std::array<long, 3>& box_cells,
                             const std::array<long, 3>& block_offset,
                             const std::array<int, 3>& block_cells) const;

  // Signed wave number (in units of the fundamental) of index `index` along `axis`, numpy's
  // fftfreq convention: 0, 1, ..., ⌈N/2⌉ − 1, −⌊N/2⌋, ..., −1 (x: only 0 ... ⌊N/2⌋ are held).
  [[nodiscard]] static long wave_number(long index, long cells) {
    return 2 * index < cells ? index : index - cells;
  }

 private:
  // Where the cells sent by one source rank land in this rank's slab.
  struct Piece {
    long first_plane = 0, planes = 0;  // global z range
    long y0 = 0, ny = 0, x0 = 0, nx = 0;
  };
  void unpack();

  MPI_Comm comm_;  // a duplicate of the caller's, owned
  std::array<long, 3> box_{};
  std::array<long, 3> offset_{};
  std::array<int, 3> cells_{};
  long first_plane_ = 0;
  long planes_ = 0;
  std::size_t block_size_ = 0;
  std::vector<int> send_counts_, send_offsets_, receive_counts_, receive_offsets_;
  std::vector<Piece> pieces_;  // one per source rank
  std::vector<double> received_;
  double* real_ = nullptr;  // FFTW's padded real slab: planes × ny × 2(nx/2 + 1)
  std::vector<std::complex<double>*> complex_;
  std::size_t complex_size_ = 0;
  fftw_plan_s* plan_ = nullptr;
};

}  // namespace brume::solver
