// The whole step of a run: the source terms by dt/2, the ideal-MHD step by dt, the source terms
// by dt/2 in reverse order (Strang 1968, SIAM J. Numer. Anal. 5, 506). With no source terms it is
// the ideal-MHD step itself.
#pragma once

#include <memory>
#include <vector>

#include "physics/source_term.hpp"
#include "solver/ghost_filler.hpp"
#include "solver/integrator.hpp"

namespace brume::app {

class SplitIntegrator final : public solver::Integrator {
 public:
  SplitIntegrator(std::unique_ptr<solver::Integrator> ideal,
                  std::vector<std::unique_ptr<physics::SourceTerm>> terms,
                  std::shared_ptr<const solver::GhostFiller> ghosts);

  [[nodiscard]] double stable_time_step(const solver::State& state) const override;
  // A non-finite value left by a source term is reported as a failure of stage 3 (first half)
  // or 4 (second half), agreed over the blocks.
  solver::StepReport advance(solver::State& state, double dt) override;
  [[nodiscard]] std::size_t allocated_bytes() const override;

  [[nodiscard]] const std::vector<std::unique_ptr<physics::SourceTerm>>& terms() const {
    return terms_;
  }

 private:
  bool sources(solver::State& state, double dt, bool reverse, int stage,
               solver::StepReport& report);

  std::unique_ptr<solver::Integrator> ideal_;
  std::vector<std::unique_ptr<physics::SourceTerm>> terms_;
  std::shared_ptr<const solver::GhostFiller> ghosts_;
};

}  // namespace brume::app
