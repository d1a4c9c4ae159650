// The forward discrete Fourier transform of a small 2D map on one rank (serial FFTW):
// X̂[m][l] = Σ_v Σ_u X[v][u] exp(−2πi (l u / N_u + m v / N_v)), no normalization.
#pragma once

#include <complex>
#include <cstddef>
#include <vector>

namespace brume::physics {

class SkyFourierTransform {
 public:
  SkyFourierTransform(long cells_u, long cells_v);
  ~SkyFourierTransform();
  SkyFourierTransform(const SkyFourierTransform&) = delete;
  SkyFourierTransform& operator=(const SkyFourierTransform&) = delete;

  // `map` holds cells_v × cells_u values, [v][u]; the result has the same layout.
  [[nodiscard]] std::vector<std::complex<double>> forward(const std::vector<double>& map);

 private:
  std::size_t size_ = 0;
  void* buffer_ = nullptr;  // fftw_complex[size_], in place
  void* plan_ = nullptr;    // fftw_plan
};

}  // namespace brume::physics
