// Piecewise-linear reconstruction limited in characteristic variables: the differences of the
// primitive variables to both neighbours are projected on the left eigenvectors of the cell's
// own state, the slope of each wave amplitude is limited, and the limited amplitudes are
// projected back with the right eigenvectors. Stone et al. 2008, ApJS 178, 137, §4.2, steps
// 1–6 (from memory; without their characteristic tracing: the VL2 corrector needs none). Unlike
// the other reconstructions it couples the variables, so it reconstructs all of them at once
// (`cell_edges`, `reconstruct_row`); flux_sweep and face_flux test `limits_characteristics`.
#pragma once

#include <cstddef>

#include "solver/characteristic_waves.hpp"
#include "solver/reconstruction.hpp"

namespace brume::solver {

template <class Limiter>
struct PlmCharacteristic {
  static constexpr int stencil = 2;
  static constexpr bool characteristic = true;

  // Edges of every variable of cell c: lo[v], hi[v] in the order of characteristic_waves.hpp.
  // `q` reads density, vn, vt1, vt2, pressure, bt1, bt2 and the normal face field bn (as
  // FaceReaders in face_flux.hpp).
  template <class Eos, bool Magnetic, class Readers>
  static void cell_edges(const Readers& q, std::ptrdiff_t c, const Eos& eos,
                         double lo[kWaveVariables], double hi[kWaveVariables]) {
    const std::ptrdiff_t s = q.step;
    double w[3][kWaveVariables];
    for (int k = 0; k < 3; ++k) {
      const std::ptrdiff_t n = c + (k - 1) * s;
      w[k][0] = q.density(n);
      w[k][1] = q.vn(n);
      w[k][2] = q.vt1(n);
      w[k][3] = q.vt2(n);
      w[k][4] = Eos::isothermal ? 0.0 : q.pressure(n);
      w[k][5] = Magnetic ? q.bt1(n) : 0.0;
      w[k][6] = Magnetic ? q.bt2(n) : 0.0;
    }
    double dm[kWaveVariables], dp[kWaveVariables], am[kWaveVariables], ap[kWaveVariables];
    for (int v = 0; v < kWaveVariables; ++v) {
      dm[v] = w[1][v] - w[0][v];
      dp[v] = w[2][v] - w[1][v];
    }
    const double a2 = eos.sound_speed_sq(w[1][0], w[1][4]);
    double slope[kWaveVariables], dw[kWaveVariables];
    auto limit = [&](const auto& waves) {
      waves.to_waves(dm, am);
      waves.to_waves(dp, ap);
      for (int v = 0; v < kWaveVariables; ++v)
        slope[v] = Limiter::slope(am[v], ap[v]);
      waves.from_waves(slope, dw);
    };
    if constexpr (Magnetic) {
      const double bn = 0.5 * (q.bn[c] + q.bn[c + s]);
      limit(MhdWaves<Eos::isothermal>(w[1][0], a2, bn, w[1][5], w[1][6]));
    } else {
      limit(HydroWaves<Eos::isothermal>(w[1][0], a2));
    }
    // Keep each edge between the means of the two cells of its face, so that the back-projection
    // creates no new extremum in a primitive variable (common practice, no source).
    for (int v = 0; v < kWaveVariables; ++v) {
      const double l = w[1][v] - 0.5 * dw[v], h = w[1][v] + 0.5 * dw[v];
      const double l_min = dm[v] > 0.0 ? w[0][v] : w[1][v], l_max = dm[v] > 0.0 ? w[1][v] : w[0][v];
      const double h_min = dp[v] > 0.0 ? w[1][v] : w[2][v], h_max = dp[v] > 0.0 ? w[2][v] : w[1][v];
      lo[v] = l < l_min ? l_min : (l > l_max ? l_max : l);
      hi[v] = h < h_min ? h_min : (h > h_max ? h_max : h);
    }
  }
};

// Whether a reconstruction limits in characteristic variables (and so has `cell_edges`).
template <class Recon>
inline constexpr bool limits_characteristics = requires {
  Recon::characteristic;
};

// Edges of the n cells c0, c0 + 1, … for every variable: lo[v][m], hi[v][m] belong to cell
// c0 + m (only the variables of the system are written).
template <class Recon, class Eos, bool Magnetic, class Readers>
[[gnu::flatten]] void reconstruct_characteristic_row(const Readers& q, std::ptrdiff_t c0, int n,
                                                     const Eos& eos,
                                                     double* const lo[kWaveVariables],
                                                     double* const hi[kWaveVariables]) {
  double *lo0 = lo[0], *lo1 = lo[1], *lo2 = lo[2], *lo3 = lo[3], *lo4 = lo[4], *lo5 = lo[5],
         *lo6 = lo[6];
  double *hi0 = hi[0], *hi1 = hi[1], *hi2 = hi[2], *hi3 = hi[3], *hi4 = hi[4], *hi5 = hi[5],
         *hi6 = hi[6];
#pragma GCC ivdep
  for (int m = 0; m < n; ++m) {
    double l[kWaveVariables], h[kWaveVariables];
    Recon::template cell_edges<Eos, Magnetic>(q, c0 + m, eos, l, h);
    lo0[m] = l[0], hi0[m] = h[0];
    lo1[m] = l[1], hi1[m] = h[1];
    lo2[m] = l[2], hi2[m] = h[2];
    lo3[m] = l[3], hi3[m] = h[3];
    if constexpr (!Eos::isothermal) lo4[m] = l[4], hi4[m] = h[4];
    if constexpr (Magnetic) {
      lo5[m] = l[5], hi5[m] = h[5];
      lo6[m] = l[6], hi6[m] = h[6];
    }
  }
  (void)lo4, (void)hi4, (void)lo5, (void)hi5, (void)lo6, (void)hi6;
}

using PlmCharacteristicMonotonizedCentral = PlmCharacteristic<MonotonizedCentral>;
using PlmCharacteristicVanLeer = PlmCharacteristic<VanLeerLimiter>;

}  // namespace brume::solver
