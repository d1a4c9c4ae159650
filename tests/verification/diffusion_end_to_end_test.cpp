// Viscosity and resistivity through the whole run step: the field-loop input (problems/
// field_loop.yaml) set up through the schema, its state replaced by a static equilibrium of ideal
// MHD, and advanced by the split integrator (diffusion by dt/2, the ideal-MHD step, diffusion by
// dt/2) that `brume run` builds. The equilibria: a shear flow v_y(x) in uniform gas, and a field
// B_y(x) with p + B²/2 uniform (straight field lines, no tension); the ideal step leaves both at
// rest (common practice, no source), so their decay is the diffusive one, exp(−ν k² t) and
// exp(−η k² t) (Landau & Lifshitz 1987, Fluid Mechanics, §24; Jackson 1999, Classical
// Electrodynamics, §5.18; both from memory).
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <memory>
#include <string>
#include <vector>

#include "app/scheme_choice.hpp"
#include "app/source_terms.hpp"
#include "app/split_integrator.hpp"
#include "physics/diffusion_term.hpp"
#include "tests/verification/mhd2d_problem_run.hpp"

namespace brume::verification {
namespace {

constexpr double kPi = 3.14159265358979323846;
constexpr double kDiffusivity = 0.5;  // code units, pc² / Myr
constexpr double kGamma = 5.0 / 3.0;
// One wavelength over the box's 2 code lengths along x, 64 cells.
constexpr double kWavenumber = kPi;

enum class Equilibrium { shear_flow, field_sheet };

struct Decay {
  double rate = 0.0;
  int stages = 0;
  long steps = 0;
  double divergence = 0.0;
};

// Sets the equilibrium on the interior (face fields first, then the cells).
void set_equilibrium(solver::State& s, Equilibrium e) {
  const solver::BlockGeometry& g = s.geometry;
  const double speed = 0.01, field = 0.1;
  for (auto& f : s.face_field)
    std::fill(f.begin(), f.end(), 0.0);
  for (int j = 0; j < g.cells[1] + 1; ++j) {
    for (int i = 0; i < g.cells[0]; ++i) {
      const double b =
          e == Equilibrium::field_sheet ? field * std::sin(kWavenumber * g.centre(0, i)) : 0.0;
      s.face_field[1][g.index(i, j, 0)] = b;
    }
  }
  for (int j = 0; j < g.cells[1]; ++j) {
    for (int i = 0; i < g.cells[0]; ++i) {
      const std::ptrdiff_t c = g.index(i, j, 0);
      const double vy =
          e == Equilibrium::shear_flow ? speed * std::sin(kWavenumber * g.centre(0, i)) : 0.0;
      const double by = solver::cell_field(s, 1, c);
      // p + B²/2 = 1: the magnetic pressure of the sheet is taken from the thermal one.
      const double pressure = 1.0 - 0.5 * by * by;
      s.density[c] = 1.0;
      s.momentum[0][c] = 0.0;
      s.momentum[1][c] = vy;
      s.momentum[2][c] = 0.0;
      s.energy[c] = pressure / (kGamma - 1.0) + 0.5 * vy * vy + 0.5 * by * by;
    }
  }
}

// Projection of v_y or B_y on sin(k x).
double amplitude(const solver::State& s, Equilibrium e) {
  const solver::BlockGeometry& g = s.geometry;
  return 2.0 / double(g.interior_cells()) * interior_sum(s, [&](std::ptrdiff_t c) {
           const double q = e == Equilibrium::shear_flow ? s.momentum[1][c] / s.density[c]
                                                         : solver::cell_field(s, 1, c);
           return q * std::sin(kWavenumber * g.centre(0, g.position(c)[0]));
         });
}

Decay run_decay(Equilibrium e) {
  const std::string value = std::to_string(kDiffusivity) + " pc^2 Myr^-1";
  ProblemRun run = start_problem(
      "field_loop.yaml", {"box.cells=[64, 4, 1]", "problem.field_loop.velocity=[0, 0, 0]",
                          "problem.field_loop.amplitude=0",
                          std::string(e == Equilibrium::shear_flow ? "diffusion.viscosity="
                                                                   : "diffusion.resistivity=") +
                              value});
  set_equilibrium(run.state, e);
  auto ghosts = std::make_shared<solver::BoxGhostFiller>(app::box_boundaries(run.config));
  ghosts->fill(run.state);
  auto terms =
      app::make_source_terms(run.config, app::run_context(run.setup, MPI_COMM_WORLD, ghosts));
  const auto* term = dynamic_cast<const physics::DiffusionTerm*>(terms.at(0).get());
  run.integrator =
      std::make_unique<app::SplitIntegrator>(std::move(run.integrator), std::move(terms), ghosts);
  const double a0 = amplitude(run.state, e);
  const double t = 1.0 / (kDiffusivity * kWavenumber * kWavenumber);  // one e-folding
  Decay d;
  if (!advance_to(run, t)) return d;
  d.rate = -std::log(amplitude(run.state, e) / a0) / t;
  d.stages = term->last_call().stages;
  d.steps = run.steps;
  d.divergence = run.largest_divergence;
  return d;
}

// Tolerance 1 %: the diffusion operator alone is within 0.2 % (tests/physics), and the ideal
// step keeps both equilibria to second order; a missing half step, a doubled one or a scheme
// diffusing the shear numerically at the grid scale would show as more.
TEST(DiffusionEndToEnd, ShearFlowDecaysAtTheViscousRateThroughTheSplitStep) {
  const Decay d = run_decay(Equilibrium::shear_flow);
  const double expected = kDiffusivity * kWavenumber * kWavenumber;
  std::printf(
      "[diffusion end to end, viscosity] rate %.6e, exact %.6e, relative error %.3e, "
      "%ld steps of %d RKL2 stages per half step\n",
      d.rate, expected, std::fabs(d.rate / expected - 1.0), d.steps, d.stages);
  EXPECT_NEAR(d.rate, expected, 0.01 * expected);
}

TEST(DiffusionEndToEnd, FieldSheetDecaysAtTheOhmicRateThroughTheSplitStep) {
  const Decay d = run_decay(Equilibrium::field_sheet);
  const double expected = kDiffusivity * kWavenumber * kWavenumber;
  std::printf(
      "[diffusion end to end, resistivity] rate %.6e, exact %.6e, relative error %.3e, "
      "%ld steps of %d RKL2 stages per half step, largest |div B| dx/|B| %.2e\n",
      d.rate, expected, std::fabs(d.rate / expected - 1.0), d.steps, d.stages, d.divergence);
  EXPECT_NEAR(d.rate, expected, 0.01 * expected);
  // div B at round-off through the whole step (CT and the Ohmic EMF alike; tolerance 1e-12 as in
  // tests/physics).
  EXPECT_LT(d.divergence, 1e-12);
}

}  // namespace
}  // namespace brume::verification
