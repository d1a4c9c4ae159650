#include "problems/decaying_turbulence.hpp"

#include <cmath>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"
#include "problems/random_solenoidal_field.hpp"
#include "solver/units/constants.hpp"

namespace brume::problems {

namespace {

namespace dim = units::dim;
constexpr const char* prefix = "problem.decaying_turbulence.";

config::Section section() {
  return {
      "",
      "Decaying turbulence: uniform gas and mean field, a random solenoidal velocity at the "
      "largest scales at t = 0.",
      {config::quantity_key("density", dim::number_density, "cm^-3", "Particle number density.")
           .with_default("1 cm^-3")
           .above(0),
       config::quantity_key("temperature", dim::temperature, "K",
                            "Temperature (ideal gas; the isothermal gas uses gas.sound_speed).")
           .with_default("8000 K")
           .above(0),
       config::quantity_key("mean_field", dim::magnetic_field, "uG",
                            "Uniform magnetic field (0 for hydrodynamics).")
           .three()
           .with_default("[3 uG, 0 uG, 0 uG]"),
       config::quantity_key("velocity_rms", dim::velocity, "km/s",
                            "Root-mean-square speed of the initial velocity field.")
           .with_default("10 km/s")
           .at_least(0),
       config::integer_key("lowest_mode", "Smallest |k| of the stirred modes, in units of 2π/L.")
           .with_default("1")
           .at_least(1),
       config::integer_key("highest_mode", "Largest |k| of the stirred modes, in units of 2π/L.")
           .with_default("2")
           .at_least(1)
           .at_most(64),
       config::integer_key("seed", "Seed of the random velocity field.")
           .with_default("1")
           .at_least(0)},
      {},
      std::nullopt};
}

std::string key(const char* name) {
  return std::string(prefix) + name;
}

// Code-unit density and pressure of the uniform gas.
TypicalState uniform_gas(const SetupContext& c) {
  const double n = c.config.real(key("density"));
  const double temperature = c.config.real(key("temperature"));
  const double rho_cgs = c.mean_molecular_weight * units::cgs::hydrogen_mass * n;
  TypicalState state;
  state.density = rho_cgs / c.code_units.density;
  state.pressure = n * units::cgs::boltzmann * temperature / c.code_units.pressure();
  const auto field = c.config.reals3(key("mean_field"));
  state.field = std::hypot(field[0], field[1], field[2]) / c.code_units.magnetic_field();
  state.speed = c.config.real(key("velocity_rms")) / c.code_units.velocity;
  return state;
}

TypicalState typical(const SetupContext& c) {
  return uniform_gas(c);
}

void set_up(const SetupContext& c, solver::State& state) {
  const TypicalState gas = uniform_gas(c);
  const auto& g = state.geometry;
  const RandomSolenoidalField velocity(c.box_size, {g.active(0), g.active(1), g.active(2)},
                                       static_cast<int>(c.config.integer(key("lowest_mode"))),
                                       static_cast<int>(c.config.integer(key("highest_mode"))),
                                       gas.speed,
                                       static_cast<std::uint64_t>(c.config.integer(key("seed"))));
  set_uniform_field(state, c.config.reals3(key("mean_field")), c.code_units.magnetic_field());
  const double pressure = state.isothermal ? 0.0 : gas.pressure;
  fill_cells(state, c.gamma, [&](double x, double y, double z) {
    const auto v = velocity(x - c.box_lower[0], y - c.box_lower[1], z - c.box_lower[2]);
    return PrimitiveCell{gas.density, v, pressure};
  });
}

}  // namespace

Problem decaying_turbulence_problem() {
  return {"decaying_turbulence",
          "uniform magnetized gas stirred once at large scales, then left to decay", section,
          set_up, typical};
}

}  // namespace brume::problems
