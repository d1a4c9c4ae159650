// The diagnostics a configuration asks for, each with its cadence, and the section `statistics`
// that sets when they run: inline every statistics.interval of simulated time (a diagnostic with
// `every: N` at every Nth of those times), and all of them at once by `brume analyze`.
#pragma once

#include <memory>
#include <vector>

#include "io/config/resolved.hpp"
#include "io/config/section.hpp"
#include "physics/diagnostic.hpp"
#include "physics/run_context.hpp"

namespace brume::app {

struct ScheduledDiagnostic {
  std::unique_ptr<physics::Diagnostic> diagnostic;
  long long every = 1;  // measured at every Nth statistics time
};

[[nodiscard]] config::Section statistics_section();

// Every enabled diagnostic, in a fixed order.
[[nodiscard]] std::vector<ScheduledDiagnostic> make_diagnostics(
    const config::ResolvedConfig& config, const physics::RunContext& context);

}  // namespace brume::app
