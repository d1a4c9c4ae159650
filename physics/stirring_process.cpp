#include "physics/stirring_process.hpp"

#include <cmath>
#include <stdexcept>
#include <string>
#include <utility>

#include "physics/stirring_random.hpp"

namespace brume::physics {

StirringProcess::StirringProcess(std::vector<StirringMode> modes, double correlation_time,
                                 double deviation, std::uint64_t seed)
    : modes_(std::move(modes)),
      correlation_time_(correlation_time),
      deviation_(deviation),
      seed_(seed),
      amplitudes_(6 * modes_.size(), 0.0) {}

void StirringProcess::start() {
  update(0.0, deviation_);
}

void StirringProcess::advance(double dt) {
  const double keep = std::exp(-dt / correlation_time_);
  update(keep, deviation_ * std::sqrt((1.0 - keep) * (1.0 + keep)));
}

void StirringProcess::update(double keep, double noise) {
  for (std::size_t m = 0; m < modes_.size(); ++m) {
    const StirringMode& mode = modes_[m];
    std::array<double, 3> re{}, im{};
    for (std::size_t d = 0; d < 3; ++d) {
      const NormalPair xi = stirring_normal_pair(seed_, next_pair_++);
      re[d] = xi.first;
      im[d] = xi.second;
    }
    double* a = amplitudes_.data() + 6 * m;
    for (std::size_t i = 0; i < 3; ++i) {
      double pre = 0.0, pim = 0.0;
      for (std::size_t j = 0; j < 3; ++j) {
        pre += mode.projection[3 * i + j] * re[j];
        pim += mode.projection[3 * i + j] * im[j];
      }
      a[2 * i] = keep * a[2 * i] + noise * mode.weight * pre;
      a[2 * i + 1] = keep * a[2 * i + 1] + noise * mode.weight * pim;
    }
  }
}

void StirringProcess::restore(std::vector<double> amplitudes, std::uint64_t next_pair) {
  if (amplitudes.size() != amplitudes_.size()) {
    throw std::invalid_argument("the checkpoint holds " + std::to_string(amplitudes.size()) +
                                " stirring amplitudes, the configuration's shell needs " +
                                std::to_string(amplitudes_.size()));
  }
  amplitudes_ = std::move(amplitudes);
  next_pair_ = next_pair;
}

double stirring_mean_square_per_variance(const std::vector<StirringMode>& modes) {
  double sum = 0.0;
  for (const StirringMode& mode : modes) {
    double trace = 0.0;  // tr(P Pᵀ) = Σ_ij P_ij²
    for (double p : mode.projection)
      trace += p * p;
    sum += 4.0 * mode.weight * mode.weight * trace;
  }
  return sum;
}

}  // namespace brume::physics
