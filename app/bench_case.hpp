// One `brume bench` configuration and its measurement: a periodic box advanced by the ideal-MHD
// (or hydrodynamics) step exactly as the run loop advances it (time-step limit, then the step).
#pragma once

#include <string>

#include "solver/integrator.hpp"

namespace brume::app {

struct BenchCase {
  std::string physics;         // "mhd" or "hydro"
  std::string reconstruction;  // "plm" or "ppm"
  std::string riemann;         // "hlld", "hllc", ...
  int cells = 64;              // per dimension: a cells³ box
  int steps = 10;              // timed steps (one more warm-up step is not timed)
};

struct BenchResult {
  BenchCase setup;
  int ranks = 1;
  long interior_cells = 0;
  double seconds = 0.0;            // wall time of the timed steps
  double best_step_seconds = 0.0;  // the fastest single step
  // Interior cells × steps / (seconds × ranks): every rank runs on one core.
  double cell_updates_per_second_per_core = 0.0;
  double best_cell_updates_per_second_per_core = 0.0;
  // Bytes of every array the state and the integrator allocated, per interior cell.
  double bytes_per_cell = 0.0;
};

// The scheme options of a case; throws UserError for names brume does not know.
[[nodiscard]] solver::SchemeOptions bench_scheme(const BenchCase& c);

// Sets up the box, advances one warm-up step, then times `steps` steps one by one.
[[nodiscard]] BenchResult run_bench_case(const BenchCase& c);

}  // namespace brume::app
