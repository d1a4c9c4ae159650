// A problem: an initial condition registered by name, with its own configuration section
// "problem.<name>". The run loop finds it by the value of problem.name.
#pragma once

#include <array>
#include <string>
#include <vector>

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"
#include "solver/state.hpp"
#include "solver/units/code_units.hpp"

namespace brume::problems {

// What an initial condition needs besides its own parameters. Lengths, velocities, densities,
// pressures and fields handed to the state are in code units.
struct SetupContext {
  const config::ResolvedConfig& config;
  units::CodeUnits code_units;
  double mean_molecular_weight = 1.0;
  double gamma = 5.0 / 3.0;           // adiabatic index (ideal gas)
  double sound_speed = 1.0;           // isothermal sound speed, code units
  std::array<double, 3> box_lower{};  // code units
  std::array<double, 3> box_size{};   // code units
  std::array<long, 3> box_cells{};
};

// A typical state of the problem, for the derived quantities `brume check` prints (code units).
struct TypicalState {
  double density = 1.0;
  double pressure = 1.0;  // ignored when isothermal
  double field = 0.0;     // |B|
  double speed = 0.0;     // typical flow speed
};

struct Problem {
  std::string name;
  std::string summary;
  // The section "problem.<name>" with the problem's parameters.
  config::Section (*section)();
  // Fill the interior cells and faces of `state` (ghosts are filled by the caller).
  void (*set_up)(const SetupContext& context, solver::State& state);
  TypicalState (*typical)(const SetupContext& context);
};

// Every registered problem, in a fixed order.
[[nodiscard]] const std::vector<Problem>& all_problems();

// The problem of that name; the name has been validated by the schema (a choice key).
[[nodiscard]] const Problem& find_problem(const std::string& name);

// The schema sections of every problem, each active only when problem.name selects it.
[[nodiscard]] std::vector<config::Section> problem_sections();

// The choices of problem.name.
[[nodiscard]] std::vector<config::Choice> problem_choices();

}  // namespace brume::problems
