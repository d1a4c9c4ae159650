// Conduction, viscosity and Ohmic resistivity as one operator-split source term, advanced by
// explicit RKL2 super-time-stepping (Meyer, Balsara & Aslam 2014, J. Comput. Phys. 257, 594):
// s stages cover dt as long as dt ≤ (s² + s − 2)/4 explicit limits, so the term sets no time-step
// limit of its own. Past `max_stages` the call is split into equal super-steps.
#pragma once

#include <memory>
#include <string>

#include "physics/diffusion_coefficients.hpp"
#include "physics/diffusion_operator.hpp"
#include "physics/run_context.hpp"
#include "physics/source_term.hpp"

namespace brume::physics {

// What the last call did, for tests and the run report.
struct DiffusionCall {
  double explicit_step = 0.0;  // the global explicit limit (code units)
  int stages = 0;              // RKL2 stages of each super-step
  int super_steps = 0;         // 1 unless the stage cap was reached
};

class DiffusionTerm final : public SourceTerm {
 public:
  DiffusionTerm(const DiffusionCoefficients& coefficients, int max_stages, RunContext context);

  [[nodiscard]] std::string name() const override { return "diffusion"; }
  // Collective: fills ghosts through the context before every stage and takes the global
  // minimum of the explicit limit.
  void advance(solver::State& state, double dt) override;
  [[nodiscard]] std::string report() const override;

  [[nodiscard]] const DiffusionCall& last_call() const { return last_; }

 private:
  void prepare(const solver::State& state);
  void super_step(solver::State& state, double dt, int stages);

  DiffusionCoefficients coefficients_;
  int max_stages_;
  RunContext context_;
  std::unique_ptr<DiffusionOperator> operator_;
  // RKL2 scratch: Y_0, Y_{j−1}, Y_{j−2}, L(Y_0) and L(Y_{j−1}); allocated on the first call.
  solver::State y0_, previous_, before_, rate0_, rate_;
  DiffusionCall last_;
  long calls_ = 0;
  int fewest_stages_ = 0;
  int most_stages_ = 0;
  long capped_calls_ = 0;
  double smallest_explicit_step_ = 0.0;
};

}  // namespace brume::physics
