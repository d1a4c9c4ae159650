// Whether a run resolves the Field length λ_F = √(κT/(n²Λ)) (Begelman & McKee 1990, ApJ 358,
// 375, eq. 1; from memory) of the gas it cools, on the equilibrium curve over the densities of
// the two-phase medium (the isobarically unstable range up to ten times its densest end). Koyama
// & Inutsuka 2004 (ApJ 602, L25) find thermal instability converged when λ_F spans at least three
// cells (from memory). Without conduction λ_F is zero: cold structures are then set by the grid.
#pragma once

#include <optional>
#include <string>

#include "io/config/resolved.hpp"

namespace brume::physics {

struct FieldLengthCheck {
  bool conduction = false;
  double smallest_cells = 0.0;  // min of λ_F / Δx over the densities checked
  double at_density = 0.0;      // cm^-3, where the minimum is
  double field_length = 0.0;    // cm, there
  bool resolved = false;        // smallest_cells ≥ 3
};

inline constexpr double field_length_cells_needed = 3.0;

// cell_size: the largest cell edge, cm. Empty when cooling is off or the cooling function has no
// unstable range.
[[nodiscard]] std::optional<FieldLengthCheck> field_length_check(
    const config::ResolvedConfig& config, double cell_size);

// One line for `brume check` and the run log.
[[nodiscard]] std::string field_length_text(const FieldLengthCheck& check);

}  // namespace brume::physics
