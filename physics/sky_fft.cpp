#include "physics/sky_fft.hpp"

#include <fftw3.h>

#include <stdexcept>
#include <string>

namespace brume::physics {

SkyFourierTransform::SkyFourierTransform(long cells_u, long cells_v)
    : size_(std::size_t(cells_u) * std::size_t(cells_v)) {
  auto* data = fftw_alloc_complex(size_);
  if (data == nullptr) throw std::runtime_error("sky_maps: out of memory for the FFT");
  buffer_ = data;
  // FFTW_ESTIMATE: the plan depends on the sizes only, never on timings, so the transform is
  // the same from run to run.
  plan_ = fftw_plan_dft_2d(int(cells_v), int(cells_u), data, data, FFTW_FORWARD, FFTW_ESTIMATE);
  if (plan_ == nullptr) {
    fftw_free(data);
    throw std::runtime_error("sky_maps: FFTW has no plan for a " + std::to_string(cells_u) + " × " +
                             std::to_string(cells_v) + " map");
  }
}

SkyFourierTransform::~SkyFourierTransform() {
  fftw_destroy_plan(static_cast<fftw_plan>(plan_));
  fftw_free(buffer_);
}

std::vector<std::complex<double>> SkyFourierTransform::forward(const std::vector<double>& map) {
  if (map.size() != size_) {
    throw std::logic_error("sky_maps: a map of " + std::to_string(map.size()) +
                           " values for a transform of " + std::to_string(size_));
  }
  auto* data = static_cast<fftw_complex*>(buffer_);
  for (std::size_t c = 0; c < size_; ++c) {
    data[c][0] = map[c];
    data[c][1] = 0.0;
  }
  fftw_execute(static_cast<fftw_plan>(plan_));
  std::vector<std::complex<double>> out(size_);
  for (std::size_t c = 0; c < size_; ++c)
    out[c] = {data[c][0], data[c][1]};
  return out;
}

}  // namespace brume::physics
