#include "physics/cooling_term.hpp"

#include <cmath>
#include <cstdio>
#include <limits>
#include <utility>

#include "io/config/error.hpp"
#include "physics/cooling_cell_integrator.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics {

namespace cgs = units::cgs;

CoolingTerm::CoolingTerm(CoolingSettings settings, RunContext context)
    : settings_(std::move(settings)), context_(std::move(context)) {
  if (context_.isothermal) {
    throw config::Error("", 0, 0, "cooling.enabled",
                        "heating and cooling need an ideal gas, but the gas is isothermal");
  }
  number_density_unit_ =
      context_.code_units.density / (context_.mean_molecular_weight * cgs::hydrogen_mass);
  temperature_unit_ = context_.code_units.temperature(context_.mean_molecular_weight);
}

namespace {

// Kinetic plus magnetic energy density of cell c (code units).
double mechanical_energy(const solver::State& s, std::ptrdiff_t c) {
  const double m2 = s.momentum[0][std::size_t(c)] * s.momentum[0][std::size_t(c)] +
                    s.momentum[1][std::size_t(c)] * s.momentum[1][std::size_t(c)] +
                    s.momentum[2][std::size_t(c)] * s.momentum[2][std::size_t(c)];
  double e = 0.5 * m2 / s.density[std::size_t(c)];
  if (s.magnetic) {
    for (int d = 0; d < 3; ++d) {
      const double b = solver::cell_field(s, d, c);
      e += 0.5 * b * b;
    }
  }
  return e;
}

}  // namespace

template <class Function>
void CoolingTerm::advance_cells(const Function& function, solver::State& state, double dt) {
  const double gm1 = context_.gamma - 1.0;
  const CellCoolingLimits limits{settings_.temperature_floor, settings_.temperature_ceiling,
                                 settings_.relative_tolerance, 1000000};
  const CellCooler<Function> cooler(function, settings_.net.heating, gm1 / cgs::boltzmann, limits);
  const double seconds = dt * context_.code_units.time();
  const solver::BlockGeometry& g = state.geometry;
  const double cell_volume =
      g.spacing[0] * g.spacing[1] * g.spacing[2] * std::pow(context_.code_units.length, 3);
  const double energy_unit = context_.code_units.pressure();
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        const auto u = std::size_t(c);
        const double rho = state.density[u];
        const double mechanical = mechanical_energy(state, c);
        const double thermal = state.energy[u] - mechanical;
        const double t0 = gm1 * thermal / rho * temperature_unit_;
        const CellCoolingResult r = cooler.advance(rho * number_density_unit_, t0, seconds);
        const double thermal_new = rho * r.temperature / (gm1 * temperature_unit_);
        state.energy[u] = mechanical + thermal_new;
        radiated_.add((thermal - thermal_new) * energy_unit * cell_volume);
        substeps_ += r.substeps;
        limited_cells_ += r.limited ? 1 : 0;
        fast_path_cells_ += r.fast_path ? 1 : 0;
      }
    }
  }
  cell_updates_ += g.interior_cells();
}

void CoolingTerm::advance(solver::State& state, double dt) {
  std::visit([&](const auto& f) { advance_cells(f, state, dt); }, settings_.net.function);
}

double CoolingTerm::time_step_limit(const solver::State& state) const {
  const double fraction = settings_.time_step_fraction;
  if (!(fraction > 0.0)) return std::numeric_limits<double>::infinity();
  const double gm1 = context_.gamma - 1.0;
  const solver::BlockGeometry& g = state.geometry;
  double shortest = std::numeric_limits<double>::infinity();  // s
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (int i = 0; i < g.cells[0]; ++i) {
        const std::ptrdiff_t c = row + i;
        const auto u = std::size_t(c);
        const double rho = state.density[u];
        const double thermal = state.energy[u] - mechanical_energy(state, c);
        const double t = gm1 * thermal / rho * temperature_unit_;
        const double n = rho * number_density_unit_;
        const double loss = std::fabs(settings_.net.rate(n, t));
        // t_cool = e / |n²Λ − nΓ| with e = n k_B T/(γ − 1) (common practice, no source).
        if (loss > 0.0) shortest = std::fmin(shortest, n * cgs::boltzmann * t / (gm1 * loss));
      }
    }
  }
  return fraction * shortest / context_.code_units.time();
}

double CoolingTerm::radiated() const {
  return total_over(radiated_, context_.comm);
}

std::vector<io::MeasuredNumber> CoolingTerm::budget() const {
  return {{"radiated_energy", radiated(), "erg", 1.0,
           "Net energy radiated by the gas (cooling minus heating) since the start of the run"}};
}

void CoolingTerm::save(io::RunRecord& record) const {
  record.set("cooling.radiated", radiated());
}

void CoolingTerm::restore(const io::RunRecord& record) {
  radiated_ = held_once(record.real("cooling.radiated"), context_.comm);
}

std::string CoolingTerm::report() const {
  long long counts[4] = {cell_updates_, substeps_, limited_cells_, fast_path_cells_};
  MPI_Allreduce(MPI_IN_PLACE, counts, 4, MPI_LONG_LONG, MPI_SUM, context_.comm);
  const double radiated_total = radiated();
  char text[320];
  std::snprintf(text, sizeof text,
                "cooling: %lld cell updates (%.4g %% by Rosenbrock steps), %.3g sub-steps per "
                "update, %lld ended at the temperature floor or ceiling, net energy radiated "
                "%.6g erg",
                counts[0], counts[0] > 0 ? 100.0 * double(counts[3]) / double(counts[0]) : 0.0,
                counts[0] > 0 ? double(counts[1]) / double(counts[0]) : 0.0, counts[2],
                radiated_total);
  return text;
}

}  // namespace brume::physics
