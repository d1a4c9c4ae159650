// High-resolution runs of the MHD presets, made once per test binary and shared by its tests
// (self-convergence: a coarser run is compared with the finest brume run of the same tube).
#pragma once

#include <map>
#include <string>

#include "tests/verification/shocks_tube_run.hpp"

namespace brume::shocks {

// Cells of the reference runs: 8× the finest compared run (512), so that the reference's own
// error is ≈ 8× smaller at first order and averages over whole coarse cells.
inline constexpr int reference_cells = 4096;

inline const TubeRun& reference_run(const std::string& preset) {
  static std::map<std::string, TubeRun> cache;
  auto it = cache.find(preset);
  if (it == cache.end()) {
    it = cache.emplace(preset, run_preset(preset, cells_along_x(reference_cells))).first;
  }
  return it->second;
}

// The reference averaged over the n coarse cells that tile it (primitive variables).
inline Profile coarsened(const Profile& fine, int n) {
  const std::size_t ratio = fine.size() / std::size_t(n);
  Profile p;
  auto average = [&](const std::vector<double>& q, std::size_t c) {
    double sum = 0.0;
    for (std::size_t i = c * ratio; i < (c + 1) * ratio; ++i)
      sum += q[i];
    return sum / double(ratio);
  };
  for (std::size_t c = 0; c < std::size_t(n); ++c) {
    p.x.push_back(average(fine.x, c));
    p.density.push_back(average(fine.density, c));
    p.pressure.push_back(average(fine.pressure, c));
    for (std::size_t k = 0; k < 3; ++k) {
      p.velocity[k].push_back(average(fine.velocity[k], c));
      p.field[k].push_back(average(fine.field[k], c));
    }
  }
  return p;
}

struct L1Errors {
  double density = 0, velocity = 0, field = 0;  // mean |Δρ|, mean |Δv|, mean |ΔB| (vectors)
};

// Mean absolute differences over cells [first, last) of a and b (same cells).
inline L1Errors l1_difference(const Profile& a, const Profile& b, std::size_t first = 0,
                              std::size_t last = 0) {
  if (last == 0) last = a.size();
  L1Errors e;
  for (std::size_t i = first; i < last; ++i) {
    e.density += std::fabs(a.density[i] - b.density[i]);
    double dv2 = 0.0, db2 = 0.0;
    for (std::size_t k = 0; k < 3; ++k) {
      dv2 += std::pow(a.velocity[k][i] - b.velocity[k][i], 2);
      db2 += std::pow(a.field[k][i] - b.field[k][i], 2);
    }
    e.velocity += std::sqrt(dv2);
    e.field += std::sqrt(db2);
  }
  const double n = double(last - first);
  return {e.density / n, e.velocity / n, e.field / n};
}

}  // namespace brume::shocks
