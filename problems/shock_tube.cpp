#include "problems/shock_tube.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"

namespace brume::problems {

namespace {

constexpr const char* prefix = "problem.shock_tube.";

std::string key(const std::string& name) {
  return prefix + name;
}

struct SideState {
  double density;
  std::array<double, 3> velocity;  // tube frame
  double pressure;
  std::array<double, 3> field;  // tube frame
};

SideState side(const config::SectionValues& v, const std::string& name) {
  return {v.real(name + "_density"), v.reals3(name + "_velocity"), v.real(name + "_pressure"),
          v.reals3(name + "_field")};
}

SideState side(const config::ResolvedConfig& c, const std::string& name) {
  return side(config::SectionValues(c, "problem.shock_tube"), name);
}

std::vector<config::Key> side_keys(const std::string& name) {
  const std::string where = "the " + name + " side (lower positions along the tube are left)";
  return {
      config::real_key(name + "_density", "Mass density on " + where + ", code units.").above(0),
      config::real_key(name + "_velocity", "Velocity on " + where +
                                               ", code units, in the tube's frame (normal, "
                                               "first transverse, second transverse).")
          .three()
          .with_default("[0, 0, 0]"),
      config::real_key(name + "_pressure", "Thermal pressure on " + where + ", code units.")
          .above(0),
      config::real_key(name + "_field",
                       "Magnetic field on " + where +
                           ", code units (B²/2 is its pressure), "
                           "in the tube's frame; the normal component must match the other side.")
          .three()
          .with_default("[0, 0, 0]")};
}

// The normal field is the same on both sides (div B = 0 across the plane).
std::optional<config::Issue> normal_field_matches(const config::SectionValues& v) {
  const double left = v.reals3("left_field")[0], right = v.reals3("right_field")[0];
  if (left == right) return std::nullopt;
  return config::Issue{"right_field", "the normal field (first component) is " +
                                          std::to_string(right) + " on the right but " +
                                          std::to_string(left) +
                                          " on the left; div B = 0 needs them equal"};
}

// The tube needs cells along its direction; the diagonal needs a 2D x–y box.
std::optional<config::Issue> direction_fits_the_box(const config::SectionValues& v) {
  const std::string& direction = v.text("direction");
  const auto cells = v.config().integers3("box.cells");
  if (direction == "xy") {
    if (cells[0] > 1 && cells[1] > 1 && cells[2] == 1) return std::nullopt;
    return config::Issue{"direction",
                         "the x-y diagonal needs a 2D box with box.cells [nx > 1, ny > 1, 1]"};
  }
  const std::size_t axis = std::size_t(direction[0] - 'x');
  if (cells[axis] > 1) return std::nullopt;
  return config::Issue{"direction", "the tube runs along " + direction + " but box.cells has 1 " +
                                        "cell along " + direction};
}

// A field given to unmagnetized gas would be silently dropped.
std::optional<config::Issue> field_needs_magnetized_gas(const config::SectionValues& v) {
  if (v.config().flag("gas.magnetized")) return std::nullopt;
  for (const char* name : {"left_field", "right_field"}) {
    const auto b = v.reals3(name);
    if (b[0] != 0.0 || b[1] != 0.0 || b[2] != 0.0) {
      return config::Issue{name, "a field is given but gas.magnetized is false"};
    }
  }
  return std::nullopt;
}

config::Section section() {
  config::Section s{
      "",
      "Shock tube: two uniform states meeting at a plane, in code units.",
      {config::choice_key("direction",
                          {{"x", "Along x."},
                           {"y", "Along y."},
                           {"z", "Along z."},
                           {"xy", "Along the diagonal of the x-y grid (normal ∝ (Δy, Δx))."}},
                          "Direction of the tube (the normal of the initial discontinuity).")
           .with_default("x"),
       config::real_key("interface",
                        "Position of the discontinuity as a fraction of the box's extent along "
                        "the tube.")
           .with_default("0.5")
           .above(0)
           .below(1)},
      {normal_field_matches, direction_fits_the_box, field_needs_magnetized_gas},
      std::nullopt};
  for (const char* name : {"left", "right"}) {
    for (auto& k : side_keys(name))
      s.keys.push_back(std::move(k));
  }
  return s;
}

TypicalState typical(const SetupContext& c) {
  TypicalState t;
  for (const char* name : {"left", "right"}) {
    const SideState s = side(c.config, name);
    t.density = std::max(t.density, s.density);
    t.pressure = std::max(t.pressure, s.pressure);
    t.field = std::max(t.field, std::hypot(s.field[0], s.field[1], s.field[2]));
    t.speed = std::max(t.speed, std::hypot(s.velocity[0], s.velocity[1], s.velocity[2]));
  }
  return t;
}

void set_up(const SetupContext& c, solver::State& state) {
  const TubeFrame frame = tube_frame(c.config.text(key("direction")), state.geometry.spacing);
  const SideState left = side(c.config, "left"), right = side(c.config, "right");
  // The tube spans the box's extent along the normal (all normal components are ≥ 0).
  const auto& lo = c.box_lower;
  const std::array<double, 3> hi{lo[0] + c.box_size[0], lo[1] + c.box_size[1],
                                 lo[2] + c.box_size[2]};
  const double start = frame.position(lo[0], lo[1], lo[2]);
  const double end = frame.position(hi[0], hi[1], hi[2]);
  const double interface = start + c.config.real(key("interface")) * (end - start);
  // Cell centres on the plane itself (possible along the diagonal) go left whatever the last bit
  // of their computed position.
  const auto& dx = state.geometry.spacing;
  const double tie = 1e-9 * std::min({dx[0], dx[1], dx[2]});
  auto is_left = [&](double x, double y, double z) {
    return frame.position(x, y, z) < interface + tie;
  };
  if (state.magnetic) {
    // B = B_n n + curl(Φ2 t1 − Φ1 t2) with Φ_k = ∫ B_tk dξ from the interface: the curl of f(ξ) a
    // is f'(ξ) n × a, and n × t1 = t2, n × t2 = −t1 (vector calculus).
    const std::array<double, 3> uniform = frame.to_box({left.field[0], 0.0, 0.0});
    set_face_field(state, uniform, [&](double x, double y, double z) {
      const double xi = frame.position(x, y, z) - interface;
      const SideState& s = xi < 0.0 ? left : right;
      return frame.to_box({0.0, s.field[2] * xi, -s.field[1] * xi});
    });
  }
  fill_cells(state, c.gamma, [&](double x, double y, double z) {
    const SideState& s = is_left(x, y, z) ? left : right;
    return PrimitiveCell{s.density, frame.to_box(s.velocity), s.pressure};
  });
}

}  // namespace

TubeFrame tube_frame(const std::string& direction, const std::array<double, 3>& spacing) {
  TubeFrame f;
  if (direction == "xy") {
    const double norm = std::hypot(spacing[0], spacing[1]);
    f.normal = {spacing[1] / norm, spacing[0] / norm, 0.0};
    f.transverse1 = {-f.normal[1], f.normal[0], 0.0};
    f.transverse2 = {0.0, 0.0, 1.0};
    return f;
  }
  if (direction.size() != 1 || direction[0] < 'x' || direction[0] > 'z') {
    throw std::logic_error("unhandled shock-tube direction '" + direction + "'");
  }
  const int d = direction[0] - 'x';
  f.normal = {0, 0, 0};
  f.transverse1 = {0, 0, 0};
  f.transverse2 = {0, 0, 0};
  f.normal[std::size_t(d)] = 1.0;
  f.transverse1[std::size_t(solver::tangent1(d))] = 1.0;
  f.transverse2[std::size_t(solver::tangent2(d))] = 1.0;
  return f;
}

Problem shock_tube_problem() {
  return {"shock_tube", "two uniform states meeting at a plane (Riemann problem), any direction",
          section, set_up, typical};
}

}  // namespace brume::problems
