// The configuration section `distributions` (PDFs and phase diagrams of the gas) and the bins it
// resolves to, each in the unit its edges are stored in.
#pragma once

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"
#include "physics/distributions_log_bins.hpp"

namespace brume::physics {

struct DistributionsSettings {
  bool enabled = true;
  long every = 1;         // measure at every Nth statistics time
  LogBins density;        // number density n, cm^-3
  LogBins pressure;       // P / k_B, K cm^-3
  LogBins temperature;    // K
  LogBins plasma_beta;    // 2p / B² (code units)
  LogBins dynamic_ratio;  // ρv² / B² (code units)
  LogBins field;          // |B|, μG
};

[[nodiscard]] config::Section distributions_section();
[[nodiscard]] DistributionsSettings distributions_settings(const config::ResolvedConfig& config);

}  // namespace brume::physics
