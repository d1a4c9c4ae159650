// Heating and cooling as an operator-split source term: each cell's thermal energy (total minus
// kinetic and magnetic) follows de/dt = −(n²Λ(T) − nΓ) at constant density over the half step,
// integrated by physics::CellCooler (cooling_cell_integrator.hpp). Density, momentum and field are
// untouched. Beyond report counters it holds the net energy radiated, which checkpoints keep.
#pragma once

#include "physics/block_sum.hpp"
#include "physics/cooling_settings.hpp"
#include "physics/run_context.hpp"
#include "physics/source_term.hpp"
#include "solver/exact_sum.hpp"

namespace brume::physics {

class CoolingTerm final : public SourceTerm {
 public:
  // Throws config::Error for an isothermal gas (the schema refuses it first).
  CoolingTerm(CoolingSettings settings, RunContext context);

  [[nodiscard]] std::string name() const override { return "cooling"; }
  void advance(solver::State& state, double dt) override;
  [[nodiscard]] double time_step_limit(const solver::State& state) const override;
  // Collective over the context's communicator (every rank calls it).
  [[nodiscard]] std::string report() const override;
  [[nodiscard]] std::vector<io::MeasuredNumber> budget() const override;
  // The net energy radiated so far is the term's only state that outlives a step.
  void save(io::RunRecord& record) const override;
  void restore(const io::RunRecord& record) override;

 private:
  template <class Function>
  void advance_cells(const Function& function, solver::State& state, double dt);

  CoolingSettings settings_;
  RunContext context_;
  double number_density_unit_;  // cm^-3 per code density
  double temperature_unit_;     // K per code (p/ρ)
  long long cell_updates_ = 0;
  long long substeps_ = 0;
  long long limited_cells_ = 0;
  long long fast_path_cells_ = 0;         // kept the Rosenbrock steps (fast path)
  BlockSum radiated_;                     // net energy lost by the gas, erg
  [[nodiscard]] double radiated() const;  // collective
};

}  // namespace brume::physics
