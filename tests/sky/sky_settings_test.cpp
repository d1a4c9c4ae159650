// The section `sky_maps` through a schema of the core sections and this section: defaults, the
// conversion of the density cut to code units, and the refused inputs with file, line and key.
#include <gtest/gtest.h>

#include <string>
#include <vector>

#include "io/config/core_sections.hpp"
#include "io/config/error.hpp"
#include "io/config/load.hpp"
#include "physics/sky_maps.hpp"
#include "physics/sky_settings.hpp"
#include "solver/units/code_units.hpp"

namespace brume::physics {
namespace {

const config::Schema& schema() {
  static const config::Schema s = config::Schema::combine(
      {config::core_sections({{"quiet_box", "Gas at rest."}}), {sky_maps_section()}});
  return s;
}

const std::string kBase =
    "problem:\n  name: quiet_box\nclock:\n  stop_time: 1 Myr\nbox:\n  cells: [32, 32, 32]\n";

config::ResolvedConfig load(const std::string& extra, const std::vector<std::string>& sets = {}) {
  return config::load_text(schema(), kBase + extra, "sky.yaml", sets);
}

RunContext context(double mu) {
  RunContext c;
  c.mean_molecular_weight = mu;
  c.code_units = units::code_units_from_number_density(3.0857e18, 1e5, 2.0, mu);
  return c;
}

TEST(SkySettings, Defaults) {
  const SkySettings s = sky_settings(load(""), context(1.0));
  EXPECT_TRUE(s.enabled);
  EXPECT_EQ(s.every, 1);
  EXPECT_EQ(s.axes, (std::vector<int>{0, 1, 2}));
  EXPECT_EQ(s.polarization_fraction, 0.1);
  EXPECT_EQ(s.intensity, SkyIntensity::column);
  EXPECT_EQ(s.density_cut, 0.0);
  EXPECT_EQ(s.fit_lowest, 2.0);
  EXPECT_EQ(s.fit_highest, 0.0);
  EXPECT_EQ(make_sky_maps(load(""), context(1.0))->name(), "sky_maps");
}

// Code units from a number density n_u give ρ_u = μ m_H n_u (solver/units/code_units.hpp), so a
// cut of n particles per cm³ is n / n_u in code density, whatever μ. Round-off: 1e-14.
TEST(SkySettings, DensityCutInCodeUnits) {
  const SkySettings s =
      sky_settings(load("sky_maps:\n  density_cut: 300 cm^-3\n  axes: yz\n"), context(1.27));
  EXPECT_NEAR(s.density_cut, 150.0, 1e-14 * 150.0);
  EXPECT_EQ(s.number_density_cut, 300.0);
  EXPECT_EQ(s.axes, (std::vector<int>{1, 2}));
}

std::string refusal(const std::string& extra) {
  try {
    (void)load(extra);
  } catch (const config::Error& e) {
    return e.what();
  }
  return "";
}

TEST(SkySettings, FitRangeBeyondTheMapsIsRefusedWithItsLine) {
  // A 32² map has full annuli up to 15 (the annulus m + ½ ≤ 16, its Nyquist wavenumber).
  const std::string message = refusal("sky_maps:\n  fit_highest_wavenumber: 20\n");
  EXPECT_NE(message.find("sky.yaml:8"), std::string::npos) << message;
  EXPECT_NE(message.find("sky_maps.fit_highest_wavenumber"), std::string::npos) << message;
  EXPECT_NE(message.find("up to 15"), std::string::npos) << message;
  EXPECT_EQ(refusal("sky_maps:\n  fit_highest_wavenumber: 15\n"), "");
  const std::string unordered =
      refusal("sky_maps:\n  fit_lowest_wavenumber: 6\n  fit_highest_wavenumber: 4\n");
  EXPECT_NE(unordered.find("not above fit_lowest_wavenumber"), std::string::npos) << unordered;
}

TEST(SkySettings, OutOfRangeValuesAreRefused) {
  EXPECT_NE(
      refusal("sky_maps:\n  polarization_fraction: 1.5\n").find("sky_maps.polarization_fraction"),
      std::string::npos);
  EXPECT_NE(refusal("sky_maps:\n  axes: w\n").find("sky_maps.axes"), std::string::npos);
  EXPECT_NE(refusal("sky_maps:\n  every: 0\n").find("sky_maps.every"), std::string::npos);
  EXPECT_NE(refusal("sky_maps:\n  density_cut: -1 cm^-3\n").find("sky_maps.density_cut"),
            std::string::npos);
}

}  // namespace
}  // namespace brume::physics
