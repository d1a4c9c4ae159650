#include <stdexcept>

#include "problems/blast_wave.hpp"
#include "problems/decaying_turbulence.hpp"
#include "problems/driven_turbulence.hpp"
#include "problems/field_loop.hpp"
#include "problems/kelvin_helmholtz.hpp"
#include "problems/linear_wave.hpp"
#include "problems/orszag_tang.hpp"
#include "problems/polarized_alfven_wave.hpp"
#include "problems/problem.hpp"
#include "problems/shock_tube.hpp"
#include "problems/thermal_instability.hpp"

namespace brume::problems {

const std::vector<Problem>& all_problems() {
  static const std::vector<Problem> list = {
      decaying_turbulence_problem(), field_loop_problem(),
      orszag_tang_problem(),         blast_wave_problem(),
      kelvin_helmholtz_problem(),    shock_tube_problem(),
      linear_wave_problem(),         polarized_alfven_wave_problem(),
      driven_turbulence_problem(),   thermal_instability_problem(),
  };
  return list;
}

const Problem& find_problem(const std::string& name) {
  for (const auto& problem : all_problems()) {
    if (problem.name == name) return problem;
  }
  throw std::logic_error("no problem named '" + name + "' is registered");
}

std::vector<config::Section> problem_sections() {
  std::vector<config::Section> sections;
  for (const auto& problem : all_problems()) {
    config::Section section = problem.section();
    section.path = "problem." + problem.name;
    section.only_when = config::Activation{"problem.name", problem.name};
    sections.push_back(std::move(section));
  }
  return sections;
}

std::vector<config::Choice> problem_choices() {
  std::vector<config::Choice> choices;
  for (const auto& problem : all_problems())
    choices.push_back({problem.name, problem.summary});
  return choices;
}

}  // namespace brume::problems
