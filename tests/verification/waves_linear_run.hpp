// One linear-wave run for the convergence tests: problems/linear_wave.yaml with the case's
// settings, on a 2D box of N × N/2 cells (sides √5 × √5/2) or a 3D box of N × N/2 × N/2 cells
// (sides 3 × 1.5 × 1.5) — both give a wavelength of 1 along the diagonal (Gardiner & Stone 2008,
// J. Comput. Phys. 227, 4123, §8.1; Stone et al. 2008, ApJS 178, 137, §8.1; from memory) — run for
// one wave period and compared with its initial state.
#pragma once

#include <chrono>
#include <string>
#include <vector>

#include "problems/linear_wave.hpp"
#include "tests/verification/mhd2d_problem_run.hpp"
#include "tests/verification/waves_error_norm.hpp"

namespace brume::verification {

struct WaveRunResult {
  double error = 0.0;       // l1_error_norm after one period
  double divergence = 0.0;  // relative_divergence at the end (0 for hydrodynamics)
  long steps = 0;
  double seconds = 0.0;
  bool ok = false;
};

inline std::vector<std::string> box_settings(int dimensions, int n) {
  const std::string half = std::to_string(n / 2), full = std::to_string(n);
  if (dimensions == 2) return {"box.cells=[" + full + "," + half + ",1]"};
  return {"box.cells=[" + full + "," + half + "," + half + "]", "box.size=[3,1.5,1.5]"};
}

inline WaveRunResult run_wave_period(const std::string& input, int dimensions, int n,
                                     std::vector<std::string> settings,
                                     double (*period)(const ProblemRun&)) {
  const auto start = std::chrono::steady_clock::now();
  for (std::string& s : box_settings(dimensions, n))
    settings.push_back(std::move(s));
  ProblemRun run = start_problem(input, settings);
  const solver::State initial = run.state;
  WaveRunResult result;
  result.ok = advance_to(run, period(run));
  result.error = l1_error_norm(run.state, initial);
  result.divergence = run.state.magnetic ? solver::relative_divergence(run.state) : 0.0;
  result.steps = run.steps;
  result.seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
  return result;
}

inline double linear_wave_period(const ProblemRun& run) {
  return problems::linear_wave(app::setup_context(run.config, run.setup)).period;
}

}  // namespace brume::verification
