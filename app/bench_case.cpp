#include "app/bench_case.hpp"

#include <algorithm>
#include <chrono>
#include <memory>

#include "app/bench_state.hpp"
#include "app/user_error.hpp"
#include "solver/box_boundaries.hpp"

namespace brume::app {

solver::SchemeOptions bench_scheme(const BenchCase& c) {
  using namespace solver;
  SchemeOptions o;
  if (c.physics != "mhd" && c.physics != "hydro") {
    throw UserError("bench: unknown physics '" + c.physics + "' (expected mhd or hydro)");
  }
  o.magnetic = c.physics == "mhd";
  if (c.reconstruction == "plm") {
    o.reconstruction = Reconstruction::plm;
  } else if (c.reconstruction == "ppm") {
    o.reconstruction = Reconstruction::ppm;
  } else if (c.reconstruction == "donor_cell") {
    o.reconstruction = Reconstruction::donor_cell;
  } else {
    throw UserError("bench: unknown reconstruction '" + c.reconstruction + "'");
  }
  if (c.riemann == "hlld") {
    o.riemann = RiemannSolver::hlld;
  } else if (c.riemann == "hllc") {
    o.riemann = RiemannSolver::hllc;
  } else if (c.riemann == "hlle") {
    o.riemann = RiemannSolver::hlle;
  } else if (c.riemann == "llf") {
    o.riemann = RiemannSolver::llf;
  } else {
    throw UserError("bench: unknown Riemann solver '" + c.riemann + "'");
  }
  o.eos = GasModel::ideal_gas;
  o.gamma = 5.0 / 3.0;
  o.courant = 0.4;
  return o;
}

BenchResult run_bench_case(const BenchCase& c) {
  using namespace solver;
  using clock = std::chrono::steady_clock;
  const SchemeOptions o = bench_scheme(c);
  const int ng = required_ghost_layers(o);
  // One rank, one block; decomposed boxes are `brume bench scaling` (bench_decomposed_case.hpp).
  const int ranks = 1;
  const BlockGeometry g = whole_box_geometry({c.cells, c.cells, c.cells}, {0, 0, 0}, {1, 1, 1}, ng);
  State state = make_state(g, o.magnetic, false);
  set_bench_flow(state, o.gamma);
  auto integrator = make_integrator(o, g, std::make_shared<BoxGhostFiller>(BoxBoundaries{}));

  auto step = [&] {
    const StepReport r = integrator->advance(state, integrator->stable_time_step(state));
    if (!r.ok()) throw std::runtime_error("bench: the step failed (non-finite state)");
  };
  step();  // warm-up: first touch of the scratch pages, caches
  BenchResult result;
  result.setup = c;
  result.ranks = ranks;
  result.interior_cells = g.interior_cells();
  result.best_step_seconds = 1e300;
  for (int n = 0; n < c.steps; ++n) {
    const auto start = clock::now();
    step();
    const double seconds = std::chrono::duration<double>(clock::now() - start).count();
    result.seconds += seconds;
    result.best_step_seconds = std::min(result.best_step_seconds, seconds);
  }
  const double cells = double(result.interior_cells);
  result.cell_updates_per_second_per_core = cells * c.steps / (result.seconds * ranks);
  result.best_cell_updates_per_second_per_core = cells / (result.best_step_seconds * ranks);
  result.bytes_per_cell = double(allocated_bytes(state) + integrator->allocated_bytes()) / cells;
  return result;
}

}  // namespace brume::app
