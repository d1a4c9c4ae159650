// The stirring as an operator-split source term: each call advances the Ornstein–Uhlenbeck
// amplitudes by dt, evaluates the acceleration on the block, removes its mass-weighted mean (no
// net momentum) and kicks the momenta by ρ a dt; the total energy (ideal gas) receives the same
// kinetic-energy change, which is also summed exactly as the work done by the stirring.
#pragma once

#include <memory>
#include <optional>
#include <string>

#include "physics/block_sum.hpp"
#include "physics/run_context.hpp"
#include "physics/source_term.hpp"
#include "physics/stirring_field.hpp"
#include "physics/stirring_process.hpp"
#include "physics/stirring_settings.hpp"

namespace brume::physics {

class StirringTerm final : public SourceTerm {
 public:
  // The amplitudes start from the stationary distribution; the phase tables of the block are
  // built on the first advance, from the state's geometry.
  StirringTerm(const StirringSettings& settings, const RunContext& context);

  [[nodiscard]] std::string name() const override { return "forcing"; }
  void advance(solver::State& state, double dt) override;
  void save(io::RunRecord& record) const override;
  void restore(const io::RunRecord& record) override;
  [[nodiscard]] std::string report() const override;
  [[nodiscard]] std::vector<io::MeasuredNumber> budget() const override;

  // Collective: the work done on the whole box since the start of the run (code units of
  // energy), and the time over which the stirring acted.
  [[nodiscard]] double work() const;
  [[nodiscard]] double stirred_time() const { return stirred_time_; }
  [[nodiscard]] const StirringProcess& process() const { return process_; }
  [[nodiscard]] const StirringScales& scales() const { return scales_; }
  // The acceleration field of the last advance before its mean was removed, interior cells, i
  // fastest.
  [[nodiscard]] const std::vector<double>& acceleration(int d) const {
    return field_->acceleration(d);
  }
  // The mass-weighted mean removed by the last advance.
  [[nodiscard]] const std::array<double, 3>& removed_mean() const { return removed_mean_; }

 private:
  RunContext context_;
  StirringScales scales_;
  StirringProcess process_;
  std::optional<StirringField> field_;
  BlockSum work_;              // this block's share, combined on demand
  double stirred_time_ = 0.0;  // the same on every rank
  std::array<double, 3> removed_mean_{};
};

// The term for a run's configuration and block.
[[nodiscard]] std::unique_ptr<SourceTerm> make_stirring_term(const config::ResolvedConfig& config,
                                                             const RunContext& context);

}  // namespace brume::physics
