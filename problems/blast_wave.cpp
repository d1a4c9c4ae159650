#include "problems/blast_wave.hpp"

#include <cmath>
#include <numbers>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"

namespace brume::problems {

namespace {

constexpr const char* prefix = "problem.blast_wave.";
constexpr double pi = std::numbers::pi;

config::Section section() {
  return {
      "",
      "MHD blast wave: uniform gas and field, the pressure raised inside a circle (a sphere "
      "when the box is 3D) at the box centre; code units.",
      {config::real_key("density", "Uniform gas density, code units.").with_default("1").above(0),
       config::real_key("ambient_pressure", "Pressure outside the blast, code units.")
           .with_default("0.1")
           .above(0),
       config::real_key("blast_pressure", "Pressure inside the blast, code units.")
           .with_default("10")
           .above(0),
       config::real_key("radius", "Radius of the overpressured region, code units.")
           .with_default("0.1")
           .above(0),
       config::real_key("ambient_beta",
                        "Plasma beta 2p/B² of the ambient gas; sets the field strength.")
           .with_default("0.02")
           .above(0),
       config::real_key("field_angle",
                        "Angle of the field to the x axis in the x-y plane, degrees.")
           .with_default("45")},
      {},
      std::nullopt};
}

std::string key(const char* name) {
  return std::string(prefix) + name;
}

double field_strength(const SetupContext& c) {
  return std::sqrt(2.0 * c.config.real(key("ambient_pressure")) /
                   c.config.real(key("ambient_beta")));
}

TypicalState typical(const SetupContext& c) {
  TypicalState state;
  state.density = c.config.real(key("density"));
  state.pressure = c.config.real(key("ambient_pressure"));
  state.field = field_strength(c);
  return state;
}

// Set-up after Londrillo & Del Zanna 2000, ApJ 530, 508, §4.3 and Gardiner & Stone 2005,
// J. Comput. Phys. 205, 509, §5.5 (uniform ρ and B at 45°, p raised 100-fold inside r = 0.1;
// from memory), with the field strength given by the ambient β instead of directly.
void set_up(const SetupContext& c, solver::State& state) {
  const double b0 = field_strength(c);
  const double angle = c.config.real(key("field_angle")) * pi / 180.0;
  if (state.magnetic) {
    set_face_field(state, {b0 * std::cos(angle), b0 * std::sin(angle), 0.0},
                   [](double, double, double) {
                     return std::array<double, 3>{0.0, 0.0, 0.0};
                   });
  }
  const auto& g = state.geometry;
  std::array<double, 3> centre{};
  for (int d = 0; d < 3; ++d)
    centre[d] = c.box_lower[d] + 0.5 * c.box_size[d];
  const double radius = c.config.real(key("radius"));
  const double density = c.config.real(key("density"));
  const double inside = c.config.real(key("blast_pressure"));
  const double outside = c.config.real(key("ambient_pressure"));
  fill_cells(state, c.gamma, [&](double x, double y, double z) {
    const std::array<double, 3> p{x, y, z};
    double r2 = 0.0;
    for (int d = 0; d < 3; ++d) {
      if (g.active(d)) r2 += (p[d] - centre[d]) * (p[d] - centre[d]);
    }
    const double pressure = state.isothermal ? 0.0 : (r2 < radius * radius ? inside : outside);
    return PrimitiveCell{density, {0.0, 0.0, 0.0}, pressure};
  });
}

}  // namespace

Problem blast_wave_problem() {
  return {"blast_wave", "an overpressured circle or sphere exploding in a strongly magnetized gas",
          section, set_up, typical};
}

}  // namespace brume::problems
