#include "problems/kelvin_helmholtz.hpp"

#include <cmath>
#include <numbers>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"

namespace brume::problems {

namespace {

constexpr const char* prefix = "problem.kelvin_helmholtz.";
constexpr double pi = std::numbers::pi;

config::Section section() {
  return {
      "",
      "Kelvin-Helmholtz instability: v_x = +U/2 in the middle half of the box in y and -U/2 "
      "outside, tanh layers at a quarter and three quarters of the height, a seeded v_y of "
      "one mode along x; code units.",
      {config::real_key("density", "Uniform gas density, code units.").with_default("1").above(0),
       config::real_key("pressure", "Uniform gas pressure, code units.")
           .with_default("0.6")
           .above(0),
       config::real_key("shear_speed", "U: velocity difference across each layer, code units.")
           .with_default("1")
           .above(0),
       config::real_key("thickness", "a: half-thickness of the tanh layers, code units.")
           .with_default("0.0125")
           .above(0),
       config::real_key("seed_speed", "Amplitude of the seeded v_y, code units.")
           .with_default("0.01")
           .at_least(0),
       config::real_key("seed_width", "Gaussian width in y of the seeded v_y, code units.")
           .with_default("0.05")
           .above(0),
       config::integer_key("mode", "Number of wavelengths of the seed along x.")
           .with_default("1")
           .at_least(1),
       config::real_key("field", "Uniform B_x along the flow, code units (0: none).")
           .with_default("0")},
      {},
      std::nullopt};
}

std::string key(const char* name) {
  return std::string(prefix) + name;
}

TypicalState typical(const SetupContext& c) {
  TypicalState state;
  state.density = c.config.real(key("density"));
  state.pressure = c.config.real(key("pressure"));
  state.field = std::fabs(c.config.real(key("field")));
  state.speed = 0.5 * c.config.real(key("shear_speed"));
  return state;
}

// A smooth (tanh) double shear layer seeded with v_y ∝ sin(k x) near each layer; the vortex-sheet
// limit grows as σ = k U/2 for equal densities (Chandrasekhar 1961, Hydrodynamic and
// Hydromagnetic Stability, §101; from memory). Common practice, no source, for the profile.
void set_up(const SetupContext& c, solver::State& state) {
  const double field = c.config.real(key("field"));
  if (state.magnetic) {
    set_face_field(state, {field, 0.0, 0.0}, [](double, double, double) {
      return std::array<double, 3>{0.0, 0.0, 0.0};
    });
  }
  const double density = c.config.real(key("density"));
  const double pressure = state.isothermal ? 0.0 : c.config.real(key("pressure"));
  const double half_shear = 0.5 * c.config.real(key("shear_speed"));
  const double a = c.config.real(key("thickness"));
  const double seed = c.config.real(key("seed_speed"));
  const double width = c.config.real(key("seed_width"));
  const double k = 2.0 * pi * static_cast<double>(c.config.integer(key("mode"))) / c.box_size[0];
  const double y1 = c.box_lower[1] + 0.25 * c.box_size[1];
  const double y2 = c.box_lower[1] + 0.75 * c.box_size[1];
  fill_cells(state, c.gamma, [&](double x, double y, double) {
    const double vx = half_shear * (std::tanh((y - y1) / a) - std::tanh((y - y2) / a) - 1.0);
    const double g1 = (y - y1) / width, g2 = (y - y2) / width;
    const double vy =
        seed * std::sin(k * (x - c.box_lower[0])) * (std::exp(-g1 * g1) + std::exp(-g2 * g2));
    return PrimitiveCell{density, {vx, vy, 0.0}, pressure};
  });
}

}  // namespace

Problem kelvin_helmholtz_problem() {
  return {"kelvin_helmholtz",
          "a seeded double shear layer rolling up into Kelvin-Helmholtz vortices", section, set_up,
          typical};
}

}  // namespace brume::problems
