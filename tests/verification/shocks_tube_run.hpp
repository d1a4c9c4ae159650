// Running a shock-tube preset (problems/shock_tube_*.yaml) through brume's own configuration,
// problem set-up and integrator, and reading the result back as profiles along the tube.
#pragma once

#include <chrono>
#include <cmath>
#include <memory>
#include <string>
#include <vector>

#include "app/run_setup.hpp"
#include "app/schema.hpp"
#include "app/scheme_choice.hpp"
#include "io/config/load.hpp"
#include "problems/shock_tube.hpp"
#include "solver/constrained_transport.hpp"
#include "solver/integrator.hpp"
#include "tests/verification/shocks_diagonal_ghosts.hpp"

namespace brume::shocks {

// Quantities along the tube in its frame (normal, t1, t2); x is the position along the normal.
struct Profile {
  std::vector<double> x, density, pressure;
  std::array<std::vector<double>, 3> velocity, field;
  [[nodiscard]] std::size_t size() const { return x.size(); }
};

struct TubeRun {
  solver::State state;
  problems::TubeFrame frame;
  double gamma = 0.0;
  double stop_time = 0.0;
  double interface = 0.0;  // position of the initial discontinuity along the normal
  long steps = 0;
  long fallback_cells = 0;
  long floors = 0;
  bool failed = false;
  solver::NumericalFailure failure;  // when failed
  double max_divergence = 0.0;       // largest relative_divergence after any step (MHD)
  double seconds = 0.0;              // wall time of the time loop
};

inline std::string preset_path(const std::string& name) {
  return std::string(BRUME_SOURCE_DIR) + "/problems/shock_tube_" + name + ".yaml";
}

// Loads the preset with `overrides` (section.key=value), sets it up and runs it to its stop time.
// Along the x–y diagonal the y boundaries are the shifted-periodic ones of DiagonalGhostFiller.
inline TubeRun run_preset(const std::string& name, const std::vector<std::string>& overrides) {
  const config::ResolvedConfig config =
      config::load(app::brume_schema(), preset_path(name), overrides);
  const app::RunSetup setup = app::make_run_setup(config);
  const solver::SchemeOptions options = app::scheme_options(config, setup);
  std::array<double, 3> upper{};
  for (int d = 0; d < 3; ++d)
    upper[std::size_t(d)] = setup.lower[std::size_t(d)] + setup.size[std::size_t(d)];
  const solver::BlockGeometry geometry =
      solver::whole_box_geometry({int(setup.cells[0]), int(setup.cells[1]), int(setup.cells[2])},
                                 setup.lower, upper, solver::required_ghost_layers(options));
  TubeRun run;
  run.state = solver::make_state(geometry, setup.magnetic, setup.isothermal);
  run.gamma = setup.gamma;
  setup.problem->set_up(app::setup_context(config, setup), run.state);
  const std::string& direction = config.text("problem.shock_tube.direction");
  run.frame = problems::tube_frame(direction, geometry.spacing);
  const double start = run.frame.position(setup.lower[0], setup.lower[1], setup.lower[2]);
  const double end = run.frame.position(upper[0], upper[1], upper[2]);
  run.interface = start + config.real("problem.shock_tube.interface") * (end - start);
  run.stop_time = config.real("clock.stop_time") / setup.code_units.time();
  std::shared_ptr<const solver::GhostFiller> ghosts;
  if (direction == "xy") {
    ghosts = std::make_shared<DiagonalGhostFiller>();
  } else {
    ghosts = std::make_shared<solver::BoxGhostFiller>(app::box_boundaries(config));
  }
  ghosts->fill(run.state);
  auto integrator = solver::make_integrator(options, geometry, ghosts);
  run.max_divergence = solver::relative_divergence(run.state);
  const auto begin = std::chrono::steady_clock::now();
  solver::State& s = run.state;
  while (s.time < run.stop_time * (1.0 - 1e-14)) {
    const double dt = std::fmin(integrator->stable_time_step(s), run.stop_time - s.time);
    const solver::StepReport r = integrator->advance(s, dt);
    ++run.steps;
    run.fallback_cells += r.fallback_cells;
    run.floors += r.density_floors + r.pressure_floors;
    if (!r.ok() || run.steps > 2000000) {
      run.failed = true;
      run.failure = r.failure;
      break;
    }
    if (s.magnetic)
      run.max_divergence = std::fmax(run.max_divergence, solver::relative_divergence(s));
  }
  run.seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - begin).count();
  return run;
}

// The profile along one row of cells in x (y index `row`, z index 0), or along the tube's axis
// when it is y or z. Positions are cell centres projected on the normal.
inline Profile profile(const TubeRun& run, int row = 0) {
  const solver::State& s = run.state;
  const solver::BlockGeometry& g = s.geometry;
  int axis = 0;
  for (int d = 0; d < 3; ++d) {
    if (run.frame.normal[std::size_t(d)] == 1.0) axis = d;
  }
  Profile p;
  for (int n = 0; n < g.cells[std::size_t(axis)]; ++n) {
    int idx[3] = {0, 0, 0};
    idx[axis] = n;
    if (axis == 0) idx[1] = row;
    const std::ptrdiff_t c = g.index(idx[0], idx[1], idx[2]);
    const double rho = s.density[c];
    std::array<double, 3> v{}, b{};
    for (int d = 0; d < 3; ++d) {
      v[std::size_t(d)] = s.momentum[std::size_t(d)][c] / rho;
      if (s.magnetic) b[std::size_t(d)] = solver::cell_field(s, d, c);
    }
    const double kinetic = 0.5 * rho * (v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
    const double magnetic = 0.5 * (b[0] * b[0] + b[1] * b[1] + b[2] * b[2]);
    p.x.push_back(
        run.frame.position(g.centre(0, idx[0]), g.centre(1, idx[1]), g.centre(2, idx[2])));
    p.density.push_back(rho);
    p.pressure.push_back((run.gamma - 1.0) * (s.energy[c] - kinetic - magnetic));
    const std::array<const std::array<double, 3>*, 3> axes{
        &run.frame.normal, &run.frame.transverse1, &run.frame.transverse2};
    for (std::size_t k = 0; k < 3; ++k) {
      const auto& e = *axes[k];
      p.velocity[k].push_back(v[0] * e[0] + v[1] * e[1] + v[2] * e[2]);
      p.field[k].push_back(b[0] * e[0] + b[1] * e[1] + b[2] * e[2]);
    }
  }
  return p;
}

// "name=value" overrides for the resolution of a tube along x.
inline std::vector<std::string> cells_along_x(int n) {
  return {"box.cells=[" + std::to_string(n) + ", 1, 1]"};
}

}  // namespace brume::shocks
