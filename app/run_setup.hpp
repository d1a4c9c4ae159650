// What a configuration implies before anything runs: code units, grid, gas and the problem's
// typical state, in the form both `brume check` and `brume run` use.
#pragma once

#include <string>
#include <utility>
#include <vector>

#include "io/config/resolved.hpp"
#include "problems/problem.hpp"
#include "solver/units/code_units.hpp"

namespace brume::app {

struct RunSetup {
  units::CodeUnits code_units;
  double mean_molecular_weight = 1.0;
  bool isothermal = false;
  bool magnetic = true;  // false when the problem's field is zero and the scheme is hydro-only
  double gamma = 5.0 / 3.0;
  double sound_speed = 1.0;  // isothermal, code units
  std::array<long, 3> cells{};
  std::array<double, 3> lower{};  // code units
  std::array<double, 3> size{};   // code units
  const problems::Problem* problem = nullptr;
};

[[nodiscard]] RunSetup make_run_setup(const config::ResolvedConfig& config);

[[nodiscard]] problems::SetupContext setup_context(const config::ResolvedConfig& config,
                                                   const RunSetup& setup);

// The longest cell edge, cm.
[[nodiscard]] double largest_cell_edge(const RunSetup& setup);

// Derived quantities as (name, value with unit) lines for `brume check`.
[[nodiscard]] std::vector<std::pair<std::string, std::string>> derived_quantities(
    const config::ResolvedConfig& config, const RunSetup& setup);

}  // namespace brume::app
