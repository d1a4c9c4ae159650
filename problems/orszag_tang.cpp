#include "problems/orszag_tang.hpp"

#include <cmath>
#include <numbers>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"

namespace brume::problems {

namespace {

constexpr const char* prefix = "problem.orszag_tang.";
constexpr double pi = std::numbers::pi;

// Defaults: ρ = 25/(36π), p = 5/(12π), |v| = 1 and, in code units (B²/2 is the magnetic energy),
// |B| = 1/√(4π), i.e. B = 1 in Gaussian units: sound speed 1, β = 10/3 (from memory).
config::Section section() {
  return {"",
          "Orszag-Tang vortex in the x-y plane of a periodic box: v = V (-sin 2πy, sin 2πx), "
          "B = B0 (-sin 2πy, sin 4πx) with x, y in units of the box sides; code units.",
          {config::real_key("density", "Uniform gas density, code units.")
               .with_default("0.22104853207207686")
               .above(0),
           config::real_key("pressure", "Uniform gas pressure, code units.")
               .with_default("0.1326291192432461")
               .above(0),
           config::real_key("speed", "V: amplitude of the velocity, code units.")
               .with_default("1")
               .at_least(0),
           config::real_key("field", "B0: amplitude of the field, code units (B²/2 is energy).")
               .with_default("0.28209479177387814")
               .at_least(0)},
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
  state.field = c.config.real(key("field"));
  state.speed = c.config.real(key("speed"));
  return state;
}

// Orszag & Tang 1979, J. Fluid Mech. 90, 129; the compressible form of e.g. Londrillo & Del Zanna
// 2000, ApJ 530, 508, §4.2 (set-up from memory). The phases are written about the box centre,
// ξ = (x − x_c)/L: sin 2πx = −sin 2πξ, sin 4πx = sin 4πξ, cos 2πy = −cos 2πη, so that the mirror
// cell (ξ → −ξ exactly in floating point for a dyadic grid) receives exactly −v and −B and the
// discrete initial state has the point symmetry of the problem to the last bit.
void set_up(const SetupContext& c, solver::State& state) {
  const double lx = c.box_size[0], ly = c.box_size[1];
  const double xc = c.box_lower[0] + 0.5 * lx, yc = c.box_lower[1] + 0.5 * ly;
  const double b0 = c.config.real(key("field"));
  if (state.magnetic) {
    // A_z = B0 [Lx cos(4πξ)/(4π) − Ly cos(2πη)/(2π)]: B_x = ∂_y A_z = B0 sin 2πη = −B0 sin 2πy,
    // B_y = −∂_x A_z = B0 sin 4πξ = B0 sin 4πx.
    set_face_field(state, {0.0, 0.0, 0.0}, [&](double x, double y, double) {
      const double xi = (x - xc) / lx, eta = (y - yc) / ly;
      const double a = b0 * (lx * std::cos(4.0 * pi * xi) / (4.0 * pi) -
                             ly * std::cos(2.0 * pi * eta) / (2.0 * pi));
      return std::array<double, 3>{0.0, 0.0, a};
    });
  }
  const double density = c.config.real(key("density"));
  const double pressure = state.isothermal ? 0.0 : c.config.real(key("pressure"));
  const double speed = c.config.real(key("speed"));
  fill_cells(state, c.gamma, [&](double x, double y, double) {
    const double xi = (x - xc) / lx, eta = (y - yc) / ly;
    return PrimitiveCell{density,
                         {speed * std::sin(2.0 * pi * eta), -speed * std::sin(2.0 * pi * xi), 0.0},
                         pressure};
  });
}

}  // namespace

Problem orszag_tang_problem() {
  return {"orszag_tang", "the Orszag-Tang vortex: colliding MHD shocks in a periodic square",
          section, set_up, typical};
}

}  // namespace brume::problems
