// The thermal-equilibrium figures `brume check` prints when cooling is on.
#pragma once

#include <string>
#include <utility>
#include <vector>

#include "physics/cooling_settings.hpp"

namespace brume::physics {

[[nodiscard]] std::vector<std::pair<std::string, std::string>> cooling_summary(
    const CoolingSettings& settings, double gamma);

}  // namespace brume::physics
