// The sections every brume run reads: the box, the gas, the code units, the numerical scheme,
// the clock, the outputs and the choice of problem.
#pragma once

#include <vector>

#include "io/config/section.hpp"

namespace brume::config {

// problems: the registered problem names with a one-line description each (the choices of
// problem.name). Problems contribute their own subsections "problem.<name>".
[[nodiscard]] std::vector<Section> core_sections(const std::vector<Choice>& problems);

}  // namespace brume::config
