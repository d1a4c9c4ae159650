// The wave vectors of one rank's slab of real-to-complex Fourier coefficients, their integer
// shells and their weights in the shell sums, made once per decomposition.
//
// Wave numbers are in units of the fundamental 2π/L of the longest box edge L: along axis d,
// k_d = n_d L / L_d for the integer index n_d (so integers in a cubic box), and the shell of a
// coefficient is ⌊|k| + 1/2⌋ (common practice, no source).
#pragma once

#include <array>
#include <cstddef>
#include <cstdint>
#include <vector>

#include "solver/distributed_fft.hpp"

namespace brume::physics {

struct SpectralShells {
  std::size_t shell_count = 0;
  double longest_edge = 1.0;                         // L, code units
  std::array<long, 3> cells{};                       // of the whole box
  std::array<std::vector<double>, 3> k;              // per x index, y index, local z plane
  std::array<std::vector<std::uint8_t>, 3> nyquist;  // 1 on the Nyquist index of an even axis
  std::vector<std::int32_t> shell;                   // per local coefficient
  // Per local coefficient: m / (2 N²), m = 2 for an x index whose conjugate partner the r2c
  // transform does not hold, 1 on the x = 0 and x Nyquist planes; N the number of cells. Then
  // Σ weight |F|² over the half spectrum is (1/2) ⟨f²⟩ (Parseval).
  std::vector<double> weight;
  std::vector<long long> mode_count;  // global: full-spectrum modes per shell
  long zero_mode = -1;                // local index of k = 0, or −1 when another rank holds it
};

// Collective over fft.comm() (the mode counts are summed over ranks).
[[nodiscard]] SpectralShells spectral_shells(const solver::DistributedFft& fft,
                                             const std::array<double, 3>& box_size);

}  // namespace brume::physics
