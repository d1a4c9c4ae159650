// What `brume bench scaling` prints: a table (one row per case) or, with --json, the document of
// `brume bench --json` whose entries carry the scaling fields as well.
#pragma once

#include <vector>

#include "app/bench_scaling_efficiency.hpp"

namespace brume::app {

void print_scaling_header(int world_ranks);
void print_scaling_row(const ScalingEntry& e);
void print_scaling_legend();

void print_scaling_json(const std::vector<ScalingEntry>& entries);

// Share of a step's mean wall time that the halo exchange alone takes.
[[nodiscard]] double halo_share(const DecomposedResult& r);

}  // namespace brume::app
