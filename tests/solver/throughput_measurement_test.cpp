// Not a test: a measurement of cell-updates per second, disabled in the suite. Run with
//   brume_tests_solver --gtest_also_run_disabled_tests --gtest_filter='*Throughput*'
#include <gtest/gtest.h>

#include <chrono>
#include <cstdio>

#include "tests/solver/solver_test_support.hpp"

namespace brume::solver {
namespace {

using namespace testing;

void measure(const char* label, SchemeOptions o, int n, int steps) {
  State s = make_box_state({n, n, n}, o.magnetic, false);
  if (o.magnetic) {
    set_field_from_potential(s, [](double x, double y, double z) {
      return Vector{0.1 * std::sin(2 * kPi * y), 0.1 * std::sin(2 * kPi * z),
                    0.1 * std::sin(2 * kPi * x)};
    });
    add_uniform_field(s, {0.3, 0.0, 0.0});
  }
  set_primitive(
      s,
      [](double x, double y, double z) {
        return Primitive{1.0 + 0.1 * std::sin(2 * kPi * (x + y)), 0.5 * std::sin(2 * kPi * z),
                         0.5 * std::sin(2 * kPi * x), 0.5 * std::sin(2 * kPi * y), 1.0};
      },
      o.gamma);
  auto integrator = make_integrator(o, s.geometry, periodic_box());
  (void)integrator->advance(s, integrator->stable_time_step(s));  // warm-up
  const auto start = std::chrono::steady_clock::now();
  for (int i = 0; i < steps; ++i) {
    ASSERT_TRUE(integrator->advance(s, integrator->stable_time_step(s)).ok());
  }
  const double seconds =
      std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
  std::printf("%-28s %d^3: %.3g cell-updates/s (%d steps, %.2f s)\n", label, n,
              double(s.geometry.interior_cells()) * steps / seconds, steps, seconds);
}

TEST(DISABLED_Throughput, Periodic64CubedBox) {
  SchemeOptions mhd;
  mhd.magnetic = true;
  mhd.reconstruction = Reconstruction::plm;
  mhd.riemann = RiemannSolver::hlld;
  measure("MHD PLM HLLD", mhd, 64, 10);
  mhd.riemann = RiemannSolver::hlle;
  measure("MHD PLM HLLE", mhd, 64, 10);
  mhd.reconstruction = Reconstruction::ppm;
  mhd.riemann = RiemannSolver::hlld;
  measure("MHD PPM HLLD", mhd, 64, 10);
  SchemeOptions hydro;
  hydro.magnetic = false;
  hydro.reconstruction = Reconstruction::plm;
  hydro.riemann = RiemannSolver::hllc;
  measure("hydro PLM HLLC", hydro, 64, 10);
}

}  // namespace
}  // namespace brume::solver
