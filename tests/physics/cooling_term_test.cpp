// The cooling source term on a block: only the thermal energy changes, by what the cell
// integrator gives; stiff steps leave finite, positive temperatures; the time-step limit is the
// stated fraction of the shortest cooling time; isothermal gas is refused.
#include <gtest/gtest.h>

#include <cmath>
#include <vector>

#include "io/config/error.hpp"
#include "physics/cooling_cell_integrator.hpp"
#include "physics/cooling_equilibrium.hpp"
#include "physics/cooling_term.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics {
namespace {

namespace cgs = units::cgs;
constexpr double mu = 1.27;
const KoyamaInutsukaFit fit;

RunContext context() {
  RunContext c;
  c.code_units = units::code_units_from_number_density(cgs::parsec, cgs::kilometre, 1.0, mu);
  c.mean_molecular_weight = mu;
  c.gamma = 5.0 / 3.0;
  return c;
}

// 4 × 3 × 2 cells of different densities, temperatures, velocities and fields.
solver::State varied_state(const RunContext& c, const std::vector<double>& temperatures) {
  const auto g = solver::whole_box_geometry({4, 3, 2}, {0, 0, 0}, {1, 1, 1}, 2);
  solver::State s = solver::make_state(g, true, false);
  for (std::size_t f = 0; f < s.face_field[0].size(); ++f) {
    s.face_field[0][f] = 0.3 + 0.01 * double(f % 7);
    s.face_field[1][f] = -0.2;
    s.face_field[2][f] = 0.1 * double(f % 3);
  }
  const double t_unit = c.code_units.temperature(mu);
  int cell = 0;
  for (int k = 0; k < 2; ++k) {
    for (int j = 0; j < 3; ++j) {
      for (int i = 0; i < 4; ++i, ++cell) {
        const auto u = std::size_t(g.index(i, j, k));
        const double rho = std::pow(10.0, -1.0 + 0.25 * cell);  // 0.1 .. 60 cm^-3
        const double t = temperatures[std::size_t(cell) % temperatures.size()];
        s.density[u] = rho;
        const double v[3] = {0.5 * i, -0.3 * j, 0.2 * k};
        double e = 0.0;
        for (int d = 0; d < 3; ++d) {
          s.momentum[std::size_t(d)][u] = rho * v[d];
          e += 0.5 * rho * v[d] * v[d];
        }
        for (int d = 0; d < 3; ++d)
          e += 0.5 * std::pow(solver::cell_field(s, d, std::ptrdiff_t(u)), 2);
        s.energy[u] = e + rho * t / t_unit / (c.gamma - 1.0);
      }
    }
  }
  return s;
}

double thermal(const solver::State& s, std::size_t u) {
  double e = s.energy[u];
  for (int d = 0; d < 3; ++d) {
    e -= 0.5 * s.momentum[std::size_t(d)][u] * s.momentum[std::size_t(d)][u] / s.density[u];
    e -= 0.5 * std::pow(solver::cell_field(s, d, std::ptrdiff_t(u)), 2);
  }
  return e;
}

TEST(CoolingTerm, ChangesOnlyTheThermalEnergyAsTheCellIntegratorSays) {
  const RunContext c = context();
  solver::State s = varied_state(c, {30.0, 900.0, 5000.0, 2e4});
  const solver::State before = s;
  CoolingSettings settings;
  settings.enabled = true;
  CoolingTerm term(settings, c);
  const double dt = 0.05;  // code time (about 0.05 Myr)
  term.advance(s, dt);
  EXPECT_EQ(s.density, before.density);
  for (int d = 0; d < 3; ++d) {
    EXPECT_EQ(s.momentum[std::size_t(d)], before.momentum[std::size_t(d)]);
    EXPECT_EQ(s.face_field[std::size_t(d)], before.face_field[std::size_t(d)]);
  }
  const double t_unit = c.code_units.temperature(mu);
  const double n_unit = c.code_units.density / (mu * cgs::hydrogen_mass);
  const CellCooler<KoyamaInutsukaFit> cooler(fit, settings.net.heating,
                                             (c.gamma - 1.0) / cgs::boltzmann, CellCoolingLimits{});
  const auto& g = s.geometry;
  int changed = 0;
  for (int k = 0; k < 2; ++k) {
    for (int j = 0; j < 3; ++j) {
      for (int i = 0; i < 4; ++i) {
        const auto u = std::size_t(g.index(i, j, k));
        const double t0 = (c.gamma - 1.0) * thermal(before, u) / before.density[u] * t_unit;
        const double t1 = (c.gamma - 1.0) * thermal(s, u) / s.density[u] * t_unit;
        const double expected =
            cooler.advance(before.density[u] * n_unit, t0, dt * c.code_units.time()).temperature;
        // Same integrator; the energy round trip costs a few ulps of the total energy.
        EXPECT_NEAR(t1 / expected, 1.0, 1e-9) << i << " " << j << " " << k;
        changed += std::fabs(t1 / t0 - 1.0) > 1e-3 ? 1 : 0;
      }
    }
  }
  EXPECT_GT(changed, 12);  // the step is long enough to change most cells noticeably
}

TEST(CoolingTerm, StiffStepLeavesFiniteTemperaturesAtEquilibrium) {
  const RunContext c = context();
  solver::State s = varied_state(c, {10.0, 50.0, 8000.0, 1e7});
  CoolingSettings settings;
  CoolingTerm term(settings, c);
  const double t_unit = c.code_units.temperature(mu);
  const double n_unit = c.code_units.density / (mu * cgs::hydrogen_mass);
  // Step: 1e6 times the longest cooling time of any cell.
  double longest = 0.0;
  const auto& g = s.geometry;
  for (int k = 0; k < 2; ++k)
    for (int j = 0; j < 3; ++j)
      for (int i = 0; i < 4; ++i) {
        const auto u = std::size_t(g.index(i, j, k));
        const double t = (c.gamma - 1.0) * thermal(s, u) / s.density[u] * t_unit;
        longest = std::fmax(longest, cooling_time(settings.net, s.density[u] * n_unit, t, c.gamma));
      }
  term.advance(s, 1e6 * longest / c.code_units.time());
  for (int k = 0; k < 2; ++k)
    for (int j = 0; j < 3; ++j)
      for (int i = 0; i < 4; ++i) {
        const auto u = std::size_t(g.index(i, j, k));
        const double t = (c.gamma - 1.0) * thermal(s, u) / s.density[u] * t_unit;
        ASSERT_TRUE(std::isfinite(t));
        EXPECT_GT(t, 0.0);
        // 1e-6: the integrator's tolerance, plus the energy round trip.
        EXPECT_NEAR(t / equilibrium_temperature(settings.net, s.density[u] * n_unit), 1.0, 1e-6);
      }
}

TEST(CoolingTerm, TimeStepLimitIsTheFractionOfTheShortestCoolingTime) {
  const RunContext c = context();
  const solver::State s = varied_state(c, {300.0, 8000.0});
  CoolingSettings settings;
  EXPECT_TRUE(std::isinf(CoolingTerm(settings, c).time_step_limit(s)));
  settings.time_step_fraction = 0.25;
  const double t_unit = c.code_units.temperature(mu);
  const double n_unit = c.code_units.density / (mu * cgs::hydrogen_mass);
  double shortest = 1e300;
  const auto& g = s.geometry;
  for (int k = 0; k < 2; ++k)
    for (int j = 0; j < 3; ++j)
      for (int i = 0; i < 4; ++i) {
        const auto u = std::size_t(g.index(i, j, k));
        const double t = (c.gamma - 1.0) * thermal(s, u) / s.density[u] * t_unit;
        shortest =
            std::fmin(shortest, cooling_time(settings.net, s.density[u] * n_unit, t, c.gamma));
      }
  EXPECT_NEAR(CoolingTerm(settings, c).time_step_limit(s) * c.code_units.time() / shortest, 0.25,
              1e-12);
}

TEST(CoolingTerm, IsothermalGasIsRefused) {
  RunContext c = context();
  c.isothermal = true;
  EXPECT_THROW(CoolingTerm(CoolingSettings{}, c), config::Error);
}

}  // namespace
}  // namespace brume::physics
