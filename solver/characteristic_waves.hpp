// Left and right eigenvectors of the one-dimensional equations in primitive variables, applied to
// a difference of states without forming matrices: `to_waves` gives the wave amplitudes
// a = L δw, `from_waves` the difference δw = R a. Variables in the sweep order of SweepRows:
// 0 ρ, 1 v_n, 2 v_t1, 3 v_t2, 4 p, 5 B_t1, 6 B_t2 (p unused for isothermal gas, B for
// hydrodynamics). Select-based, so that a loop over cells vectorizes.
//
// MHD: Roe & Balsara 1996, SIAM J. Appl. Math. 56, 57, eqs. 2.13–2.21 (normalization by α_f, α_s
// and β, from memory), in primitive form as in Stone et al. 2008, ApJS 178, 137, appendix A
// (eqs. A10–A12 adiabatic, A16–A18 isothermal, from memory); the vectors here were re-derived
// and are checked against the Jacobian in tests/solver/characteristic_waves_test.cpp.
// Wave order (amplitude index): MHD fast−, Alfvén−, slow−, entropy, slow+, Alfvén+, fast+;
// hydrodynamics sound−, shear t1, shear t2, entropy, sound+ (isothermal gas: no entropy wave).
#pragma once

#include <cmath>

namespace brume::solver {

inline constexpr int kWaveVariables = 7;

// Euler equations; a2 the squared sound speed.
template <bool Isothermal>
struct HydroWaves {
  double rho, a, a2;

  HydroWaves(double density, double sound_speed_sq)
      : rho(density), a(std::sqrt(sound_speed_sq)), a2(sound_speed_sq) {}

  // Sound waves R± = (ρ, ±a, 0, 0, ρa²), L± = (0 | a²/ρ isothermal, ±a, 0, 0, 1/ρ) / (2a²);
  // entropy R = e_ρ, L = (1, 0, 0, 0, −1/a²); shear waves e_vt1, e_vt2 (from memory).
  void to_waves(const double d[kWaveVariables], double w[kWaveVariables]) const {
    const double n = 0.5 / a2;
    // The pressure (adiabatic) or the density (isothermal) carries the compression.
    const double compression = Isothermal ? a2 * d[0] / rho : d[4] / rho;
    w[0] = n * (compression - a * d[1]);
    w[1] = d[2];
    w[2] = d[3];
    w[3] = Isothermal ? 0.0 : d[0] - d[4] / a2;
    w[4] = n * (compression + a * d[1]);
    w[5] = w[6] = 0.0;
  }

  void from_waves(const double w[kWaveVariables], double d[kWaveVariables]) const {
    const double sum = w[0] + w[4];
    d[0] = rho * sum + (Isothermal ? 0.0 : w[3]);
    d[1] = a * (w[4] - w[0]);
    d[2] = w[1];
    d[3] = w[2];
    d[4] = Isothermal ? 0.0 : rho * a2 * sum;
    d[5] = d[6] = 0.0;
  }
};

// Ideal-MHD equations with normal field bn; a2 the squared sound speed, bt1, bt2 the tangential
// field.
template <bool Isothermal>
struct MhdWaves {
  double rho, sqrt_rho, a2, cf, cs;
  double alpha_f, alpha_s, beta1, beta2, sign;

  MhdWaves(double density, double sound_speed_sq, double bn, double bt1, double bt2)
      : rho(density), sqrt_rho(std::sqrt(density)), a2(sound_speed_sq) {
    const double ca2 = bn * bn / rho;
    const double bt_sq = bt1 * bt1 + bt2 * bt2;
    const double bt2_rho = bt_sq / rho;
    const double b2 = ca2 + bt2_rho;
    // c_f² − c_s² = sqrt((a² − b²)² + 4 a² b_t²/ρ): the form without cancellation.
    const double excess = a2 - b2;
    const double spread = std::sqrt(excess * excess + 4.0 * a2 * bt2_rho);
    cf = std::sqrt(0.5 * (a2 + b2 + spread));
    const double cf2 = cf * cf;
    cs = std::sqrt(cf2 > 0.0 ? a2 * ca2 / (cf2 > 0.0 ? cf2 : 1.0) : 0.0);  // c_f c_s = a c_a
    // α_f² ∝ a² − c_s², α_s² ∝ c_f² − a², whose product is a² b_t²/ρ: the larger factor from
    // ½(|a² − b²| + spread), the smaller from the product (no cancellation as b_t → 0).
    const double large = 0.5 * (std::fabs(excess) + spread);
    const double small = large > 0.0 ? a2 * bt2_rho / (large > 0.0 ? large : 1.0) : 0.0;
    const bool sound_faster = excess >= 0.0;
    const double af2 = sound_faster ? large : small;
    const double as2 = sound_faster ? small : large;
    const double total = af2 + as2;
    // Triple umbilic (b_t = 0, c_a = a): any normalized pair is valid; take the fast wave.
    const bool umbilic = !(total > 0.0);
    alpha_f = umbilic ? 1.0 : std::sqrt(af2 / (umbilic ? 1.0 : total));
    alpha_s = umbilic ? 0.0 : std::sqrt(as2 / (umbilic ? 1.0 : total));
    // β: the direction of the tangential field, (1, 1)/√2 when it vanishes (Roe & Balsara 1996,
    // eq. 2.21, from memory).
    const double bt = std::sqrt(bt_sq);
    const bool has_bt = bt > 0.0;
    const double inv_bt = 1.0 / (has_bt ? bt : 1.0);
    beta1 = has_bt ? bt1 * inv_bt : std::sqrt(0.5);
    beta2 = has_bt ? bt2 * inv_bt : std::sqrt(0.5);
    sign = bn < 0.0 ? -1.0 : 1.0;
  }

  // Right vectors (ρ, v_n, v_t, p, B_t), S = sign B_n, Q = S α c, A = α a √ρ, β⊥ = (−β2, β1):
  //   fast±  (ρα_f, ±α_f c_f, ∓Q_s β, ρa²α_f, A_s β)    slow± (ρα_s, ±α_s c_s, ±Q_f β, ρa²α_s, −A_f
  //   β) Alfvén± (0, 0, β⊥, 0, ∓S√ρ β⊥)                     entropy (1, 0, 0, 0, 0)
  // Left vectors: fast± (2a²)⁻¹ (0, ±α_f c_f, ∓Q_s β, α_f/ρ, A_s β/ρ), slow± (2a²)⁻¹ (0,
  // ±α_s c_s, ±Q_f β, α_s/ρ, −A_f β/ρ), Alfvén± ½ (0, 0, β⊥, 0, ∓S β⊥/√ρ), entropy (1, 0, 0,
  // 0, −1/a²); isothermal gas moves the p entries to ρ with the factor a² (no entropy wave).
  void to_waves(const double d[kWaveVariables], double w[kWaveVariables]) const {
    const double a = std::sqrt(a2);
    const double n = 0.5 / a2;
    const double inv_rho = 1.0 / rho, inv_sqrt_rho = 1.0 / sqrt_rho;
    const double v_par = beta1 * d[2] + beta2 * d[3], v_perp = -beta2 * d[2] + beta1 * d[3];
    const double b_par = beta1 * d[5] + beta2 * d[6], b_perp = -beta2 * d[5] + beta1 * d[6];
    const double qf = sign * alpha_f * cf, qs = sign * alpha_s * cs;
    const double af = alpha_f * a * sqrt_rho, as = alpha_s * a * sqrt_rho;
    const double compression = Isothermal ? a2 * d[0] * inv_rho : d[4] * inv_rho;
    const double fast_even = n * (alpha_f * compression + as * b_par * inv_rho);
    const double fast_odd = n * (alpha_f * cf * d[1] - qs * v_par);
    const double slow_even = n * (alpha_s * compression - af * b_par * inv_rho);
    const double slow_odd = n * (alpha_s * cs * d[1] + qf * v_par);
    const double alfven_even = 0.5 * v_perp, alfven_odd = 0.5 * sign * b_perp * inv_sqrt_rho;
    w[0] = fast_even - fast_odd;
    w[1] = alfven_even + alfven_odd;
    w[2] = slow_even - slow_odd;
    w[3] = Isothermal ? 0.0 : d[0] - d[4] / a2;
    w[4] = slow_even + slow_odd;
    w[5] = alfven_even - alfven_odd;
    w[6] = fast_even + fast_odd;
  }

  void from_waves(const double w[kWaveVariables], double d[kWaveVariables]) const {
    const double a = std::sqrt(a2);
    const double qf = sign * alpha_f * cf, qs = sign * alpha_s * cs;
    const double af = alpha_f * a * sqrt_rho, as = alpha_s * a * sqrt_rho;
    const double fast_sum = w[0] + w[6], fast_diff = w[6] - w[0];
    const double slow_sum = w[2] + w[4], slow_diff = w[4] - w[2];
    const double compression = alpha_f * fast_sum + alpha_s * slow_sum;
    d[0] = rho * compression + (Isothermal ? 0.0 : w[3]);
    d[1] = alpha_f * cf * fast_diff + alpha_s * cs * slow_diff;
    const double v_par = -qs * fast_diff + qf * slow_diff;
    const double v_perp = w[1] + w[5];
    const double b_par = as * fast_sum - af * slow_sum;
    const double b_perp = sign * sqrt_rho * (w[1] - w[5]);
    d[2] = beta1 * v_par - beta2 * v_perp;
    d[3] = beta2 * v_par + beta1 * v_perp;
    d[4] = Isothermal ? 0.0 : rho * a2 * compression;
    d[5] = beta1 * b_par - beta2 * b_perp;
    d[6] = beta2 * b_par + beta1 * b_perp;
  }
};

}  // namespace brume::solver
