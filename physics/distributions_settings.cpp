#include "physics/distributions_settings.hpp"

#include <string>
#include <vector>

#include "solver/units/constants.hpp"
#include "solver/units/dimension.hpp"

namespace brume::physics {

namespace {

namespace dim = units::dim;

// The quantities binned, their key prefix, dimension, unit and default range.
struct BinnedQuantity {
  const char* prefix;
  const char* what;
  units::Dimension dimension;
  const char* unit;  // empty: a pure number (real keys)
  const char* lowest;
  const char* highest;
};

const std::vector<BinnedQuantity>& binned_quantities() {
  static const std::vector<BinnedQuantity> list{
      {"density", "number density n", dim::number_density, "cm^-3", "1e-4 cm^-3", "1e6 cm^-3"},
      {"pressure", "thermal pressure (given as P/k_B)", dim::pressure, "K cm^-3", "1 K cm^-3",
       "1e8 K cm^-3"},
      {"temperature", "temperature", dim::temperature, "K", "1 K", "1e9 K"},
      {"plasma_beta", "plasma beta 2p/B^2", dim::none, "", "1e-4", "1e6"},
      {"dynamic_ratio", "ratio rho v^2 / B^2 of dynamic to magnetic pressure", dim::none, "",
       "1e-4", "1e6"},
      {"field", "field strength |B|", dim::magnetic_field, "uG", "1e-3 uG", "1e4 uG"},
  };
  return list;
}

config::Key bound_key(const BinnedQuantity& q, const std::string& end, const char* value) {
  const std::string description = "The " + std::string(end == "lowest" ? "lower" : "upper") +
                                  " edge of the " + (end == "lowest" ? "first" : "last") +
                                  " bin of " + q.what + ".";
  config::Key key = std::string(q.unit).empty()
                        ? config::real_key(std::string(q.prefix) + "_" + end, description)
                        : config::quantity_key(std::string(q.prefix) + "_" + end, q.dimension,
                                               q.unit, description);
  return key.with_default(value).above(0);
}

std::optional<config::Issue> ranges_ordered(const config::SectionValues& values) {
  for (const BinnedQuantity& q : binned_quantities()) {
    const std::string p = q.prefix;
    if (!(values.real(p + "_lowest") < values.real(p + "_highest"))) {
      return config::Issue{p + "_highest", "must exceed " + p + "_lowest: the bins of " + q.what +
                                               " run from the lowest to the highest edge"};
    }
  }
  return std::nullopt;
}

LogBins bins_of(const config::ResolvedConfig& config, const std::string& prefix, double scale) {
  const std::string p = "distributions." + prefix;
  return {std::size_t(config.integer(p + "_bins")), config.real(p + "_lowest") * scale,
          config.real(p + "_highest") * scale};
}

}  // namespace

config::Section distributions_section() {
  using namespace config;
  std::vector<Key> keys{
      flag_key("enabled", "Measure the PDFs and phase diagrams.").with_default("true"),
      integer_key("every", "Measure at every Nth statistics time (statistics.interval).")
          .with_default("1")
          .at_least(1)};
  for (const BinnedQuantity& q : binned_quantities()) {
    keys.push_back(integer_key(std::string(q.prefix) + "_bins",
                               std::string("Logarithmic bins of ") + q.what + ".")
                       .with_default("100")
                       .at_least(1)
                       .at_most(10000));
    keys.push_back(bound_key(q, "lowest", q.lowest));
    keys.push_back(bound_key(q, "highest", q.highest));
  }
  return {"distributions",
          "Volume- and mass-weighted PDFs of density, temperature, plasma beta and dynamic over "
          "magnetic pressure; pressure-density and field-density diagrams "
          "(docs/distributions.md).",
          std::move(keys),
          {ranges_ordered},
          std::nullopt};
}

DistributionsSettings distributions_settings(const config::ResolvedConfig& config) {
  DistributionsSettings s;
  s.enabled = config.flag("distributions.enabled");
  s.every = long(config.integer("distributions.every"));
  s.density = bins_of(config, "density", 1.0);                            // cm^-3
  s.pressure = bins_of(config, "pressure", 1.0 / units::cgs::boltzmann);  // K cm^-3
  s.temperature = bins_of(config, "temperature", 1.0);                    // K
  s.plasma_beta = bins_of(config, "plasma_beta", 1.0);
  s.dynamic_ratio = bins_of(config, "dynamic_ratio", 1.0);
  s.field = bins_of(config, "field", 1.0 / units::cgs::microgauss);  // μG
  return s;
}

}  // namespace brume::physics
