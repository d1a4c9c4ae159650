#include "problems/driven_turbulence.hpp"

#include <mpi.h>

#include <cmath>
#include <cstdint>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"
#include "problems/random_scalar_field.hpp"
#include "problems/random_solenoidal_field.hpp"
#include "solver/exact_sum.hpp"
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
          "Driven turbulence: gas in a uniform field, stirred by the stirring section for the "
          "whole run; it starts uniform and at rest, or with random large-scale motions and "
          "isobaric density fluctuations.",
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
               .with_default("[10 uG, 0 uG, 0 uG]"),
           config::quantity_key("initial_velocity_rms", dim::velocity, "km/s",
                                "Rms speed of a random solenoidal velocity at the start (modes "
                                "1 to initial_highest_mode); 0: at rest.")
               .with_default("0 km/s")
               .at_least(0),
           config::real_key("initial_log_density_rms",
                            "Rms of ln(n / n0) of random isobaric density fluctuations at the "
                            "start (modes 1 to initial_highest_mode), scaled so that the mean "
                            "density stays `density`; 0: uniform.")
               .with_default("0")
               .at_least(0)
               .at_most(3),
           config::integer_key("initial_highest_mode",
                               "Largest |k| of the initial random fields, in units of 2π/L.")
               .with_default("4")
               .at_least(1)
               .at_most(64),
           config::integer_key("seed", "Seed of the initial random fields.")
               .with_default("1")
               .at_least(0)},
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
  state.speed = c.config.real(key("initial_velocity_rms")) / c.code_units.velocity;
  return state;
}

// ⟨exp δ⟩ over the whole box, exactly (the same bits on any number of ranks), so that the mean
// density of the fluctuating start is the configured one. Collective over MPI_COMM_WORLD, the
// communicator of the run's blocks.
double mean_exponential(const solver::State& state, const RandomScalarField& delta,
                        const SetupContext& c) {
  const auto& g = state.geometry;
  solver::ExactSum sum;
  for (int k = 0; k < g.cells[2]; ++k)
    for (int j = 0; j < g.cells[1]; ++j)
      for (int i = 0; i < g.cells[0]; ++i)
        sum.add(std::exp(delta(g.centre(0, i) - c.box_lower[0], g.centre(1, j) - c.box_lower[1],
                               g.centre(2, k) - c.box_lower[2])));
  sum.combine(MPI_COMM_WORLD);
  return sum.value() / (double(c.box_cells[0]) * double(c.box_cells[1]) * double(c.box_cells[2]));
}

void set_up(const SetupContext& c, solver::State& state) {
  const TypicalState gas = typical(c);
  const auto& g = state.geometry;
  const std::array<bool, 3> active{g.active(0), g.active(1), g.active(2)};
  const int highest = static_cast<int>(c.config.integer(key("initial_highest_mode")));
  const auto seed = static_cast<std::uint64_t>(c.config.integer(key("seed")));
  const RandomSolenoidalField velocity(
      c.box_size, active, 1, highest,
      c.config.real(key("initial_velocity_rms")) / c.code_units.velocity, seed);
  const double contrast = c.config.real(key("initial_log_density_rms"));
  const RandomScalarField delta(c.box_size, active, 1, highest, contrast, seed + 1);
  const double mean = contrast > 0.0 ? mean_exponential(state, delta, c) : 1.0;
  set_uniform_field(state, c.config.reals3(key("mean_field")), c.code_units.magnetic_field());
  const double pressure = state.isothermal ? 0.0 : gas.pressure;
  fill_cells(state, c.gamma, [&](double x, double y, double z) {
    x -= c.box_lower[0], y -= c.box_lower[1], z -= c.box_lower[2];
    const double density =
        contrast > 0.0 ? gas.density * std::exp(delta(x, y, z)) / mean : gas.density;
    return PrimitiveCell{density, velocity(x, y, z), pressure};
  });
}

}  // namespace

Problem driven_turbulence_problem() {
  return {"driven_turbulence",
          "uniform magnetized gas at rest, stirred at large scales for the whole run", section,
          set_up, typical};
}

}  // namespace brume::problems
