#include "problems/linear_wave.hpp"

#include <cmath>
#include <limits>
#include <stdexcept>

#include "problems/cell_fill.hpp"
#include "problems/face_field_setup.hpp"

namespace brume::problems {

namespace {

constexpr const char* section_path = "problem.linear_wave";

WaveFamily family_named(const std::string& name) {
  if (name == "fast") return WaveFamily::fast;
  if (name == "alfven") return WaveFamily::alfven;
  if (name == "slow") return WaveFamily::slow;
  if (name == "entropy") return WaveFamily::entropy;
  throw std::logic_error("unhandled wave family '" + name + "'");
}

WaveGas gas_of(const config::ResolvedConfig& c) {
  WaveGas gas;
  gas.magnetic = c.flag("gas.magnetized");
  gas.isothermal = c.text("gas.equation_of_state") == "isothermal";
  gas.gamma = c.real("gas.adiabatic_index");
  gas.sound_speed = c.real("gas.sound_speed") / c.real("units.velocity");  // code units
  return gas;
}

WaveBackground background_of(const config::SectionValues& v, const WaveGas& gas) {
  WaveBackground w;
  w.density = v.real("density");
  w.velocity = {v.real("flow_speed"), 0.0, 0.0};
  w.pressure = v.real("pressure");
  if (gas.magnetic) w.field = v.reals3("field");
  return w;
}

Eigenmode mode_of(const config::SectionValues& v, const WaveGas& gas, const WaveBackground& w) {
  return linear_eigenmode(gas, w, family_named(v.text("family")),
                          v.text("direction") == "forward" ? 1 : -1);
}

// The family must exist in this gas and be a unique eigenvector of this background.
std::optional<config::Issue> family_exists(const config::SectionValues& v) {
  const WaveGas gas = gas_of(v.config());
  try {
    (void)mode_of(v, gas, background_of(v, gas));
  } catch (const std::invalid_argument& e) {
    return config::Issue{"family", std::string(e.what()) + "; choose another family or state"};
  }
  return std::nullopt;
}

config::Section section() {
  config::Section s{
      "",
      "Linear wave: a small eigenmode of one family on a uniform background, along the box "
      "diagonal with one wavelength across each side. Values in code units.",
      {config::choice_key("family",
                          {{"fast", "Fast magnetosonic wave (the sound wave without a field)."},
                           {"alfven", "Alfven wave."},
                           {"slow", "Slow magnetosonic wave."},
                           {"entropy", "Entropy (contact) wave, carried by the flow."}},
                          "Wave family of the eigenmode.")
           .with_default("fast"),
       config::choice_key("direction",
                          {{"forward", "Along k = 2 pi (1/L_x, 1/L_y, 1/L_z) relative to the gas."},
                           {"backward", "Against k relative to the gas."}},
                          "Direction of travel (ignored by the entropy wave).")
           .with_default("forward"),
       config::real_key("amplitude",
                        "Amplitude of the eigenvector (unit 2-norm in conserved "
                        "variables).")
           .with_default("1e-6")
           .above(0)
           .at_most(0.1),
       config::real_key("density", "Background mass density, code units.")
           .with_default("1")
           .above(0),
       config::real_key("pressure",
                        "Background thermal pressure, code units (ignored when isothermal).")
           .with_default("0.6")
           .above(0),
       config::real_key("field",
                        "Background magnetic field, code units, in the wave's frame (along k, "
                        "first transverse = e_z x k normalized, second transverse).")
           .three()
           .with_default("[1, 1.4142135623730951, 0.5]"),
       config::real_key("flow_speed", "Background velocity along k, code units.")
           .with_default("0")},
      {},
      std::nullopt};
  s.validators.push_back(family_exists);
  return s;
}

TypicalState typical(const SetupContext& c) {
  const LinearWave lw = linear_wave(c);
  const auto& b = lw.background.field;
  return {lw.background.density, lw.background.pressure, std::hypot(b[0], b[1], b[2]),
          std::fabs(lw.background.velocity[0])};
}

// δq = ε r_q sin φ for every primitive variable; B = B0 + curl A with the matching A.
void set_up(const SetupContext& c, solver::State& state) {
  const LinearWave lw = linear_wave(c);
  const double eps = lw.amplitude;
  const Eigenmode& r = lw.mode;
  const WaveBackground& w = lw.background;
  if (state.magnetic) {
    set_face_field(state, lw.wave.to_box(w.field),
                   lw.wave.potential({eps * r.field[1], 0.0, eps * r.field[2], 0.0}));
  }
  fill_cells(state, c.gamma, [&](double x, double y, double z) {
    const double s = eps * std::sin(lw.wave.phase(x, y, z));
    const std::array<double, 3> v{w.velocity[0] + s * r.velocity[0],
                                  w.velocity[1] + s * r.velocity[1],
                                  w.velocity[2] + s * r.velocity[2]};
    return PrimitiveCell{w.density + s * r.density, lw.wave.to_box(v), w.pressure + s * r.pressure};
  });
}

}  // namespace

LinearWave linear_wave(const SetupContext& c) {
  const config::SectionValues v(c.config, section_path);
  LinearWave lw;
  lw.gas = gas_of(c.config);
  lw.gas.gamma = c.gamma;
  lw.gas.sound_speed = c.sound_speed;
  lw.background = background_of(v, lw.gas);
  lw.mode = mode_of(v, lw.gas, lw.background);
  lw.wave = box_diagonal_wave(c);
  lw.amplitude = v.real("amplitude");
  lw.period = lw.mode.speed == 0.0 ? std::numeric_limits<double>::infinity()
                                   : lw.wave.wavelength / std::fabs(lw.mode.speed);
  return lw;
}

Problem linear_wave_problem() {
  return {"linear_wave", "small eigenmode of one MHD wave family along the box diagonal", section,
          set_up, typical};
}

}  // namespace brume::problems
