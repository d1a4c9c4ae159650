// Toro's five hydrodynamic shock tubes against the exact Riemann solution:
// Toro 2009, Riemann Solvers and Numerical Methods for Fluid Dynamics, 3rd ed., §4.3.3, Table 4.1
// (initial data) and Table 4.2 (exact star states), both from memory. Scheme: the presets' PLM
// (MC limiter) + HLLC, CFL 0.4, with brume's first-order fallback for cells that lose positivity.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "tests/reference/exact_riemann.hpp"
#include "tests/verification/shocks_tube_run.hpp"

namespace brume::shocks {
namespace {

struct ToroCase {
  const char* preset;
  double p_star, u_star, rho_star_left, rho_star_right;  // Toro 2009 Table 4.2, from memory
  double table_precision;  // relative half-unit of the last digit the table lists
  double mean_bound;       // plateau means of ρ and u, relative
  double pressure_bound;   // plateau mean of p, relative
  double cell_bound;       // every plateau cell, relative
};

reference::EulerState side_state(const config::ResolvedConfig& c, const std::string& side) {
  const std::string k = "problem.shock_tube." + side;
  return {c.real(k + "_density"), c.reals3(k + "_velocity")[0], c.real(k + "_pressure")};
}

reference::ExactRiemann exact_solution(const std::string& preset) {
  const auto c = config::load(app::brume_schema(), preset_path(preset), {});
  return {side_state(c, "left"), side_state(c, "right"), c.real("gas.adiabatic_index")};
}

// Mean |ρ − ρ_exact| over the cells, the exact solution sampled at the cell centres.
double l1_density(const TubeRun& run, const reference::ExactRiemann& exact) {
  const Profile p = profile(run);
  double sum = 0.0;
  for (std::size_t i = 0; i < p.size(); ++i)
    sum += std::fabs(p.density[i] - exact.sample((p.x[i] - run.interface) / run.stop_time).density);
  return sum / double(p.size());
}

// The speeds bounding the star region: the inner edge of the left and the right wave.
std::array<double, 2> star_region(const reference::ExactRiemann& e) {
  const auto& s = e.star();
  const double g = e.gamma();
  const double left =
      s.left_shock ? e.shock_speed(false) : s.velocity - std::sqrt(g * s.pressure / s.density_left);
  const double right = s.right_shock ? e.shock_speed(true)
                                     : s.velocity + std::sqrt(g * s.pressure / s.density_right);
  return {left, right};
}

// Relative errors of the sampled cells of a plateau.
struct Plateau {
  int count = 0;
  double sum = 0.0, worst = 0.0;
  void add(double e) {
    ++count;
    sum += e;
    worst = std::max(worst, std::fabs(e));
  }
  [[nodiscard]] double mean() const { return count ? sum / count : 0.0; }
};

class ToroTube : public ::testing::TestWithParam<ToroCase> {};

TEST_P(ToroTube, PresetMatchesThePublishedStarState) {
  const ToroCase& tc = GetParam();
  const reference::ExactRiemann exact = exact_solution(tc.preset);
  const auto& s = exact.star();
  // Table 4.2 lists five to six significant digits (test 2: three for p*): 0.1 % (test 2:
  // 0.3 %) covers the rounding of the table and of Table 4.1; a wrong preset digit fails it.
  const double tol = tc.table_precision;
  EXPECT_NEAR(s.pressure, tc.p_star, tol * tc.p_star);
  EXPECT_NEAR(s.velocity, tc.u_star, tol * std::max(std::fabs(tc.u_star), 1.0));
  EXPECT_NEAR(s.density_left, tc.rho_star_left, tol * tc.rho_star_left);
  EXPECT_NEAR(s.density_right, tc.rho_star_right, tol * tc.rho_star_right);
}

TEST_P(ToroTube, StarStateWithinOnePercentAndL1ErrorFalls) {
  const ToroCase& tc = GetParam();
  const reference::ExactRiemann exact = exact_solution(tc.preset);
  const auto& star = exact.star();
  std::array<double, 3> l1{};
  const int cells[3] = {100, 200, 400};
  TubeRun fine;
  for (int r = 0; r < 3; ++r) {
    TubeRun run = run_preset(tc.preset, cells_along_x(cells[r]));
    ASSERT_FALSE(run.failed) << tc.preset << " at " << cells[r] << " cells";
    l1[std::size_t(r)] = l1_density(run, exact);
    std::printf("%s n=%d L1(rho)=%.4g steps=%ld fallback cells=%ld floors=%ld %.2fs\n", tc.preset,
                cells[r], l1[std::size_t(r)], run.steps, run.fallback_cells, run.floors,
                run.seconds);
    if (r == 2) fine = std::move(run);
  }
  // Discontinuities bound L1 convergence to first order, less at contacts (common practice, no
  // source): require a fall by ≥ 1.25 per doubling, well below the ≈ 1.5–2 PLM reaches.
  EXPECT_GT(l1[0] / l1[1], 1.25) << l1[0] << " " << l1[1];
  EXPECT_GT(l1[1] / l1[2], 1.25) << l1[1] << " " << l1[2];

  // The plateaus, sampled at 400 cells at least `margin` cells from every wave edge (shocks and
  // contacts are smeared over a few cells, the contact more as it ages: common practice).
  const Profile p = profile(fine);
  const double dx = fine.state.geometry.spacing[0], t = fine.stop_time;
  const auto [left_edge, right_edge] = star_region(exact);
  const double margin = 6 * dx;
  const double contact = fine.interface + star.velocity * t;
  const double lo = fine.interface + left_edge * t + margin;
  const double hi = fine.interface + right_edge * t - margin;
  // Velocity relative to the star sound speed where u* ≈ 0 (test 2) makes 1 % meaningful.
  const double c_star = std::sqrt(exact.gamma() * star.pressure / star.density_left);
  const double u_scale = std::max(std::fabs(star.velocity), c_star);
  std::array<Plateau, 2> rho;  // left and right of the contact
  Plateau u, pr;
  for (std::size_t i = 0; i < p.size(); ++i) {
    if (p.x[i] < lo || p.x[i] > hi) continue;
    u.add((p.velocity[0][i] - star.velocity) / u_scale);
    pr.add(p.pressure[i] / star.pressure - 1.0);
    if (std::fabs(p.x[i] - contact) < margin) continue;
    const bool left = p.x[i] < contact;
    rho[left ? 0 : 1].add(p.density[i] / (left ? star.density_left : star.density_right) - 1.0);
  }
  const double mean_rho = std::max(std::fabs(rho[0].mean()), std::fabs(rho[1].mean()));
  const double worst_rho = std::max(rho[0].worst, rho[1].worst);
  std::printf(
      "%s plateau %d+%d cells: mean rel. error rho %.3g u %.3g p %.3g; worst cell rho "
      "%.3g u %.3g p %.3g\n",
      tc.preset, rho[0].count, rho[1].count, mean_rho, std::fabs(u.mean()), std::fabs(pr.mean()),
      worst_rho, u.worst, pr.worst);
  // Enough plateau to sample on both sides of the contact (otherwise the check proves nothing).
  EXPECT_GE(rho[0].count, 3);
  EXPECT_GE(rho[1].count, 3);
  // The plateau values (means over the sampled cells) within 1 % of the exact star state at 400
  // cells: the target of brume's verification plan (common practice, no source).
  EXPECT_LT(mean_rho, tc.mean_bound);
  EXPECT_LT(std::fabs(u.mean()), tc.mean_bound);
  EXPECT_LT(std::fabs(pr.mean()), tc.pressure_bound);
  // Every sampled cell within the case's bound (post-shock noise, start-up errors: see the list).
  EXPECT_LT(worst_rho, tc.cell_bound);
  EXPECT_LT(u.worst, tc.cell_bound);
  EXPECT_LT(pr.worst, tc.cell_bound);
}

// Test 2 at 400 cells misses 1 % (mean ρ 9.9 %, p 40 %) with every combination tried: HLLC
// and HLLE agree to 0.1 %, PPM (ρ −18 %, p 36 %), van Leer (p 62 %), donor cell (p 158 %) and
// Courant numbers 0.1–0.8 do no better; no floor or fallback acts. The sampled "plateau" still
// carries the smeared tails of the two rarefactions (u = ±0.05 at its ends where u* = 0, against
// c* = 0.35), and p* = 0.5 % of the initial pressure makes p the most sensitive quantity. A
// defect would not converge; this error does, at first order: mean p error 0.40, 0.21, 0.098,
// 0.041 at 400, 800, 1600, 3200 cells (and 0.8 % at 12800), measured. Checked: the mean plateau
// pressure error falls by ≥ 1.6 per doubling (first-order convergence allows for the 1.9–2.4
// measured; common practice, no source), and at 3200 cells p within 6 % and ρ within 4 %
// (measured 4.1 % and 2.6 %; ρ converges unevenly, +10 %, −0.3 %, −3.2 %, −2.6 %).
TEST(ToroNearVacuum, StarStateOfTest2ConvergesAtFirstOrder) {
  const reference::ExactRiemann exact = exact_solution("toro2");
  const auto& star = exact.star();
  const auto [left_edge, right_edge] = star_region(exact);
  // Why 400 cells cannot hold the plateau to 1 %: the gas in the exact star region at t = 0.15,
  // ρ* (right − left edge) t, is less than the mass of one initial cell (ρ = 1, Δx = 1/400) — the
  // whole plateau is made of the half cells beside the initial jump, the cells the scheme's
  // start-up dissipation heats (a mass argument, common practice, no source). Its entropy
  // p/ρ^γ, 0.4 in the exact isentropic solution, is measured and printed below.
  const double plateau_mass = star.density_left * (right_edge - left_edge) * 0.15;
  EXPECT_LT(plateau_mass / (1.0 / 400.0), 1.0);
  std::printf("toro2 exact plateau mass %.4g = %.3f initial cells at 400 cells\n", plateau_mass,
              plateau_mass * 400.0);
  std::array<double, 4> p_error{}, rho_error{};
  for (int r = 0; r < 4; ++r) {
    const int n = 400 << r;
    const TubeRun run = run_preset("toro2", cells_along_x(n));
    ASSERT_FALSE(run.failed) << n;
    const Profile p = profile(run);
    const double margin = 6 * run.state.geometry.spacing[0], t = run.stop_time;
    Plateau rho, pr, entropy;
    for (std::size_t i = 0; i < p.size(); ++i) {
      if (p.x[i] < run.interface + left_edge * t + margin) continue;
      if (p.x[i] > run.interface + right_edge * t - margin) continue;
      pr.add(p.pressure[i] / star.pressure - 1.0);
      rho.add(p.density[i] / star.density_left - 1.0);
      entropy.add(p.pressure[i] / std::pow(p.density[i], exact.gamma()) / 0.4 - 1.0);
    }
    ASSERT_GE(pr.count, 10) << n;
    p_error[std::size_t(r)] = std::fabs(pr.mean());
    rho_error[std::size_t(r)] = std::fabs(rho.mean());
    std::printf("toro2 n=%d plateau %d cells: mean rel. error rho %.4f p %.4f, entropy %+.4f\n", n,
                pr.count, rho_error[std::size_t(r)], p_error[std::size_t(r)], entropy.mean());
    // The plateau's gas was heated (entropy raised) at start-up, and the excess falls with Δx.
    EXPECT_GT(entropy.mean(), 0.0) << n;
  }
  for (std::size_t r = 1; r < 4; ++r)
    EXPECT_GT(p_error[r - 1] / p_error[r], 1.6) << r;
  EXPECT_LT(p_error[3], 0.06);
  EXPECT_LT(rho_error[3], 0.04);
}

INSTANTIATE_TEST_SUITE_P(
    Table41, ToroTube,
    // Bounds: the 1 % target wherever brume meets it. Test 2 (the 123 problem) leaves a near-vacuum
    // star region, p* = 0.5 % of the initial pressure, 30 cells wide at 400 cells, not yet
    // resolved there (see ToroNearVacuum.StarStateOfTest2ConvergesAtFirstOrder): measured mean ρ
    // 9.9 %, p 40 %: bounds 12 % and 50 % guard these figures. Tests 3–5: single cells next to the
    // narrow plateaus and the post-shock noise of the slow left shock of test 5 reach 1.6–3.4 %
    // (measured): 4 %.
    ::testing::Values(
        ToroCase{"toro1", 0.30313, 0.92745, 0.42632, 0.26557, 1e-3, 0.01, 0.01, 0.01},
        ToroCase{"toro2", 0.00189, 0.0, 0.02185, 0.02185, 3e-3, 0.12, 0.5, 0.5},
        ToroCase{"toro3", 460.894, 19.5975, 0.57506, 5.99924, 1e-3, 0.01, 0.01, 0.04},
        ToroCase{"toro4", 46.0950, -6.19633, 5.99242, 0.57511, 1e-3, 0.01, 0.01, 0.04},
        ToroCase{"toro5", 1691.64, 8.68975, 14.2823, 31.0426, 1e-3, 0.01, 0.01, 0.04}),
    [](const auto& test) { return std::string(test.param.preset); });

}  // namespace
}  // namespace brume::shocks
