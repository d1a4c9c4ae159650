#include "solver/distributed_fft.hpp"

#include <fftw3-mpi.h>

#include <algorithm>
#include <climits>
#include <stdexcept>
#include <string>

namespace brume::solver {

namespace {

// fftw_mpi_init once per process, after MPI_Init (FFTW manual §6.12, "FFTW MPI Reference").
void initialize_fftw_mpi() {
  static const bool ready = [] {
    fftw_mpi_init();
    return true;
  }();
  (void)ready;
}

int checked_count(long count) {
  if (count > INT_MAX) {
    throw std::length_error("distributed FFT: a message of " + std::to_string(count) +
                            " values exceeds MPI's int counts");
  }
  return int(count);
}

}  // namespace

DistributedFft::DistributedFft(MPI_Comm comm, const std::array<long, 3>& box_cells,
                               const std::array<long, 3>& block_offset,
                               const std::array<int, 3>& block_cells, int slots)
    : box_(box_cells), offset_(block_offset), cells_(block_cells) {
  initialize_fftw_mpi();
  MPI_Comm_dup(comm, &comm_);
  int size = 1;
  MPI_Comm_size(comm_, &size);
  const auto ranks = std::size_t(size);
  const long nx = box_[0], ny = box_[1], nz = box_[2];
  block_size_ = std::size_t(cells_[0]) * std::size_t(cells_[1]) * std::size_t(cells_[2]);

  ptrdiff_t local_planes = 0, local_first = 0;
  const ptrdiff_t complex_local =
      fftw_mpi_local_size_3d(nz, ny, nx / 2 + 1, comm_, &local_planes, &local_first);
  planes_ = long(local_planes);
  first_plane_ = long(local_first);
  complex_size_ = std::size_t(planes_) * std::size_t(ny) * std::size_t(nx / 2 + 1);
  const std::size_t allocation = std::max<std::size_t>(std::size_t(complex_local), 1);

  // Every rank's slab and block.
  const long mine[8] = {first_plane_, planes_,   offset_[0], offset_[1],
                        offset_[2],   cells_[0], cells_[1],  cells_[2]};
  std::vector<long> all(8 * ranks);
  MPI_Allgather(mine, 8, MPI_LONG, all.data(), 8, MPI_LONG, comm_);

  send_counts_.assign(ranks, 0);
  send_offsets_.assign(ranks, 0);
  receive_counts_.assign(ranks, 0);
  receive_offsets_.assign(ranks, 0);
  pieces_.assign(ranks, Piece{});
  const long plane_cells = long(cells_[0]) * long(cells_[1]);
  long received = 0;
  for (std::size_t r = 0; r < ranks; ++r) {
    const long* q = &all[8 * r];
    // What this block sends to rank r: its z planes inside r's slab, contiguous in the block.
    const long send_lo = std::max(offset_[2], q[0]);
    const long send_hi = std::min(offset_[2] + cells_[2], q[0] + q[1]);
    if (send_hi > send_lo) {
      send_counts_[r] = checked_count((send_hi - send_lo) * plane_cells);
      send_offsets_[r] = checked_count((send_lo - offset_[2]) * plane_cells);
    }
    // What rank r's block sends here.
    const long lo = std::max(q[4], first_plane_);
    const long hi = std::min(q[4] + q[7], first_plane_ + planes_);
    receive_offsets_[r] = checked_count(received);
    if (hi > lo) {
      pieces_[r] = Piece{lo, hi - lo, q[3], q[6], q[2], q[5]};
      receive_counts_[r] = checked_count((hi - lo) * q[5] * q[6]);
      received += long(receive_counts_[r]);
    }
  }
  // The blocks tile the box only if every slab cell arrives exactly once (a necessary check;
  // overlapping blocks that also leave holes of the same size are not caught here).
  const int tiles = received == planes_ * ny * nx ? 1 : 0;
  int all_tile = 0;
  MPI_Allreduce(&tiles, &all_tile, 1, MPI_INT, MPI_MIN, comm_);
  if (all_tile == 0) {
    throw std::invalid_argument("distributed FFT: the rank blocks do not tile the " +
                                std::to_string(nx) + " x " + std::to_string(ny) + " x " +
                                std::to_string(nz) + " box");
  }
  received_.assign(std::size_t(std::max(received, 1L)), 0.0);

  real_ = fftw_alloc_real(2 * allocation);
  std::fill(real_, real_ + 2 * allocation, 0.0);
  for (int s = 0; s < slots; ++s) {
    complex_.push_back(reinterpret_cast<std::complex<double>*>(fftw_alloc_complex(allocation)));
  }
  // FFTW_ESTIMATE: the plan, hence the round-off, does not depend on timing measurements.
  plan_ = fftw_mpi_plan_dft_r2c_3d(
      nz, ny, nx, real_, reinterpret_cast<fftw_complex*>(complex_.at(0)), comm_, FFTW_ESTIMATE);
  if (plan_ == nullptr) throw std::runtime_error("distributed FFT: FFTW made no plan");
}

DistributedFft::~DistributedFft() {
  if (plan_ != nullptr) fftw_destroy_plan(plan_);
  for (std::complex<double>* c : complex_)
    fftw_free(c);
  fftw_free(real_);
  MPI_Comm_free(&comm_);
}

bool DistributedFft::matches(MPI_Comm comm, const std::array<long, 3>& box_cells,
                             const std::array<long, 3>& block_offset,
                             const std::array<int, 3>& block_cells) const {
  int same = MPI_UNEQUAL;
  MPI_Comm_compare(comm, comm_, &same);
  return (same == MPI_IDENT || same == MPI_CONGRUENT) && box_cells == box_ &&
         block_offset == offset_ && block_cells == cells_;
}

void DistributedFft::forward(std::span<const double> block, int slot) {
  if (block.size() != block_size_) {
    throw std::invalid_argument("distributed FFT: a block of " + std::to_string(block.size()) +
                                " values for " + std::to_string(block_size_) + " cells");
  }
  MPI_Alltoallv(block.data(), send_counts_.data(), send_offsets_.data(), MPI_DOUBLE,
                received_.data(), receive_counts_.data(), receive_offsets_.data(), MPI_DOUBLE,
                comm_);
  unpack();
  fftw_mpi_execute_dft_r2c(plan_, real_,
                           reinterpret_cast<fftw_complex*>(complex_.at(std::size_t(slot))));
}

void DistributedFft::unpack() {
  const long padded = 2 * (box_[0] / 2 + 1);
  for (std::size_t r = 0; r < pieces_.size(); ++r) {
    const Piece& p = pieces_[r];
    const double* from = received_.data() + receive_offsets_[r];
    for (long z = 0; z < p.planes; ++z) {
      for (long y = 0; y < p.ny; ++y) {
        double* to =
            real_ + ((p.first_plane + z - first_plane_) * box_[1] + p.y0 + y) * padded + p.x0;
        std::copy(from, from + p.nx, to);
        from += p.nx;
      }
    }
  }
}

std::span<const std::complex<double>> DistributedFft::coefficients(int slot) const {
  return {complex_.at(std::size_t(slot)), complex_size_};
}

}  // namespace brume::solver
