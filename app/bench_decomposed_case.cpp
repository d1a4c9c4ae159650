#include "app/bench_decomposed_case.hpp"

#include <algorithm>
#include <memory>
#include <numeric>
#include <stdexcept>
#include <thread>
#include <vector>

#include "app/bench_state.hpp"
#include "solver/decomposition.hpp"
#include "solver/global_reductions.hpp"
#include "solver/halo_exchange.hpp"

namespace brume::app {

namespace {

// Seconds of each repetition of `work` on the slowest rank; the ranks start each one together.
template <class Work>
std::vector<double> slowest_rank_seconds(int repetitions, MPI_Comm comm, Work&& work) {
  std::vector<double> seconds(std::size_t(repetitions), 0.0);
  for (double& s : seconds) {
    MPI_Barrier(comm);
    const double start = MPI_Wtime();
    work();
    s = MPI_Wtime() - start;
  }
  MPI_Allreduce(MPI_IN_PLACE, seconds.data(), repetitions, MPI_DOUBLE, MPI_MAX, comm);
  return seconds;
}

double mean(const std::vector<double>& v) {
  return std::accumulate(v.begin(), v.end(), 0.0) / double(v.size());
}

bool any_node_oversubscribed(MPI_Comm comm) {
  MPI_Comm node = MPI_COMM_NULL;
  MPI_Comm_split_type(comm, MPI_COMM_TYPE_SHARED, 0, MPI_INFO_NULL, &node);
  int on_node = 1;
  MPI_Comm_size(node, &on_node);
  MPI_Comm_free(&node);
  const unsigned cpus = std::thread::hardware_concurrency();  // 0 when unknown
  int over = cpus > 0 && unsigned(on_node) > cpus ? 1 : 0;
  MPI_Allreduce(MPI_IN_PLACE, &over, 1, MPI_INT, MPI_MAX, comm);
  return over != 0;
}

}  // namespace

DecomposedResult run_decomposed_case(const DecomposedCase& c, MPI_Comm comm) {
  using namespace solver;
  const SchemeOptions o = bench_scheme(c.scheme);
  const int ng = required_ghost_layers(o);
  const Decomposition decomposition(comm, c.box_cells, c.ranks_per_axis, {true, true, true}, ng);
  std::array<int, 3> cells{};
  std::array<double, 3> upper{};
  for (int d = 0; d < 3; ++d) {
    cells[d] = int(c.box_cells[d]);
    upper[d] = double(c.box_cells[d]) / double(c.scheme.cells);
  }
  const BlockGeometry g = decomposition.block(whole_box_geometry(cells, {0, 0, 0}, upper, ng));
  State state = make_state(g, o.magnetic, false);
  set_bench_flow(state, o.gamma);
  auto halo = std::make_shared<HaloExchange>(decomposition, BoxBoundaries{}, g, o.magnetic, false);
  auto integrator = make_integrator(o, g, halo);
  const MPI_Comm cart = decomposition.comm();
  const std::array<long, 3>& box = decomposition.box_cells();

  // The run loop's step (app/run_loop.cpp) without its progress and outputs.
  auto step = [&] {
    const double dt = agree_on_step(integrator->stable_time_step(state), 0.0, cart).time_step;
    if (!combine_step_reports(integrator->advance(state, dt), box, cart).ok()) {
      throw std::runtime_error("bench: the step failed (non-finite state)");
    }
  };
  step();  // warm-up: first touch of the scratch pages and buffers, caches
  const std::vector<double> steps = slowest_rank_seconds(c.scheme.steps, cart, step);

  std::vector<std::ptrdiff_t> no_flags;  // stays empty: the flag planes travel all the same
  auto halo_of_a_step = [&] {
    for (int stage = 0; stage < 2; ++stage) {
      halo->fill(state);
      halo->exchange_flags(g, no_flags);
    }
  };
  auto reductions_of_a_step = [&] {
    (void)agree_on_step(1.0, 0.0, cart);  // run loop: time step and wall time
    for (int stage = 0; stage < 2; ++stage)
      (void)halo->any_block(false);                       // integrator: a failure on any block
    (void)combine_step_reports(StepReport{}, box, cart);  // run loop: counts, first failure
  };
  const int repetitions = std::max(10, c.scheme.steps);
  const std::vector<double> halo_seconds = slowest_rank_seconds(repetitions, cart, halo_of_a_step);
  const std::vector<double> reduction_seconds =
      slowest_rank_seconds(repetitions, cart, reductions_of_a_step);

  DecomposedResult r;
  BenchResult& s = r.step;
  s.setup = c.scheme;
  s.ranks = decomposition.size();
  s.interior_cells = box[0] * box[1] * box[2];
  s.seconds = std::accumulate(steps.begin(), steps.end(), 0.0);
  s.best_step_seconds = *std::min_element(steps.begin(), steps.end());
  const double updates = double(s.interior_cells);
  s.cell_updates_per_second_per_core = updates * c.scheme.steps / (s.seconds * s.ranks);
  s.best_cell_updates_per_second_per_core = updates / (s.best_step_seconds * s.ranks);
  s.bytes_per_cell =
      double(allocated_bytes(state) + integrator->allocated_bytes() + halo->allocated_bytes()) /
      double(g.interior_cells());
  r.box_cells = box;
  r.ranks_per_axis = decomposition.ranks_per_axis();
  r.block_cells = decomposition.block_cells();
  r.halo_seconds_per_step = mean(halo_seconds);
  r.reduction_seconds_per_step = mean(reduction_seconds);
  const HaloExchange::Traffic fill = halo->fill_traffic(), flags = halo->flag_traffic();
  r.halo_messages_per_step = 2 * (fill.messages + flags.messages);
  r.halo_bytes_per_step = 2 * (fill.bytes + flags.bytes);
  r.oversubscribed = any_node_oversubscribed(cart);
  return r;
}

}  // namespace brume::app
