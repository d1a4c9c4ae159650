#include "problems/thermal_instability.hpp"

#include <cmath>
#include <numbers>

#include "io/config/error.hpp"
#include "physics/cooling_equilibrium.hpp"
#include "physics/cooling_settings.hpp"
#include "problems/cell_fill.hpp"
#include "solver/units/constants.hpp"
#include "solver/units/dimension.hpp"

namespace brume::problems {

namespace {

namespace dim = units::dim;
constexpr const char* prefix = "problem.thermal_instability.";

config::Section section() {
  return {
      "",
      "Uniform gas in thermal equilibrium (on the curve of the cooling function of the section "
      "`cooling`) with a small isobaric density perturbation of one Fourier mode.",
      {config::choice_key("chosen_by",
                          {{"density", "The equilibrium point of the given number density."},
                           {"pressure", "The point of the given pressure on the unstable branch."}},
                          "How the equilibrium point is chosen.")
           .with_default("density"),
       config::quantity_key("density", dim::number_density, "cm^-3",
                            "Number density of the equilibrium point (chosen_by: density).")
           .with_default("2 cm^-3")
           .above(0),
       config::quantity_key("pressure", dim::pressure, "K cm^-3",
                            "Pressure of the equilibrium point on the isobarically unstable "
                            "branch (chosen_by: pressure).")
           .with_default("3000 K cm^-3")
           .above(0),
       config::real_key("amplitude", "Relative amplitude of the density perturbation.")
           .with_default("1e-4")
           .above(0)
           .below(0.5),
       config::integer_key("mode", "Wave numbers of the mode along x, y and z, in box lengths.")
           .three()
           .with_default("[1, 0, 0]")
           .at_least(-1048576)
           .at_most(1048576)},
      {},
      std::nullopt};
}

std::string key(const char* name) {
  return std::string(prefix) + name;
}

struct Equilibrium {
  double number_density = 0.0;  // cm^-3
  double temperature = 0.0;     // K
};

Equilibrium equilibrium(const SetupContext& c) {
  const physics::CoolingSettings s = physics::cooling_settings(c.config);
  const physics::TemperatureBracket bracket{s.temperature_floor, s.temperature_ceiling};
  Equilibrium e;
  if (c.config.text(key("chosen_by")) == "density") {
    e.number_density = c.config.real(key("density"));
  } else {
    const physics::UnstableRange range = physics::unstable_range(s.net, bracket);
    e.number_density = physics::unstable_density_at_pressure(
        s.net, range, c.config.real(key("pressure")), bracket);
    if (std::isnan(e.number_density)) {
      const config::Source& where = c.config.source(key("pressure"));
      throw config::Error(where.where, where.line, where.column, key("pressure"),
                          "no isobarically unstable equilibrium at this pressure; the cooling "
                          "function allows P/k_B within [" +
                              std::to_string(range.p_min / units::cgs::boltzmann) + ", " +
                              std::to_string(range.p_max / units::cgs::boltzmann) + "] K cm^-3");
    }
  }
  e.temperature = physics::equilibrium_temperature(s.net, e.number_density, bracket);
  if (std::isnan(e.temperature)) {
    throw config::Error(c.config.file_name(), 0, 0, key("density"),
                        "the cooling function has no equilibrium at this density between the "
                        "temperature floor and ceiling");
  }
  return e;
}

// Code density and pressure of the equilibrium point.
std::pair<double, double> code_state(const SetupContext& c) {
  const Equilibrium e = equilibrium(c);
  const double rho =
      e.number_density * c.mean_molecular_weight * units::cgs::hydrogen_mass / c.code_units.density;
  const double p =
      e.number_density * units::cgs::boltzmann * e.temperature / c.code_units.pressure();
  return {rho, p};
}

TypicalState typical(const SetupContext& c) {
  const auto [rho, p] = code_state(c);
  TypicalState state;
  state.density = rho;
  state.pressure = p;
  return state;
}

// An isobaric perturbation δρ/ρ = ε cos(k·x), δp = 0, v = 0: mostly the condensation mode of Field
// 1965 (ApJ 142, 531) when k c_s t_cool ≫ 1; the rest is sound, which the cooling damps.
void set_up(const SetupContext& c, solver::State& state) {
  const auto [rho, p] = code_state(c);
  const double amplitude = c.config.real(key("amplitude"));
  const auto mode = c.config.integers3(key("mode"));
  std::array<double, 3> k{};
  for (int d = 0; d < 3; ++d)
    k[d] = 2.0 * std::numbers::pi * double(mode[d]) / c.box_size[d];
  fill_cells(state, c.gamma, [&](double x, double y, double z) {
    const double phase =
        k[0] * (x - c.box_lower[0]) + k[1] * (y - c.box_lower[1]) + k[2] * (z - c.box_lower[2]);
    return PrimitiveCell{rho * (1.0 + amplitude * std::cos(phase)), {0.0, 0.0, 0.0}, p};
  });
}

}  // namespace

Problem thermal_instability_problem() {
  return {"thermal_instability",
          "a uniform gas in thermal equilibrium with one small isobaric perturbation mode", section,
          set_up, typical};
}

}  // namespace brume::problems
