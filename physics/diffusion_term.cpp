#include "physics/diffusion_term.hpp"

#include <mpi.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <utility>

#include "io/log.hpp"
#include "physics/diffusion_rkl2.hpp"

namespace brume::physics {

namespace {

// Stages are chosen for a step 10 % longer than asked, a margin for the variation of κ(T) within
// a step and for the cross terms of the viscous stress (common practice, no source).
constexpr double stage_margin = 1.1;

bool mpi_running() {
  int initialized = 0, finalized = 0;
  MPI_Initialized(&initialized);
  MPI_Finalized(&finalized);
  return initialized != 0 && finalized == 0;
}

double global_minimum(double value, MPI_Comm comm) {
  if (!mpi_running()) return value;  // a block on its own (unit tests)
  double result = value;
  MPI_Allreduce(&value, &result, 1, MPI_DOUBLE, MPI_MIN, comm);
  return result;
}

bool first_rank(MPI_Comm comm) {
  if (!mpi_running()) return true;
  int rank = 0;
  MPI_Comm_rank(comm, &rank);
  return rank == 0;
}

// y = μ a + ν b + (1 − μ − ν) y0 + μ̃ dt L + γ̃ dt L0 over one array (whole storage).
void combine(std::vector<double>& out, double mu, const std::vector<double>& a, double nu,
             const std::vector<double>& y0, double mt, const std::vector<double>& l, double gt,
             const std::vector<double>& l0) {
  const double rest = 1.0 - mu - nu;
  const std::size_t n = out.size();
  double* o = out.data();
  const double* pa = a.data();
  const double* p0 = y0.data();
  const double* pl = l.data();
  const double* pl0 = l0.data();
  for (std::size_t i = 0; i < n; ++i)
    o[i] = mu * pa[i] + nu * o[i] + rest * p0[i] + mt * pl[i] + gt * pl0[i];
}

// The arrays that diffusion changes: momenta, energy (ideal gas) and face fields (MHD).
template <class S, class F>
void for_each_evolved(S& a, S& b, F&& f) {
  for (std::size_t m = 0; m < 3; ++m)
    f(a.momentum[m], b.momentum[m]);
  if (!a.isothermal) f(a.energy, b.energy);
  if (a.magnetic) {
    for (std::size_t d = 0; d < 3; ++d)
      f(a.face_field[d], b.face_field[d]);
  }
}

}  // namespace

DiffusionTerm::DiffusionTerm(const DiffusionCoefficients& coefficients, int max_stages,
                             RunContext context)
    : coefficients_(coefficients),
      max_stages_(std::max(max_stages, 2)),
      context_(std::move(context)) {}

void DiffusionTerm::prepare(const solver::State& state) {
  if (operator_ && y0_.density.size() == state.density.size()) return;
  operator_ = std::make_unique<DiffusionOperator>(coefficients_, state.geometry);
  for (solver::State* s : {&y0_, &previous_, &before_, &rate0_, &rate_})
    *s = solver::make_state(state.geometry, state.magnetic, state.isothermal);
}

// One RKL2 super-step of s stages (Meyer, Balsara & Aslam 2014, J. Comput. Phys. 257, 594,
// eqs. 16–17, numbering from memory):
//   Y_1 = Y_0 + μ̃_1 dt L(Y_0),
//   Y_j = μ_j Y_{j−1} + ν_j Y_{j−2} + (1 − μ_j − ν_j) Y_0 + μ̃_j dt L(Y_{j−1}) + γ̃_j dt L(Y_0),
// with the ghosts of every Y_j refilled before L is taken.
void DiffusionTerm::super_step(solver::State& state, double dt, int stages) {
  const solver::GhostFiller& ghosts = *context_.ghosts;
  ghosts.fill(state);
  auto copy = [](std::vector<double>& to, const std::vector<double>& from) {
    std::copy(from.begin(), from.end(), to.begin());
  };
  for (solver::State* s : {&y0_, &previous_, &before_})
    copy(s->density, state.density);
  for_each_evolved(y0_, state, copy);
  for_each_evolved(before_, state, copy);
  operator_->rate(y0_, rate0_);
  const double first = rkl2_first_weight(stages) * dt;
  for_each_evolved(previous_, y0_, copy);
  for_each_evolved(previous_, rate0_, [&](std::vector<double>& y, const std::vector<double>& l) {
    for (std::size_t i = 0; i < y.size(); ++i)
      y[i] += first * l[i];
  });
  for (int j = 2; j <= stages; ++j) {
    ghosts.fill(previous_);
    operator_->rate(previous_, rate_);
    const Rkl2Stage w = rkl2_stage(stages, j);
    // Y_j overwrites Y_{j−2} in place (each element reads only its own old value).
    for (std::size_t m = 0; m < 3; ++m) {
      combine(before_.momentum[m], w.mu, previous_.momentum[m], w.nu, y0_.momentum[m],
              w.mu_tilde * dt, rate_.momentum[m], w.gamma_tilde * dt, rate0_.momentum[m]);
    }
    if (!state.isothermal) {
      combine(before_.energy, w.mu, previous_.energy, w.nu, y0_.energy, w.mu_tilde * dt,
              rate_.energy, w.gamma_tilde * dt, rate0_.energy);
    }
    if (state.magnetic) {
      for (std::size_t d = 0; d < 3; ++d) {
        combine(before_.face_field[d], w.mu, previous_.face_field[d], w.nu, y0_.face_field[d],
                w.mu_tilde * dt, rate_.face_field[d], w.gamma_tilde * dt, rate0_.face_field[d]);
      }
    }
    std::swap(previous_, before_);
  }
  for_each_evolved(state, previous_, copy);
}

void DiffusionTerm::advance(solver::State& state, double dt) {
  if (!(dt > 0.0)) return;
  prepare(state);
  context_.ghosts->fill(state);
  const double local = operator_->explicit_step(state);
  last_.explicit_step = global_minimum(local, context_.comm);
  const double ratio = stage_margin * dt / last_.explicit_step;  // 0 when nothing diffuses
  last_.super_steps = 1;
  if (ratio > rkl2_step_ratio(max_stages_)) {
    last_.super_steps = int(std::ceil(ratio / rkl2_step_ratio(max_stages_)));
    if (capped_calls_ == 0) {
      io::Log(io::Verbosity::normal, first_rank(context_.comm))
          .warning("diffusion: a half step of " + std::to_string(ratio / stage_margin) +
                   " explicit limits needs more than diffusion.max_stages = " +
                   std::to_string(max_stages_) + " RKL2 stages; split into " +
                   std::to_string(last_.super_steps) +
                   " super-steps (said once; the run report counts them)");
    }
    ++capped_calls_;
  }
  last_.stages = rkl2_stages_for(ratio / last_.super_steps);
  const double sub = dt / last_.super_steps;
  for (int n = 0; n < last_.super_steps; ++n)
    super_step(state, sub, last_.stages);
  ++calls_;
  fewest_stages_ = calls_ == 1 ? last_.stages : std::min(fewest_stages_, last_.stages);
  most_stages_ = std::max(most_stages_, last_.stages);
  smallest_explicit_step_ =
      calls_ == 1 ? last_.explicit_step : std::min(smallest_explicit_step_, last_.explicit_step);
}

std::string DiffusionTerm::report() const {
  if (calls_ == 0) return {};
  char line[256];
  std::snprintf(line, sizeof line,
                "diffusion: %ld half steps, RKL2 stages %d to %d, smallest explicit limit %.3e "
                "(code time), stage cap %d reached in %ld half steps",
                calls_, fewest_stages_, most_stages_, smallest_explicit_step_, max_stages_,
                capped_calls_);
  return line;
}

}  // namespace brume::physics
