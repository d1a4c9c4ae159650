#include "app/run_setup.hpp"

#include <unistd.h>

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "app/scheme_choice.hpp"
#include "physics/cooling_resolution.hpp"
#include "physics/cooling_summary.hpp"
#include "solver/box_boundaries.hpp"
#include "solver/units/constants.hpp"

namespace brume::app {

namespace cgs = units::cgs;

RunSetup make_run_setup(const config::ResolvedConfig& config) {
  RunSetup setup;
  setup.mean_molecular_weight = config.real("gas.mean_molecular_weight");
  setup.code_units = units::code_units_from_number_density(
      config.real("units.length"), config.real("units.velocity"),
      config.real("units.number_density"), setup.mean_molecular_weight);
  setup.isothermal = config.text("gas.equation_of_state") == "isothermal";
  setup.magnetic = config.flag("gas.magnetized");
  setup.gamma = config.real("gas.adiabatic_index");
  setup.sound_speed = config.real("gas.sound_speed") / setup.code_units.velocity;
  const auto cells = config.integers3("box.cells");
  const auto lower = config.reals3("box.origin");
  const auto size = config.reals3("box.size");
  for (int d = 0; d < 3; ++d) {
    setup.cells[d] = static_cast<long>(cells[d]);
    setup.lower[d] = lower[d] / setup.code_units.length;
    setup.size[d] = size[d] / setup.code_units.length;
  }
  setup.problem = &problems::find_problem(config.text("problem.name"));
  return setup;
}

problems::SetupContext setup_context(const config::ResolvedConfig& config, const RunSetup& setup) {
  return {config,      setup.code_units,  setup.mean_molecular_weight,
          setup.gamma, setup.sound_speed, setup.lower,
          setup.size,  setup.cells};
}

double largest_cell_edge(const RunSetup& setup) {
  double edge = 0.0;
  for (int d = 0; d < 3; ++d)
    edge = std::max(edge, setup.size[d] / static_cast<double>(setup.cells[d]));
  return edge * setup.code_units.length;
}

namespace {

std::string number(double value, const char* unit = "") {
  char text[64];
  std::snprintf(text, sizeof text, *unit ? "%.4g %s" : "%.4g", value, unit);
  return text;
}

struct MemoryEstimate {
  double total_bytes = 0.0;
  double bytes_per_cell = 0.0;
};

// The arrays of the state and the integrator scale with the stored cells (interior and ghosts) of
// a block: measure them on a small block with the same scheme and scale to the box on one rank.
MemoryEstimate memory_estimate(const config::ResolvedConfig& config, const RunSetup& s) {
  const solver::SchemeOptions options = scheme_options(config, s);
  const int ghosts = solver::required_ghost_layers(options);
  std::array<int, 3> small{};
  std::array<int, 3> cells{};
  for (int d = 0; d < 3; ++d) {
    cells[d] = static_cast<int>(s.cells[d]);
    small[d] = s.cells[d] > 1 ? 8 : 1;
  }
  const auto probe_geometry = solver::whole_box_geometry(small, {0, 0, 0}, {1, 1, 1}, ghosts);
  const auto box_geometry = solver::whole_box_geometry(cells, {0, 0, 0}, {1, 1, 1}, ghosts);
  const solver::State probe = solver::make_state(probe_geometry, s.magnetic, s.isothermal);
  const auto integrator = solver::make_integrator(
      options, probe_geometry, std::make_shared<solver::BoxGhostFiller>(box_boundaries(config)));
  const double per_stored_cell =
      double(solver::allocated_bytes(probe) + integrator->allocated_bytes()) /
      double(probe_geometry.storage_size());
  MemoryEstimate estimate;
  estimate.total_bytes = per_stored_cell * double(box_geometry.storage_size());
  estimate.bytes_per_cell = estimate.total_bytes / double(box_geometry.interior_cells());
  return estimate;
}

}  // namespace

std::vector<std::pair<std::string, std::string>> derived_quantities(
    const config::ResolvedConfig& config, const RunSetup& s) {
  const units::CodeUnits& u = s.code_units;
  std::vector<std::pair<std::string, std::string>> lines;
  auto add = [&](std::string name, std::string value) {
    lines.emplace_back(std::move(name), std::move(value));
  };
  add("code length", number(u.length / cgs::parsec, "pc"));
  add("code velocity", number(u.velocity / cgs::kilometre, "km/s"));
  add("code density",
      number(u.density, "g cm^-3") + " (" +
          number(u.density / (s.mean_molecular_weight * cgs::hydrogen_mass), "cm^-3") + ")");
  add("code time", number(u.time() / cgs::megayear, "Myr"));
  add("code mass", number(u.mass() / cgs::solar_mass, "M_sun"));
  add("code pressure", number(u.pressure(), "erg cm^-3") + " (P/k_B " +
                           number(u.pressure() / cgs::boltzmann, "K cm^-3") + ")");
  add("code magnetic field", number(u.magnetic_field() / cgs::microgauss, "uG") +
                                 " (B_code = B / sqrt(4 pi rho_u v_u^2))");
  add("code temperature", number(u.temperature(s.mean_molecular_weight), "K"));

  long long total = 1;
  double inverse_crossing = 0.0;  // Σ_d 1/Δx_d over the active directions
  std::string spacing;
  for (int d = 0; d < 3; ++d) {
    total *= s.cells[d];
    const double dx = s.size[d] / static_cast<double>(s.cells[d]);
    if (s.cells[d] > 1) inverse_crossing += 1.0 / dx;
    spacing += (d ? " x " : "") + number(dx * u.length / cgs::parsec, "pc");
  }
  add("cells", std::to_string(total));
  add("cell size", spacing);

  const problems::TypicalState typical = s.problem->typical(setup_context(config, s));
  const double c_s =
      s.isothermal ? s.sound_speed : std::sqrt(s.gamma * typical.pressure / typical.density);
  const double v_a = s.magnetic ? typical.field / std::sqrt(typical.density) : 0.0;
  const double c_f = std::sqrt(c_s * c_s + v_a * v_a);
  const double box = std::max({s.size[0], s.size[1], s.size[2]});
  add("typical sound speed", number(c_s * u.velocity / cgs::kilometre, "km/s"));
  if (s.magnetic) {
    add("typical Alfven speed", number(v_a * u.velocity / cgs::kilometre, "km/s"));
    if (v_a > 0.0) {
      const double p = s.isothermal ? c_s * c_s * typical.density : typical.pressure;
      add("typical plasma beta", number(2.0 * p / (typical.field * typical.field)));
    }
  }
  add("sound-crossing time of the box", number(box / c_s * u.time() / cgs::megayear, "Myr"));
  if (typical.speed > 0.0) {
    add("typical Mach number", number(typical.speed / c_s));
    add("flow-crossing time of the box",
        number(box / typical.speed * u.time() / cgs::megayear, "Myr"));
  }
  const MemoryEstimate memory = memory_estimate(config, s);
  const double machine = double(sysconf(_SC_PHYS_PAGES)) * double(sysconf(_SC_PAGE_SIZE));
  add("memory estimate",
      number(memory.total_bytes / 1.0e9, "GB") + " on one rank (" +
          number(memory.bytes_per_cell, "bytes per cell") + ")" +
          (memory.total_bytes > machine
               ? "; more than this machine's " + number(machine / 1.0e9, "GB") + ": use more ranks"
               : ""));
  if (inverse_crossing > 0.0) {
    // The solver's limit: Courant number over Σ_d (|v| + c_f) / Δx_d (solver/time_step.hpp).
    const double dt = config.real("scheme.courant") / ((typical.speed + c_f) * inverse_crossing);
    const double stop = config.real("clock.stop_time") / u.time();
    add("estimated time step", number(dt * u.time() / cgs::megayear, "Myr"));
    add("estimated steps to the stop time", number(std::ceil(stop / dt)));
  }
  if (config.flag("cooling.enabled") && !s.isothermal) {
    for (auto& line : physics::cooling_summary(physics::cooling_settings(config), s.gamma))
      lines.push_back(std::move(line));
    if (const auto check = physics::field_length_check(config, largest_cell_edge(s)))
      add("cooling: resolution", physics::field_length_text(*check));
  }
  return lines;
}

}  // namespace brume::app
