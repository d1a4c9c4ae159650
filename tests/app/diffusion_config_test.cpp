// The `diffusion` section through the full schema: the keys, their units, the conversion to code
// units, the term that make_source_terms creates and the refused combinations.
#include <gtest/gtest.h>

#include <cmath>
#include <memory>
#include <string>
#include <vector>

#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/source_terms.hpp"
#include "io/config/error.hpp"
#include "io/config/load.hpp"
#include "physics/diffusion_section.hpp"
#include "solver/box_boundaries.hpp"
#include "solver/units/constants.hpp"

namespace brume::app {
namespace {

namespace cgs = units::cgs;

const std::string kInput = std::string(BRUME_SOURCE_DIR) + "/tests/mpi/decaying_box.yaml";

config::ResolvedConfig load(const std::vector<std::string>& overrides) {
  return config::load(brume_schema(), kInput, overrides);
}

physics::RunContext context_of(const RunSetup& setup) {
  return run_context(setup, MPI_COMM_WORLD,
                     std::make_shared<solver::BoxGhostFiller>(solver::BoxBoundaries{}));
}

TEST(DiffusionConfig, OffByDefault) {
  const config::ResolvedConfig config = load({});
  EXPECT_FALSE(physics::diffusion_requested(config));
  const RunSetup setup = make_run_setup(config);
  EXPECT_TRUE(make_source_terms(config, context_of(setup)).empty());
}

// ν and η in cm² s⁻¹ become code diffusivities L_u V_u: 1 pc × 1 km/s = 3.0857e18 cm × 1e5 cm/s
// (parsec and kilometre of solver/units/constants.hpp, IAU 2015 Resolution B2).
TEST(DiffusionConfig, ViscosityAndResistivityInCodeUnits) {
  const config::ResolvedConfig config =
      load({"diffusion.viscosity=2e24 cm^2 s^-1", "diffusion.resistivity=3e23 cm^2 s^-1"});
  ASSERT_TRUE(physics::diffusion_requested(config));
  const RunSetup setup = make_run_setup(config);
  const physics::DiffusionCoefficients k =
      physics::diffusion_coefficients(config, context_of(setup));
  const double unit = cgs::parsec * 1e5;
  EXPECT_NEAR(k.viscosity, 2e24 / unit, 1e-12 * k.viscosity);
  EXPECT_NEAR(k.resistivity, 3e23 / unit, 1e-12 * k.resistivity);
  const auto terms = make_source_terms(config, context_of(setup));
  ASSERT_EQ(terms.size(), 1U);
  EXPECT_EQ(terms[0]->name(), "diffusion");
}

// The thermal diffusivity of an ideal gas, D = (γ − 1) κ / (n k_B) with n = ρ/(μ m_H) (from
// ρ c_v ∂T/∂t = ∇·(κ∇T), c_v = k_B / ((γ − 1) μ m_H); common practice, no source), computed in
// cgs with CODATA 2018 k_B, against the code's (γ − 1) κ_code / ρ_code times L_u V_u. The neutral
// preset is κ = 2.5e3 T^½ (Koyama & Inutsuka 2004, ApJ 602, L25, from memory). Tolerance 1e-12
// relative: unit conversions in double.
TEST(DiffusionConfig, ConductivityInCodeUnitsGivesTheThermalDiffusivity) {
  for (const std::string law : {"constant", "neutral_atomic"}) {
    const config::ResolvedConfig config =
        load({"diffusion.conduction=" + law, "diffusion.conductivity=4e7 erg s^-1 cm^-1 K^-1"});
    const RunSetup setup = make_run_setup(config);
    const physics::RunContext context = context_of(setup);
    const physics::DiffusionCoefficients k = physics::diffusion_coefficients(config, context);
    const double temperature = 8000.0;  // K
    const double theta = temperature / setup.code_units.temperature(setup.mean_molecular_weight);
    const double kappa_cgs = law == "constant" ? 4e7 : 2.5e3 * std::sqrt(temperature);
    const double kappa_code = law == "constant"
                                  ? k.conductivity
                                  : k.conductivity * std::pow(theta / k.reference_theta, 0.5);
    const double n = 1.0;  // cm^-3: the density unit and the density of the problem
    const double expected = (setup.gamma - 1.0) * kappa_cgs / (n * cgs::boltzmann);
    const double rho_code =
        setup.mean_molecular_weight * cgs::hydrogen_mass * n / setup.code_units.density;
    const double code = (setup.gamma - 1.0) * kappa_code / rho_code * setup.code_units.length *
                        setup.code_units.velocity;
    EXPECT_NEAR(code, expected, 1e-12 * expected) << law;
  }
}

void expect_refused(const std::vector<std::string>& overrides, const std::string& words) {
  try {
    (void)load(overrides);
    ADD_FAILURE() << "accepted " << overrides.back();
  } catch (const config::Error& e) {
    EXPECT_NE(std::string(e.what()).find(words), std::string::npos) << e.what();
  }
}

TEST(DiffusionConfig, RefusesWhatCannotWork) {
  expect_refused({"gas.magnetized=false", "scheme.riemann_solver=hllc",
                  "diffusion.resistivity=1e20 cm^2 s^-1"},
                 "diffusion.resistivity: resistivity is above 0 but gas.magnetized is false");
  expect_refused({"gas.equation_of_state=isothermal", "diffusion.conduction=constant"},
                 "diffusion.conduction: conduction is constant but gas.equation_of_state is "
                 "isothermal");
  expect_refused({"diffusion.viscosity=3 K"}, "diffusion.viscosity");
  expect_refused({"diffusion.viscosity=-1 cm^2 s^-1"}, "diffusion.viscosity");
  expect_refused({"diffusion.conduction=spitzer"}, "diffusion.conduction");
  expect_refused({"diffusion.max_stages=1"}, "diffusion.max_stages");
}

}  // namespace
}  // namespace brume::app
