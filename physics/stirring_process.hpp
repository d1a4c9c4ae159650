// The Ornstein–Uhlenbeck process of the stirred modes' amplitudes (Eswaran & Pope 1988, Comput.
// Fluids 16, 257, §2): each mode m carries a complex 3-vector â_m, and the acceleration is
// a(x) = Σ_m 2 Re[â_m e^{i k_m·x}]. The process is stationary with correlation time T.
#pragma once

#include <cstdint>
#include <vector>

#include "physics/stirring_modes.hpp"

namespace brume::physics {

class StirringProcess {
 public:
  // deviation: σ, the standard deviation of the real and imaginary parts of each unprojected
  // Cartesian component of a unit-weight mode.
  StirringProcess(std::vector<StirringMode> modes, double correlation_time, double deviation,
                  std::uint64_t seed);

  // Draws the amplitudes from the stationary distribution (the start of a run).
  void start();
  // Advances the amplitudes by dt with the exact update of the OU process,
  // â ← f â + σ w √(1 − f²) P ξ with f = exp(−dt/T), ξ standard normal (Gillespie 1996, Phys.
  // Rev. E 54, 2084, eq. 1.9 — from memory): exact for any dt.
  void advance(double dt);

  [[nodiscard]] const std::vector<StirringMode>& modes() const { return modes_; }
  // 6 per mode: Re and Im of x, then y, then z: [6m + 2d] real, [6m + 2d + 1] imaginary.
  [[nodiscard]] const std::vector<double>& amplitudes() const { return amplitudes_; }
  // The next pair of normal numbers to be drawn (the whole random state with the seed).
  [[nodiscard]] std::uint64_t next_pair() const { return next_pair_; }
  [[nodiscard]] double correlation_time() const { return correlation_time_; }
  // Continues from a saved state (throws std::invalid_argument on a wrong amplitude count).
  void restore(std::vector<double> amplitudes, std::uint64_t next_pair);

 private:
  void update(double keep, double noise);

  std::vector<StirringMode> modes_;
  double correlation_time_;
  double deviation_;
  std::uint64_t seed_;
  std::uint64_t next_pair_ = 0;
  std::vector<double> amplitudes_;
};

// Σ_m 4 w_m² tr(P_m P_mᵀ): the stationary volume-averaged |a|² per σ², since the modes are
// orthogonal over the periodic box and each complex component has variance 2σ².
[[nodiscard]] double stirring_mean_square_per_variance(const std::vector<StirringMode>& modes);

}  // namespace brume::physics
