#include "physics/spectra_shells.hpp"

#include <mpi.h>

#include <algorithm>
#include <cmath>

namespace brume::physics {

namespace {

std::size_t shell_of(double k_squared) {
  return std::size_t(std::floor(std::sqrt(k_squared) + 0.5));
}

}  // namespace

SpectralShells spectral_shells(const solver::DistributedFft& fft,
                               const std::array<double, 3>& box_size) {
  SpectralShells s;
  s.cells = fft.box_cells();
  s.longest_edge = std::max({box_size[0], box_size[1], box_size[2]});
  const std::array<long, 3> held = {fft.row_length(), fft.rows(), fft.planes()};
  const std::array<long, 3> first = {0, 0, fft.first_plane()};
  double k_max_squared = 0.0;
  for (std::size_t d = 0; d < 3; ++d) {
    const double scale = s.longest_edge / box_size[d];
    const long n = s.cells[d];
    s.k[d].resize(std::size_t(held[d]));
    s.nyquist[d].resize(std::size_t(held[d]));
    for (long i = 0; i < held[d]; ++i) {
      const long index = first[d] + i;
      s.k[d][std::size_t(i)] = double(solver::DistributedFft::wave_number(index, n)) * scale;
      s.nyquist[d][std::size_t(i)] = n % 2 == 0 && 2 * index == n ? 1 : 0;
    }
    const double edge = double(n / 2) * scale;
    k_max_squared += edge * edge;
  }
  s.shell_count = shell_of(k_max_squared) + 1;

  const long nx = s.cells[0];
  const double cells = double(s.cells[0]) * double(s.cells[1]) * double(s.cells[2]);
  const double half_over_n2 = 0.5 / (cells * cells);
  const std::size_t size = std::size_t(held[0] * held[1] * held[2]);
  s.shell.resize(size);
  s.weight.resize(size);
  std::vector<long long> counts(s.shell_count, 0);
  std::size_t c = 0;
  for (long z = 0; z < held[2]; ++z) {
    for (long y = 0; y < held[1]; ++y) {
      const double kz = s.k[2][std::size_t(z)], ky = s.k[1][std::size_t(y)];
      for (long x = 0; x < held[0]; ++x, ++c) {
        const double kx = s.k[0][std::size_t(x)];
        const std::size_t shell = shell_of(kx * kx + ky * ky + kz * kz);
        const int multiplicity = x == 0 || (nx % 2 == 0 && 2 * x == nx) ? 1 : 2;
        s.shell[c] = std::int32_t(shell);
        s.weight[c] = multiplicity * half_over_n2;
        counts[shell] += multiplicity;
      }
    }
  }
  if (first[2] == 0 && held[2] > 0) s.zero_mode = 0;
  s.mode_count.assign(s.shell_count, 0);
  MPI_Allreduce(counts.data(), s.mode_count.data(), int(s.shell_count), MPI_LONG_LONG, MPI_SUM,
                fft.comm());
  return s;
}

}  // namespace brume::physics
