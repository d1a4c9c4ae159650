#include "problems/driven_turbulence.hpp"

#include <cmath>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"
#include "solver/units/constants.hpp"

namespace brume::problems {

namespace {

namespace dim = units::dim;
constexpr const char* prefix = "problem.driven_turbulence.";

std::string key(const char* name) {
  return std::string(prefix) + name;
}

config::Section section() {
  return {"",
          "Driven turbulence: uniform gas at rest in a uniform field, stirred by the stirring "
          "section for the whole run.",
          {config::quantity_key("density", dim::number_density, "cm^-3",
                                "Particle number density of the uniform start.")
               .with_default("100 cm^-3")
               .above(0),
           config::quantity_key("temperature", dim::temperature, "K",
                                "Temperature (ideal gas; the isothermal gas uses "
                                "gas.sound_speed).")
               .with_default("10 K")
               .above(0),
           config::quantity_key("mean_field", dim::magnetic_field, "uG",
                                "Uniform magnetic field (0 for hydrodynamics).")
               .three()
               .with_default("[10 uG, 0 uG, 0 uG]")},
          {},
          std::nullopt};
}

TypicalState typical(const SetupContext& c) {
  const double n = c.config.real(key("density"));
  const double rho_cgs = c.mean_molecular_weight * units::cgs::hydrogen_mass * n;
  TypicalState state;
  state.density = rho_cgs / c.code_units.density;
  state.pressure =
      n * units::cgs::boltzmann * c.config.real(key("temperature")) / c.code_units.pressure();
  const auto field = c.config.reals3(key("mean_field"));
  state.field = std::hypot(field[0], field[1], field[2]) / c.code_units.magnetic_field();
  state.speed = 0.0;
  return state;
}

void set_up(const SetupContext& c, solver::State& state) {
  const TypicalState gas = typical(c);
  set_uniform_field(state, c.config.reals3(key("mean_field")), c.code_units.magnetic_field());
  const double pressure = state.isothermal ? 0.0 : gas.pressure;
  fill_cells(state, c.gamma, [&](double, double, double) {
    return PrimitiveCell{gas.density, {0.0, 0.0, 0.0}, pressure};
  });
}

}  // namespace

Problem driven_turbulence_problem() {
  return {"driven_turbulence",
          "uniform magnetized gas at rest, stirred at large scales for the whole run", section,
          set_up, typical};
}

}  // namespace brume::problems
