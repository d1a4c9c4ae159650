#include "physics/jeans_settings.hpp"

#include <string>

#include "solver/units/dimension.hpp"

namespace brume::physics {

namespace {

std::optional<config::Issue> pdf_range_ordered(const config::SectionValues& values) {
  if (!(values.real("pdf_lowest") < values.real("pdf_highest"))) {
    return config::Issue{"pdf_highest",
                         "must exceed pdf_lowest: the bins of s = ln(rho/mean rho) run from the "
                         "lowest to the highest edge"};
  }
  return std::nullopt;
}

}  // namespace

config::Section jeans_section() {
  using namespace config;
  return {
      "jeans",
      "Jeans resolution of the gas (Truelove et al. 1997) and the multi-free-fall star-formation "
      "rate per free-fall time from the density PDF (Krumholz & McKee 2005 critical density; "
      "Federrath & Klessen 2012); docs/jeans.md.",
      {flag_key("enabled", "Measure the Jeans resolution and the star-formation estimate.")
           .with_default("true"),
       integer_key("every", "Measure at every Nth statistics time (statistics.interval).")
           .with_default("1")
           .at_least(1),
       real_key("cells",
                "Resolution length in cells (the largest cell width) when length is 0; 4 is the "
                "criterion of Truelove et al. 1997 (ApJ 489, L179).")
           .with_default("4")
           .above(0),
       quantity_key("length", units::dim::length, "pc",
                    "Resolution length; 0 to use cells times the cell width.")
           .with_default("0 pc")
           .at_least(0),
       flag_key("magnetic_support",
                "Jeans length with the magnetosonic speed sqrt(c_s^2 + v_A^2) in place of the "
                "isothermal sound speed c_s = sqrt(p/rho).")
           .with_default("false"),
       real_key("efficiency",
                "Local core-to-star efficiency epsilon of the star-formation rate per free-fall "
                "time.")
           .with_default("0.5")
           .above(0)
           .at_most(1),
       real_key("time_factor",
                "phi_t: the collapse time of the critical density in free-fall times "
                "(Krumholz & McKee 2005).")
           .with_default("1.91")
           .above(0),
       real_key("critical_density_factor",
                "phi_x of the Krumholz & McKee 2005 critical density (Jeans length over sonic "
                "length at collapse).")
           .with_default("1.12")
           .above(0),
       integer_key("pdf_bins", "Bins of the volume-weighted PDF of s = ln(rho/mean rho).")
           .with_default("400")
           .at_least(1)
           .at_most(100000),
       real_key("pdf_lowest", "s = ln(rho/mean rho) of the first bin's lower edge.")
           .with_default("-20")
           .at_least(-700)
           .at_most(700),
       real_key("pdf_highest", "s = ln(rho/mean rho) of the last bin's upper edge.")
           .with_default("20")
           .at_least(-700)
           .at_most(700)},
      {pdf_range_ordered},
      std::nullopt};
}

JeansSettings jeans_settings(const config::ResolvedConfig& config) {
  JeansSettings s;
  s.enabled = config.flag("jeans.enabled");
  s.every = long(config.integer("jeans.every"));
  s.cells = config.real("jeans.cells");
  s.length = config.real("jeans.length");
  s.magnetic_support = config.flag("jeans.magnetic_support");
  s.efficiency = config.real("jeans.efficiency");
  s.time_factor = config.real("jeans.time_factor");
  s.critical_density_factor = config.real("jeans.critical_density_factor");
  s.pdf_bins = std::size_t(config.integer("jeans.pdf_bins"));
  s.pdf_lowest = config.real("jeans.pdf_lowest");
  s.pdf_highest = config.real("jeans.pdf_highest");
  return s;
}

}  // namespace brume::physics
