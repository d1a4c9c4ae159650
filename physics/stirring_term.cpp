#include "physics/stirring_term.hpp"

#include <cmath>
#include <cstdio>
#include <stdexcept>

#include "solver/units/constants.hpp"

namespace brume::physics {

namespace {

StirringProcess make_process(const StirringSettings& settings, const RunContext& context,
                             const StirringScales& scales) {
  const std::array<bool, 3> active{context.box_cells[0] > 1, context.box_cells[1] > 1,
                                   context.box_cells[2] > 1};
  std::vector<StirringMode> modes =
      stirring_modes(settings.lowest, settings.highest, settings.profile,
                     settings.solenoidal_weight, context.box_size, active);
  const double per_variance = stirring_mean_square_per_variance(modes);
  const double deviation =
      per_variance > 0.0 ? std::sqrt(scales.mean_square_acceleration / per_variance) : 0.0;
  StirringProcess process(std::move(modes), scales.correlation_time, deviation, settings.seed);
  process.start();
  return process;
}

}  // namespace

StirringTerm::StirringTerm(const StirringSettings& settings, const RunContext& context)
    : context_(context),
      scales_(stirring_scales(settings, context.box_size)),
      process_(make_process(settings, context, scales_)) {}

void StirringTerm::advance(solver::State& state, double dt) {
  const solver::BlockGeometry& g = state.geometry;
  if (!field_) field_.emplace(process_.modes(), g, context_.box_cells);
  process_.advance(dt);
  field_->evaluate(process_.amplitudes());
  const std::array<const double*, 3> a{field_->acceleration(0).data(),
                                       field_->acceleration(1).data(),
                                       field_->acceleration(2).data()};
  // The mass-weighted mean acceleration over the box, summed exactly: the same bits on any
  // number of ranks.
  BlockSum mass;
  std::array<BlockSum, 3> pull;
  const double* rho = state.density.data();
  std::size_t at = 0;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (int i = 0; i < g.cells[0]; ++i, ++at) {
        const double r = rho[row + i];
        mass.add(r);
        for (std::size_t d = 0; d < 3; ++d)
          pull[d].add(r * a[d][at]);
      }
    }
  }
  const double total_mass = total_over(mass, context_.comm);
  for (std::size_t d = 0; d < 3; ++d)
    removed_mean_[d] = total_over(pull[d], context_.comm) / total_mass;
  const double volume = g.spacing[0] * g.spacing[1] * g.spacing[2];
  std::array<double*, 3> m{state.momentum[0].data(), state.momentum[1].data(),
                           state.momentum[2].data()};
  double* energy = state.isothermal ? nullptr : state.energy.data();
  at = 0;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (int i = 0; i < g.cells[0]; ++i, ++at) {
        const std::ptrdiff_t c = row + i;
        double gained = 0.0;  // ρ (v·Δv + |Δv|²/2) = (m·Δm + |Δm|²/2) / ρ, times ρ
        for (std::size_t d = 0; d < 3; ++d) {
          const double kick = rho[c] * (a[d][at] - removed_mean_[d]) * dt;
          gained += (m[d][c] + 0.5 * kick) * kick;
          m[d][c] += kick;
        }
        gained /= rho[c];
        if (energy != nullptr) energy[c] += gained;
        work_.add(gained * volume);
      }
    }
  }
  stirred_time_ += dt;
}

double StirringTerm::work() const {
  return total_over(work_, context_.comm);
}

void StirringTerm::save(io::RunRecord& record) const {
  record.set("forcing.amplitudes", process_.amplitudes());
  record.set("forcing.next_pair", static_cast<long long>(process_.next_pair()));
  record.set("forcing.work", work());
  record.set("forcing.stirred_time", stirred_time_);
}

void StirringTerm::restore(const io::RunRecord& record) {
  process_.restore(record.array("forcing.amplitudes"),
                   static_cast<std::uint64_t>(record.integer("forcing.next_pair")));
  stirred_time_ = record.real("forcing.stirred_time");
  work_ = held_once(record.real("forcing.work"), context_.comm);
}

std::vector<io::MeasuredNumber> StirringTerm::budget() const {
  return {{"stirring_work", work() * context_.code_units.energy(), "erg", 1.0,
           "Work done by the stirring on the gas since the start of the run"}};
}

std::string StirringTerm::report() const {
  const double w = work();
  const units::CodeUnits& u = context_.code_units;
  char line[320];
  const double mean_power = stirred_time_ > 0.0 ? w / stirred_time_ : 0.0;
  std::snprintf(line, sizeof line,
                "stirring: %zu modes, work done %.6e erg (%.6e code) over %.6e Myr, mean power "
                "%.6e erg/s",
                process_.modes().size(), w * u.energy(), w,
                stirred_time_ * u.time() / units::cgs::megayear,
                mean_power * u.energy() / u.time());
  return line;
}

std::unique_ptr<SourceTerm> make_stirring_term(const config::ResolvedConfig& config,
                                               const RunContext& context) {
  return std::make_unique<StirringTerm>(stirring_settings(config, context.code_units), context);
}

}  // namespace brume::physics
