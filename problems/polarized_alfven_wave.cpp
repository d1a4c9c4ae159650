#include "problems/polarized_alfven_wave.hpp"

#include <cmath>
#include <limits>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"

namespace brume::problems {

namespace {

constexpr const char* section_path = "problem.polarized_alfven_wave";

// The wave needs a field to exist: refuse an unmagnetized gas rather than run sound waves.
std::optional<config::Issue> needs_magnetized_gas(const config::SectionValues& v) {
  if (v.config().flag("gas.magnetized")) return std::nullopt;
  return config::Issue{"parallel_field", "an Alfven wave needs gas.magnetized: true (it is false)"};
}

config::Section section() {
  return {
      "",
      "Circularly polarized Alfven wave of finite amplitude, an exact solution, along the box "
      "diagonal with one wavelength across each side. Values in code units.",
      {config::real_key("amplitude", "Magnitude of the transverse field, code units.")
           .with_default("0.1")
           .above(0),
       config::real_key("density", "Mass density, code units.").with_default("1").above(0),
       config::real_key("pressure", "Thermal pressure, code units (ignored when isothermal).")
           .with_default("0.1")
           .above(0),
       config::real_key("parallel_field", "Field along the wave vector, code units.")
           .with_default("1")
           .above(0),
       config::real_key("flow_speed",
                        "Gas velocity along the wave vector, code units (B/sqrt(density) against "
                        "the direction of travel makes a standing wave).")
           .with_default("0"),
       config::choice_key("direction",
                          {{"forward", "Along k = 2 pi (1/L_x, 1/L_y, 1/L_z) relative to the gas."},
                           {"backward", "Against k relative to the gas."}},
                          "Direction of travel.")
           .with_default("forward")},
      {needs_magnetized_gas},
      std::nullopt};
}

TypicalState typical(const SetupContext& c) {
  const PolarizedAlfvenWave w = polarized_alfven_wave(c);
  return {w.density, w.pressure, std::hypot(w.parallel_field, w.amplitude),
          std::hypot(w.flow_speed, w.amplitude / std::sqrt(w.density))};
}

void set_up(const SetupContext& c, solver::State& state) {
  const PolarizedAlfvenWave w = polarized_alfven_wave(c);
  if (state.magnetic) {
    set_face_field(state, w.wave.to_box({w.parallel_field, 0.0, 0.0}),
                   w.wave.potential({w.amplitude, 0.0, 0.0, w.amplitude}));
  }
  fill_cells(state, c.gamma, [&](double x, double y, double z) {
    return PrimitiveCell{w.density, w.wave.to_box(w.velocity(x, y, z, 0.0)), w.pressure};
  });
}

}  // namespace

double PolarizedAlfvenWave::speed() const {
  return flow_speed + direction * parallel_field / std::sqrt(density);
}

double PolarizedAlfvenWave::period() const {
  const double s = speed();
  return s == 0.0 ? std::numeric_limits<double>::infinity() : wave.wavelength / std::fabs(s);
}

// B_⊥ = a (sin ψ, cos ψ), ψ = k·(x − x0) − |k| s t — Tóth 2000, J. Comput. Phys. 161, 605, §6.3
// (from memory; there the wave is standing or travelling, here the direction is a choice).
std::array<double, 3> PolarizedAlfvenWave::field(double x, double y, double z, double t) const {
  const double psi = wave.phase(x, y, z) - wave.wavenumber * speed() * t;
  return {parallel_field, amplitude * std::sin(psi), amplitude * std::cos(psi)};
}

// δv_⊥ = −direction · δB_⊥/√ρ (B_∥ > 0): the Alfvén relation, exact at any amplitude when |B_⊥|
// is uniform (Tóth 2000, §6.3; from memory).
std::array<double, 3> PolarizedAlfvenWave::velocity(double x, double y, double z, double t) const {
  const std::array<double, 3> b = field(x, y, z, t);
  const double f = -direction / std::sqrt(density);
  return {flow_speed, f * b[1], f * b[2]};
}

PolarizedAlfvenWave polarized_alfven_wave(const SetupContext& c) {
  const config::SectionValues v(c.config, section_path);
  PolarizedAlfvenWave w;
  w.wave = box_diagonal_wave(c);
  w.density = v.real("density");
  w.pressure = v.real("pressure");
  w.parallel_field = v.real("parallel_field");
  w.amplitude = v.real("amplitude");
  w.flow_speed = v.real("flow_speed");
  w.direction = v.text("direction") == "forward" ? 1 : -1;
  return w;
}

Problem polarized_alfven_wave_problem() {
  return {"polarized_alfven_wave",
          "circularly polarized Alfven wave of finite amplitude along the box diagonal", section,
          set_up, typical};
}

}  // namespace brume::problems
