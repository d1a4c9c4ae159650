#include "physics/cooling_settings.hpp"

#include "physics/cooling_table_reader.hpp"
#include "solver/units/dimension.hpp"

namespace brume::physics {

namespace {

namespace dim = units::dim;

// The energy equation is what cooling changes: an isothermal gas has none.
std::optional<config::Issue> needs_an_energy_equation(const config::SectionValues& values) {
  if (values.flag("enabled") && values.config().text("gas.equation_of_state") == "isothermal") {
    return config::Issue{"enabled",
                         "heating and cooling change the thermal energy, but "
                         "gas.equation_of_state is isothermal; set it to ideal or set "
                         "cooling.enabled: false"};
  }
  return std::nullopt;
}

std::optional<config::Issue> table_named(const config::SectionValues& values) {
  if (values.text("function") == "table" && values.text("table_file").empty()) {
    return config::Issue{"table_file",
                         "cooling.function is table but no table_file is given; name a file "
                         "of temperature (K) and cooling function (erg cm^3 s^-1) columns"};
  }
  return std::nullopt;
}

std::optional<config::Issue> floor_below_ceiling(const config::SectionValues& values) {
  if (!(values.real("temperature_floor") < values.real("temperature_ceiling"))) {
    return config::Issue{"temperature_ceiling",
                         "the temperature ceiling must exceed the temperature floor"};
  }
  return std::nullopt;
}

}  // namespace

config::Section cooling_section() {
  return {"cooling",
          "Optically thin heating and cooling: net loss n^2 Lambda(T) - n Gamma per volume, "
          "operator split (docs/cooling.md).",
          {config::flag_key("enabled", "Heat and cool the gas (needs an ideal gas).")
               .with_default("false"),
           config::choice_key(
               "function",
               {{"koyama_inutsuka", "Analytic fit of Koyama & Inutsuka 2002 (ApJ 564, L97)."},
                {"table", "Lambda(T) read from table_file (docs/cooling.md)."}},
               "The cooling function Lambda(T).")
               .with_default("koyama_inutsuka"),
           config::quantity_key("heating_rate", dim::power, "erg/s",
                                "Constant heating Gamma per particle (photoelectric heating).")
               .with_default("2e-26 erg/s")
               .at_least(0),
           config::text_key("table_file",
                            "Table of T (K) and Lambda (erg cm^3 s^-1) when function is table; "
                            "a relative path is taken from the working directory.")
               .with_default("\"\""),
           config::quantity_key("temperature_floor", dim::temperature, "K",
                                "Lowest temperature the cooling may leave.")
               .with_default("10 K")
               .above(0),
           config::quantity_key("temperature_ceiling", dim::temperature, "K",
                                "Highest temperature the heating may leave.")
               .with_default("1e9 K")
               .above(0),
           config::real_key("time_step_fraction",
                            "Limit the time step to this fraction of the shortest cooling time "
                            "e_th / |n^2 Lambda - n Gamma|; 0 for no limit.")
               .with_default("0")
               .at_least(0),
           config::real_key("relative_tolerance",
                            "Relative error allowed per sub-step of the cell integrator.")
               .with_default("1e-6")
               .at_least(1e-12)
               .at_most(1e-2)},
          {needs_an_energy_equation, table_named, floor_below_ceiling},
          std::nullopt};
}

CoolingSettings cooling_settings(const config::ResolvedConfig& config) {
  CoolingSettings s;
  s.enabled = config.flag("cooling.enabled");
  s.net.heating = config.real("cooling.heating_rate");
  if (config.text("cooling.function") == "table") {
    s.net.function = read_cooling_table(config.text("cooling.table_file"), "cooling.table_file");
  }
  s.temperature_floor = config.real("cooling.temperature_floor");
  s.temperature_ceiling = config.real("cooling.temperature_ceiling");
  s.time_step_fraction = config.real("cooling.time_step_fraction");
  s.relative_tolerance = config.real("cooling.relative_tolerance");
  return s;
}

}  // namespace brume::physics
