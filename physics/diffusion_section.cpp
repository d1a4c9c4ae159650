#include "physics/diffusion_section.hpp"

#include <cmath>
#include <string>

#include "solver/units/dimension.hpp"

namespace brume::physics {

namespace {

namespace dim = units::dim;

// Conduction of the neutral atomic medium: κ = 2.5 × 10³ T^½ erg s⁻¹ cm⁻¹ K⁻¹ (Parker 1953, ApJ
// 117, 431; the value of Koyama & Inutsuka 2004, ApJ 602, L25, eq. 4; from memory).
constexpr double neutral_conductivity_at_1_kelvin = 2.5e3;
constexpr double neutral_exponent = 0.5;

std::optional<config::Issue> conduction_needs_energy(const config::SectionValues& values) {
  if (values.text("conduction") == "off") return std::nullopt;
  if (values.config().text("gas.equation_of_state") != "isothermal") return std::nullopt;
  return config::Issue{"conduction",
                       "conduction is " + values.text("conduction") +
                           " but gas.equation_of_state is isothermal, which has no energy "
                           "equation; set conduction: off or use an ideal gas"};
}

std::optional<config::Issue> resistivity_needs_field(const config::SectionValues& values) {
  if (values.real("resistivity") <= 0.0 || values.config().flag("gas.magnetized"))
    return std::nullopt;
  return config::Issue{"resistivity",
                       "resistivity is above 0 but gas.magnetized is false; set resistivity: 0 "
                       "or gas.magnetized: true"};
}

}  // namespace

config::Section diffusion_section() {
  return {
      "diffusion",
      "Thermal conduction, viscosity and Ohmic resistivity, advanced explicitly with RKL2 "
      "super-time-stepping by half a step before and after the ideal-MHD step.",
      {config::choice_key(
           "conduction",
           {{"off", "No thermal conduction."},
            {"constant", "Constant conductivity κ = conductivity."},
            {"power_law", "κ = conductivity × (T / reference_temperature)^conductivity_exponent."},
            {"neutral_atomic",
             "κ = 2.5e3 T^0.5 erg s^-1 cm^-1 K^-1 of neutral atomic hydrogen (Parker 1953, "
             "as in Koyama & Inutsuka 2004); the three keys below are ignored."}},
           "Law of the isotropic heat flux q = -κ ∇T.")
           .with_default("off"),
       config::quantity_key("conductivity", dim::conductivity, "erg s^-1 cm^-1 K^-1",
                            "κ (constant law), or κ at reference_temperature (power law).")
           .with_default("0 erg s^-1 cm^-1 K^-1")
           .at_least(0),
       config::quantity_key("reference_temperature", dim::temperature, "K",
                            "Temperature at which the power law has κ = conductivity.")
           .with_default("1 K")
           .above(0),
       config::real_key("conductivity_exponent", "Exponent a of the power law κ ∝ T^a.")
           .with_default("0.5")
           .at_least(-5)
           .at_most(5),
       config::quantity_key("viscosity", dim::diffusivity, "cm^2 s^-1",
                            "Kinematic viscosity ν (constant); the dynamic viscosity is ρν.")
           .with_default("0 cm^2 s^-1")
           .at_least(0),
       config::quantity_key("resistivity", dim::diffusivity, "cm^2 s^-1",
                            "Ohmic magnetic diffusivity η (constant): E = η ∇×B is added on "
                            "the cell edges.")
           .with_default("0 cm^2 s^-1")
           .at_least(0),
       config::integer_key("max_stages",
                           "Most RKL2 stages in one super-step; a half step needing more is "
                           "split into equal super-steps (and the log says so).")
           .with_default("64")
           .at_least(2)
           .at_most(100000)},
      {conduction_needs_energy, resistivity_needs_field},
      std::nullopt};
}

bool diffusion_requested(const config::ResolvedConfig& config) {
  return config.text("diffusion.conduction") != "off" || config.real("diffusion.viscosity") > 0.0 ||
         config.real("diffusion.resistivity") > 0.0;
}

DiffusionCoefficients diffusion_coefficients(const config::ResolvedConfig& config,
                                             const RunContext& context) {
  const units::CodeUnits& u = context.code_units;
  const double temperature_unit = u.temperature(context.mean_molecular_weight);
  // A flux κ ∂T/∂x (erg cm⁻² s⁻¹) with T = θ T_u and x = x' L_u is κ T_u / L_u ∂θ/∂x', in code
  // units of energy flux P_u V_u.
  const double conductivity_unit = u.pressure() * u.velocity * u.length / temperature_unit;
  const double diffusivity_unit = u.length * u.velocity;
  DiffusionCoefficients k;
  k.gamma = context.gamma;
  const std::string& law = config.text("diffusion.conduction");
  if (law == "constant") {
    k.conduction = ConductionLaw::constant;
    k.conductivity = config.real("diffusion.conductivity") / conductivity_unit;
  } else if (law == "power_law" || law == "neutral_atomic") {
    const bool neutral = law == "neutral_atomic";
    k.conduction = ConductionLaw::power_law;
    k.conductivity =
        (neutral ? neutral_conductivity_at_1_kelvin : config.real("diffusion.conductivity")) /
        conductivity_unit;
    k.reference_theta =
        (neutral ? 1.0 : config.real("diffusion.reference_temperature")) / temperature_unit;
    k.conductivity_exponent =
        neutral ? neutral_exponent : config.real("diffusion.conductivity_exponent");
  }
  k.viscosity = config.real("diffusion.viscosity") / diffusivity_unit;
  k.resistivity = context.magnetic ? config.real("diffusion.resistivity") / diffusivity_unit : 0.0;
  return k;
}

double conductivity_cgs(const config::ResolvedConfig& config, double t) {
  const std::string& law = config.text("diffusion.conduction");
  if (law == "constant") return config.real("diffusion.conductivity");
  if (law == "neutral_atomic")
    return neutral_conductivity_at_1_kelvin * std::pow(t, neutral_exponent);
  if (law == "power_law") {
    return config.real("diffusion.conductivity") *
           std::pow(t / config.real("diffusion.reference_temperature"),
                    config.real("diffusion.conductivity_exponent"));
  }
  return 0.0;
}

int diffusion_max_stages(const config::ResolvedConfig& config) {
  return int(config.integer("diffusion.max_stages"));
}

}  // namespace brume::physics
