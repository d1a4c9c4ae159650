#include "problems/field_loop.hpp"

#include <algorithm>
#include <cmath>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"

namespace brume::problems {

namespace {

constexpr const char* prefix = "problem.field_loop.";

config::Section section() {
  return {"",
          "Field-loop advection: uniform gas carrying a weak loop A_z = A (R - r) around the box "
          "centre (r measured in the x-y plane), all values in code units.",
          {config::real_key("density", "Gas density, code units.").with_default("1").above(0),
           config::real_key("pressure", "Gas pressure, code units.").with_default("1").above(0),
           config::real_key("velocity", "Uniform advection velocity, code units.")
               .three()
               .with_default("[2, 1, 0]"),
           config::real_key("amplitude",
                            "A: field strength inside the loop (|B| = A for r < R), code units.")
               .with_default("0.001")
               .at_least(0),
           config::real_key("radius", "R: radius of the loop, code units.")
               .with_default("0.3")
               .above(0)},
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
  state.field = c.config.real(key("amplitude"));
  const auto v = c.config.reals3(key("velocity"));
  state.speed = std::hypot(v[0], v[1], v[2]);
  return state;
}

// Gardiner & Stone 2005, J. Comput. Phys. 205, 509, §5.1 (field-loop test; numbers from memory):
// A_z = A0 (R − r) for r < R and 0 outside, so that |B| = A0 inside the loop and B = 0 outside.
// The loop is centred on the box, and the distance is taken to the nearest periodic image so that
// the potential is periodic whenever R is below half of the shorter side.
void set_up(const SetupContext& c, solver::State& state) {
  const double amplitude = c.config.real(key("amplitude"));
  const double radius = c.config.real(key("radius"));
  const double cx = c.box_lower[0] + 0.5 * c.box_size[0];
  const double cy = c.box_lower[1] + 0.5 * c.box_size[1];
  const double lx = c.box_size[0], ly = c.box_size[1];
  auto nearest = [](double d, double length) { return d - length * std::round(d / length); };
  if (state.magnetic) {
    set_face_field(state, {0.0, 0.0, 0.0}, [&](double x, double y, double) {
      const double r = std::hypot(nearest(x - cx, lx), nearest(y - cy, ly));
      return std::array<double, 3>{0.0, 0.0, amplitude * std::max(radius - r, 0.0)};
    });
  }
  const double density = c.config.real(key("density"));
  const double pressure = state.isothermal ? 0.0 : c.config.real(key("pressure"));
  const auto v = c.config.reals3(key("velocity"));
  fill_cells(state, c.gamma, [&](double, double, double) {
    return PrimitiveCell{density, v, pressure};
  });
}

}  // namespace

Problem field_loop_problem() {
  return {"field_loop", "a weak magnetic loop advected diagonally across a periodic box", section,
          set_up, typical};
}

}  // namespace brume::problems
