#include "app/split_integrator.hpp"

#include <algorithm>
#include <utility>

#include "solver/stage_checks.hpp"

namespace brume::app {

SplitIntegrator::SplitIntegrator(std::unique_ptr<solver::Integrator> ideal,
                                 std::vector<std::unique_ptr<physics::SourceTerm>> terms,
                                 std::shared_ptr<const solver::GhostFiller> ghosts)
    : ideal_(std::move(ideal)), terms_(std::move(terms)), ghosts_(std::move(ghosts)) {}

double SplitIntegrator::stable_time_step(const solver::State& state) const {
  double dt = ideal_->stable_time_step(state);
  for (const auto& term : terms_)
    dt = std::min(dt, term->time_step_limit(state));
  return dt;
}

bool SplitIntegrator::sources(solver::State& state, double dt, bool reverse, int stage,
                              solver::StepReport& report) {
  const std::size_t n = terms_.size();
  for (std::size_t i = 0; i < n; ++i)
    terms_[reverse ? n - 1 - i : i]->advance(state, dt);
  solver::NumericalFailure failure = solver::find_non_finite(state);
  if (failure.occurred) {
    failure.step = state.step;
    failure.stage = stage;
    report.failure = failure;
  }
  return !ghosts_->any_block(failure.occurred);
}

solver::StepReport SplitIntegrator::advance(solver::State& state, double dt) {
  if (terms_.empty()) return ideal_->advance(state, dt);
  solver::StepReport report;
  const long step = state.step;
  if (!sources(state, 0.5 * dt, false, 3, report)) return report;
  report = ideal_->advance(state, dt);
  if (!report.ok()) return report;
  // The ideal step counted the step and advanced the time: the second half belongs to it.
  const long counted = state.step;
  state.step = step;
  (void)sources(state, 0.5 * dt, true, 4, report);  // a failure is in the report
  state.step = counted;
  return report;
}

std::size_t SplitIntegrator::allocated_bytes() const {
  return ideal_->allocated_bytes();
}

}  // namespace brume::app
