// Public entry point of the ideal-MHD / hydrodynamics step for the run loop.
#pragma once

#include <cstddef>
#include <memory>

#include "solver/block_geometry.hpp"
#include "solver/ghost_filler.hpp"
#include "solver/state.hpp"
#include "solver/step_report.hpp"

namespace brume::solver {

enum class Reconstruction { donor_cell, plm, ppm };
enum class SlopeLimiter { monotonized_central, van_leer };
// PPM limiters: Colella & Sekora 2008 (keeps smooth extrema) or Colella & Woodward 1984.
enum class PpmLimiter { extremum_preserving, monotone };
enum class RiemannSolver { llf, hlle, hllc, hlld };
enum class GasModel { ideal_gas, isothermal };

struct SchemeOptions {
  Reconstruction reconstruction = Reconstruction::plm;
  SlopeLimiter limiter = SlopeLimiter::monotonized_central;
  // Monotone by default: the extremum-preserving limiter switches discontinuously between its
  // extremum and overshoot cases (a last-bit change of the data can move an edge by O(Δq)), and
  // it is less robust near vacuum (tests/solver/limiter_oscillation_test.cpp, robustness_test).
  PpmLimiter ppm_limiter = PpmLimiter::monotone;
  bool characteristic = false;  // PLM slopes limited in characteristic variables
  RiemannSolver riemann = RiemannSolver::hlle;
  GasModel eos = GasModel::ideal_gas;
  double gamma = 5.0 / 3.0;  // ideal gas
  double sound_speed = 1.0;  // isothermal gas
  bool magnetic = true;
  double courant = 0.4;  // of the summed-direction CFL limit (time_step.hpp)
  double density_floor = 1e-10;
  double pressure_floor = 1e-14;
};

class Integrator {
 public:
  virtual ~Integrator() = default;
  // Largest stable step of this block (the run loop takes the minimum over blocks).
  [[nodiscard]] virtual double stable_time_step(const State& state) const = 0;
  // One predictor–corrector step of length dt; fills ghosts itself (two ghost fills per step).
  // On a numerical failure the state is left as the failed stage made it.
  virtual StepReport advance(State& state, double dt) = 0;
  // Bytes of the arrays the integrator owns (half-step state and scratch), for `brume bench`.
  [[nodiscard]] virtual std::size_t allocated_bytes() const { return 0; }
};

// Ghost layers the options need (the geometry of the states must have at least these).
[[nodiscard]] int required_ghost_layers(const SchemeOptions& options);

// Throws std::invalid_argument for impossible combinations (HLLC with MHD, HLLD for
// hydrodynamics, characteristic limiting with other than PLM, too few ghost layers,
// non-positive parameters).
[[nodiscard]] std::unique_ptr<Integrator> make_integrator(
    const SchemeOptions& options, const BlockGeometry& geometry,
    std::shared_ptr<const GhostFiller> ghosts);

}  // namespace brume::solver
