// Locating the waves of a 1D MHD Riemann-problem profile by their jump signatures, so that a
// run can be checked wave by wave against a finer run of the same tube.
//
// Criteria (jump conditions of ideal MHD, e.g. Brio & Wu 1988, J. Comput. Phys. 75, 400, §2, and
// Ryu & Jones 1995, ApJ 442, 228, §2; common practice, no source for the thresholds):
// - a discontinuity is a run of cells where some quantity q (ρ, p, v_n, B_t1, B_t2) changes by
//   more than `steep` × (its range over the tube) across 2h + 1 cells; its position is the
//   centroid of that windowed change. Across it (just outside the run):
//   - contact: ρ jumps, p and B_t do not;
//   - rotational discontinuity: B_t turns, ρ and p do not;
//   - shock: ρ and p jump together, the dense side at the higher pressure; fast if |B_t| grows
//     with ρ, slow if it falls; intermediate (the shock of a compound wave) if B_t1 reverses.
// - runs closer than `merge` cells are one wave (the shock of a compound wave with its noise);
// - a rarefaction is a gap between discontinuities (or the tube's ends) across which some q
//   changes by more than `fan` of its range with no steep cell; fast or slow as for shocks (by
//   the signs of the changes of ρ and |B_t|); its position is where the q that changes most
//   crosses the mean of its end values.
#pragma once

#include <algorithm>
#include <cmath>
#include <string>
#include <vector>

#include "tests/verification/shocks_tube_run.hpp"

namespace brume::shocks {

enum class WaveKind {
  fast_rarefaction,
  slow_rarefaction,
  fast_shock,
  slow_shock,
  intermediate_shock,
  rotational,
  contact,
  unclassified
};

inline const char* wave_name(WaveKind k) {
  switch (k) {
    case WaveKind::fast_rarefaction:
      return "FR";
    case WaveKind::slow_rarefaction:
      return "SR";
    case WaveKind::fast_shock:
      return "FS";
    case WaveKind::slow_shock:
      return "SS";
    case WaveKind::intermediate_shock:
      return "IS";
    case WaveKind::rotational:
      return "RD";
    case WaveKind::contact:
      return "C";
    case WaveKind::unclassified:
      return "?";
  }
  return "?";
}

struct Wave {
  WaveKind kind;
  double position;
};

struct FinderSettings {
  int half_window = 3;  // h, cells
  int merge = 3;        // runs fewer cells apart than this are one wave
  double steep = 0.04;  // windowed change marking a discontinuity, fraction of the range
  double fan = 0.02;    // change of ρ across a gap marking a rarefaction, fraction of range
  double quiet = 0.01;  // relative jump below which a quantity "does not jump"
  double turn = 0.05;   // turn of B_t (rad) marking a rotational discontinuity
};

namespace detail {

inline double range(const std::vector<double>& q) {
  const auto [lo, hi] = std::minmax_element(q.begin(), q.end());
  return *hi - *lo;
}

inline double transverse_magnitude(const Profile& p, std::size_t i) {
  return std::hypot(p.field[1][i], p.field[2][i]);
}

// Classification from the states at cells a (left) and b (right).
inline WaveKind classify_jump(const Profile& p, std::size_t a, std::size_t b,
                              const FinderSettings& f) {
  const double rho = 0.5 * (p.density[a] + p.density[b]);
  const double pr = 0.5 * (p.pressure[a] + p.pressure[b]);
  const double bt_a = transverse_magnitude(p, a), bt_b = transverse_magnitude(p, b);
  const double bt = std::max(0.5 * (bt_a + bt_b), 1e-12);
  const double d_rho = (p.density[b] - p.density[a]) / rho;
  const double d_p = (p.pressure[b] - p.pressure[a]) / pr;
  const double d_bt = (bt_b - bt_a) / bt;
  const double angle =
      std::atan2(p.field[2][b], p.field[1][b]) - std::atan2(p.field[2][a], p.field[1][a]);
  const double turn = std::fabs(std::remainder(angle, 2.0 * 3.14159265358979323846));
  const bool reversal = p.field[1][a] * p.field[1][b] < 0.0 && std::fabs(p.field[2][a]) < 1e-9 &&
                        std::fabs(p.field[2][b]) < 1e-9;
  if (std::fabs(d_rho) > f.quiet && std::fabs(d_p) > f.quiet && d_rho * d_p > 0.0) {
    if (reversal) return WaveKind::intermediate_shock;
    return d_bt * d_rho > 0.0 ? WaveKind::fast_shock : WaveKind::slow_shock;
  }
  if (std::fabs(d_rho) > f.quiet && std::fabs(d_p) <= f.quiet && std::fabs(d_bt) <= f.quiet &&
      turn <= f.turn) {
    return WaveKind::contact;
  }
  if (turn > f.turn && std::fabs(d_rho) <= f.quiet && std::fabs(d_p) <= f.quiet) {
    return WaveKind::rotational;
  }
  return WaveKind::unclassified;
}

}  // namespace detail

// The waves of the profile from left to right.
inline std::vector<Wave> find_waves(const Profile& p, const FinderSettings& f) {
  const std::size_t n = p.size(), h = std::size_t(f.half_window);
  const std::vector<const std::vector<double>*> quantities{&p.density, &p.pressure, &p.velocity[0],
                                                           &p.field[1], &p.field[2]};
  std::vector<double> scale;
  for (const auto* q : quantities)
    scale.push_back(std::max(detail::range(*q), 1e-12));
  // Windowed change, the largest over the quantities in units of their ranges.
  std::vector<double> jump(n, 0.0);
  for (std::size_t i = h; i + h < n; ++i) {
    for (std::size_t k = 0; k < quantities.size(); ++k) {
      const auto& q = *quantities[k];
      jump[i] = std::max(jump[i], std::fabs(q[i + h] - q[i - h]) / scale[k]);
    }
  }
  struct Run {
    std::size_t first, last;
    double weight, centroid;
  };
  std::vector<Run> runs;
  for (std::size_t i = 0; i < n; ++i) {
    if (jump[i] < f.steep) continue;
    std::size_t j = i;
    double weight = 0.0, moment = 0.0;
    while (j < n && jump[j] >= f.steep) {
      weight += jump[j];
      moment += jump[j] * p.x[j];
      ++j;
    }
    // Runs closer than a window belong to one wave (a compound wave, a noisy shock).
    if (!runs.empty() && i <= runs.back().last + std::size_t(f.merge)) {
      Run& r = runs.back();
      const double w0 = r.weight;
      r.last = j - 1;
      r.weight += weight;
      r.centroid = (r.centroid * w0 + moment) / r.weight;
    } else {
      runs.push_back({i, j - 1, weight, moment / weight});
    }
    i = j;
  }
  std::vector<Wave> waves;
  // The gap before run r (r = runs.size(): after the last run), bounded by cells a < b.
  auto gap = [&](std::size_t a, std::size_t b) {
    if (b <= a + 2) return;
    // The quantity that changes most across the gap, relative to its range.
    std::size_t best = 0;
    double change = 0.0;
    for (std::size_t k = 0; k < quantities.size(); ++k) {
      const double c = std::fabs((*quantities[k])[b] - (*quantities[k])[a]) / scale[k];
      if (c > change) change = c, best = k;
    }
    if (change < f.fan) return;
    const double d_rho = p.density[b] - p.density[a];
    const double d_bt = detail::transverse_magnitude(p, b) - detail::transverse_magnitude(p, a);
    const WaveKind kind =
        d_bt * d_rho > 0.0 ? WaveKind::fast_rarefaction : WaveKind::slow_rarefaction;
    const auto& q = *quantities[best];
    const double middle = 0.5 * (q[a] + q[b]);
    for (std::size_t i = a; i < b; ++i) {
      if ((q[i] - middle) * (q[i + 1] - middle) <= 0.0 && q[i + 1] != q[i]) {
        const double s = (middle - q[i]) / (q[i + 1] - q[i]);
        waves.push_back({kind, p.x[i] + s * (p.x[i + 1] - p.x[i])});
        return;
      }
    }
  };
  std::size_t previous_end = 0;
  for (const Run& r : runs) {
    const std::size_t a = r.first >= h ? r.first - h : 0;
    const std::size_t b = std::min(r.last + h, n - 1);
    gap(previous_end, a);
    waves.push_back({detail::classify_jump(p, a, b, f), r.centroid});
    previous_end = b;
  }
  gap(previous_end, n - 1);
  return waves;
}

inline std::string wave_sequence(const std::vector<Wave>& waves) {
  std::string s;
  for (const Wave& w : waves)
    s += std::string(s.empty() ? "" : " ") + wave_name(w.kind);
  return s;
}

}  // namespace brume::shocks
