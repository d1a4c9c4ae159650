// The unsplit predictor–corrector ("VL2") step with constrained transport for one compile-time
// choice of equation of state, field, reconstruction and Riemann solver.
#pragma once

#include <algorithm>
#include <cstddef>
#include <memory>
#include <utility>
#include <vector>

#include "solver/constrained_transport.hpp"
#include "solver/flux_sweep.hpp"
#include "solver/integrator.hpp"
#include "solver/primitive_arrays.hpp"
#include "solver/reconstruction.hpp"
#include "solver/stage_checks.hpp"
#include "solver/stage_scratch.hpp"
#include "solver/time_step.hpp"

namespace brume::solver {

template <class Eos, bool Magnetic, class Recon, class Solver>
class Vl2Integrator final : public Integrator {
 public:
  Vl2Integrator(const SchemeOptions& options, const BlockGeometry& geometry,
                std::shared_ptr<const GhostFiller> ghosts, const Eos& eos)
      : options_(options),
        eos_(eos),
        ghosts_(std::move(ghosts)),
        half_(make_state(geometry, Magnetic, Eos::isothermal)),
        scratch_(make_stage_scratch(geometry, Magnetic, Eos::isothermal)) {
    flagged_.reserve(std::size_t(std::max(64L, geometry.interior_cells() / 64)));
  }

  [[nodiscard]] double stable_time_step(const State& state) const override {
    return options_.courant / max_signal_rate<Eos, Magnetic>(state, eos_);
  }

  [[nodiscard]] std::size_t allocated_bytes() const override {
    return solver::allocated_bytes(half_) + solver::allocated_bytes(scratch_) +
           flagged_.capacity() * sizeof(std::ptrdiff_t);
  }

  // Stone & Gardiner 2009, New Astron. 14, 139, §3 (VL2): a half step with first-order fluxes
  // and CT, then the full step from the half-step state with the chosen reconstruction.
  // Every block makes the same collective calls (ghost fills, flag exchanges, agreement on a
  // failure) whatever happens on it: a stage that fails on any block ends the step on all of them,
  // each left as one block spanning the box would be.
  StepReport advance(State& state, double dt) override {
    StepReport report;
    ghosts_->fill(state);
    if (!stage<DonorCell>(state, state, half_, 0.5 * dt, 1, report)) return report;
    ghosts_->fill(half_);
    if (!stage<Recon>(half_, state, state, dt, 2, report)) return report;
    state.time += dt;
    state.step += 1;
    return report;
  }

 private:
  // target = base − dt ∇·F(source), target B = base B − dt ∇×E(source); then the checks. False
  // when a non-finite value appeared on any block (this block's failure, if any, in `report`).
  template <class StageRecon>
  bool stage(const State& source, const State& base, State& target, double dt, int index,
             StepReport& report) {
    const BlockGeometry& g = source.geometry;
    PrimitiveArrays& w = scratch_.primitive;
    compute_primitives<Eos, Magnetic>(source, eos_, w);
    if (&target != &base) {
      std::copy(base.density.begin(), base.density.end(), target.density.begin());
      for (int d = 0; d < 3; ++d) {
        std::copy(base.momentum[d].begin(), base.momentum[d].end(), target.momentum[d].begin());
      }
      std::copy(base.energy.begin(), base.energy.end(), target.energy.begin());
    }
    for (int d = 0; d < 3; ++d) {
      if (g.active(d)) {
        flux_sweep<Eos, Magnetic, StageRecon, Solver>(d, dt, eos_, w, source, target, scratch_.rows,
                                                      scratch_.ct);
      } else if constexpr (Magnetic) {
        fill_inactive_face_emf(d, w, source, scratch_.ct);
      }
    }
    if constexpr (Magnetic) {
      for (int e = 0; e < 3; ++e)
        edge_emf(e, w, source, scratch_.ct);
      ct_update(scratch_.ct, dt, base, target);
    }
    find_unphysical_cells<Eos, Magnetic>(target, eos_, flagged_);
    report.fallback_cells += long(flagged_.size());
    ghosts_->exchange_flags(g, flagged_);  // adds the neighbours' flags across block faces
    if (!flagged_.empty()) {
      first_order_fallback<Eos, Magnetic, StageRecon, Solver>(flagged_, dt, eos_, w, source,
                                                              target);
    }
    NumericalFailure failure = find_non_finite(target);
    if (failure.occurred) {
      failure.step = base.step;
      failure.stage = index;
      report.failure = failure;
    }
    if (ghosts_->any_block(failure.occurred)) return false;
    apply_floors<Eos, Magnetic>(target, options_.density_floor, options_.pressure_floor, eos_,
                                report.density_floors, report.pressure_floors,
                                report.first_floored);
    if (report.first_floored.occurred && report.first_floored.stage == 0) {
      report.first_floored.step = base.step;
      report.first_floored.stage = index;
    }
    return true;
  }

  SchemeOptions options_;
  Eos eos_;
  std::shared_ptr<const GhostFiller> ghosts_;
  State half_;
  StageScratch scratch_;
  std::vector<std::ptrdiff_t> flagged_;
};

}  // namespace brume::solver
