#include "physics/sky_settings.hpp"

#include <array>
#include <string>

#include "physics/sky_wavenumber_bins.hpp"
#include "solver/units/constants.hpp"
#include "solver/units/dimension.hpp"

namespace brume::physics {

namespace {

namespace dim = units::dim;

std::vector<int> axes_named(const std::string& letters) {
  std::vector<int> axes;
  for (int a = 0; a < 3; ++a) {
    if (letters.find(char('x' + a)) != std::string::npos) axes.push_back(a);
  }
  return axes;
}

std::string number_text(double value) {
  std::string text = std::to_string(value);
  while (text.size() > 1 && text.back() == '0')
    text.pop_back();
  if (!text.empty() && text.back() == '.') text.pop_back();
  return text;
}

// An explicit fit range must be ordered and lie inside the full annuli of every map it applies to
// (maps thinner than 2 cells have no spectrum and are skipped).
std::optional<config::Issue> fit_range_fits_the_maps(const config::SectionValues& values) {
  if (!values.flag("enabled")) return std::nullopt;
  const double lowest = values.real("fit_lowest_wavenumber");
  const double highest = values.real("fit_highest_wavenumber");
  if (highest == 0.0) return std::nullopt;
  if (!(highest > lowest)) {
    return config::Issue{"fit_highest_wavenumber",
                         "is " + number_text(highest) + ", not above fit_lowest_wavenumber (" +
                             number_text(lowest) + "); give a larger value or 0 (automatic)"};
  }
  const auto cells = values.config().integers3("box.cells");
  const auto size = values.config().reals3("box.size");
  const std::array<long, 3> box{long(cells[0]), long(cells[1]), long(cells[2])};
  for (const int a : axes_named(values.text("axes"))) {
    const SkyMapGeometry g = sky_map_geometry(a, box, size);
    if (g.cells_u < 2 || g.cells_v < 2) continue;
    const long largest = sky_largest_annulus(g);
    if (highest > double(largest)) {
      return config::Issue{"fit_highest_wavenumber",
                           "is " + number_text(highest) + " but the map along " + axis_letter(a) +
                               " (" + std::to_string(g.cells_u) + " × " +
                               std::to_string(g.cells_v) + " cells) has full annuli up to " +
                               std::to_string(largest) + " only; give at most " +
                               std::to_string(largest) + " or 0 (automatic)"};
    }
  }
  return std::nullopt;
}

}  // namespace

config::Section sky_maps_section() {
  using namespace config;
  return {"sky_maps",
          "Synthetic observables: column density and optically thin dust-polarization maps (Stokes "
          "I, Q, U) projected along the box axes, with their E/B power spectra (docs/sky-maps.md).",
          {flag_key("enabled", "Make the maps at the statistics times.").with_default("true"),
           integer_key("every", "Make them at every Nth statistics time (statistics.interval).")
               .with_default("1")
               .at_least(1),
           choice_key("axes",
                      {{"x", "Along x only."},
                       {"y", "Along y only."},
                       {"z", "Along z only."},
                       {"xy", "Along x and y."},
                       {"xz", "Along x and z."},
                       {"yz", "Along y and z."},
                       {"xyz", "Along all three axes."}},
                      "Lines of sight: the box axes to project along.")
               .with_default("xyz"),
           real_key("polarization_fraction",
                    "Intrinsic polarization fraction p0 of the dust emission: a parameter of the "
                    "model (grain properties and alignment), not a prediction.")
               .with_default("0.1")
               .above(0)
               .at_most(1),
           choice_key(
               "intensity",
               {{"column", "I = integral of n ds: a field in the plane of the sky gives p = p0."},
                {"alignment_corrected",
                 "I = integral of n [1 - p0 (cos^2 gamma - 2/3)] ds (Planck Collaboration "
                 "Int. XX 2015)."}},
               "Model of the total intensity I.")
               .with_default("column"),
           quantity_key("density_cut", dim::number_density, "cm^-3",
                        "Gas denser than this is removed from every line of sight (0: none).")
               .with_default("0 cm^-3")
               .at_least(0),
           real_key("fit_lowest_wavenumber",
                    "Lowest annulus of the power-law fits and of the BB/EE ratio, in units of "
                    "2 pi / L (L: the longer map edge).")
               .with_default("2")
               .at_least(1),
           real_key("fit_highest_wavenumber",
                    "Highest annulus of the fits and of the ratio, units of 2 pi / L; 0: half the "
                    "largest full annulus of each map.")
               .with_default("0")
               .at_least(0)},
          {fit_range_fits_the_maps},
          std::nullopt};
}

SkySettings sky_settings(const config::ResolvedConfig& config, const RunContext& context) {
  SkySettings s;
  s.enabled = config.flag("sky_maps.enabled");
  s.every = config.integer("sky_maps.every");
  s.axes = axes_named(config.text("sky_maps.axes"));
  s.polarization_fraction = config.real("sky_maps.polarization_fraction");
  s.intensity = config.text("sky_maps.intensity") == "alignment_corrected"
                    ? SkyIntensity::alignment_corrected
                    : SkyIntensity::column;
  s.number_density_cut = config.real("sky_maps.density_cut");
  // n = ρ / (μ m_H), the particles of the run's mean mass (solver/units/code_units.hpp).
  s.density_cut = s.number_density_cut * context.mean_molecular_weight * units::cgs::hydrogen_mass /
                  context.code_units.density;
  s.fit_lowest = config.real("sky_maps.fit_lowest_wavenumber");
  s.fit_highest = config.real("sky_maps.fit_highest_wavenumber");
  return s;
}

}  // namespace brume::physics
