// Micro-benchmarks of the step's kernels on one row (or one block) of smooth data:
//   reconstruction of a row of cells, the Riemann solver over a row of faces, the CT edge EMFs.
// Items processed are cells (reconstruction), faces (Riemann) and edges (CT).
#include <benchmark/benchmark.h>

#include <cmath>
#include <cstddef>
#include <vector>

#include "solver/constrained_transport.hpp"
#include "solver/ppm.hpp"
#include "solver/reconstruction.hpp"
#include "solver/riemann/solvers.hpp"
#include "solver/riemann_row.hpp"
#include "solver/stage_scratch.hpp"

namespace brume::solver {
namespace {

std::vector<double> smooth_row(int n, double mean, double amplitude, double phase) {
  std::vector<double> q(static_cast<std::size_t>(n));
  for (int i = 0; i < n; ++i)
    q[std::size_t(i)] = mean + amplitude * std::sin(0.19 * i + phase);
  return q;
}

template <class Recon>
void reconstruction_row(benchmark::State& state) {
  const int n = int(state.range(0));
  const std::vector<double> q = smooth_row(n + 8, 1.0, 0.3, 0.0);
  std::vector<double> lo(static_cast<std::size_t>(n)), hi(static_cast<std::size_t>(n));
  for (auto _ : state) {
    reconstruct_row<Recon>(ArrayReader{q.data()}, 4, 1, n, lo.data(), hi.data());
    benchmark::DoNotOptimize(lo.data());
    benchmark::DoNotOptimize(hi.data());
  }
  state.SetItemsProcessed(state.iterations() * n);
}
BENCHMARK(reconstruction_row<PlmMonotonizedCentral>)->Arg(66);
BENCHMARK(reconstruction_row<Ppm>)->Arg(66);

// Face states of a row: smooth profiles on both sides, with a jump between them.
struct RowStates {
  std::vector<double> v[2][7];
  std::vector<double> bn;
  explicit RowStates(int n) : bn(smooth_row(n, 0.5, 0.2, 0.7)) {
    const double mean[7] = {1.0, 0.1, -0.2, 0.3, 0.6, 0.4, -0.3};
    for (int side = 0; side < 2; ++side) {
      for (int k = 0; k < 7; ++k)
        v[side][k] = smooth_row(n, mean[k] * (side ? 0.8 : 1.0), 0.1, 0.3 * k + side);
    }
  }
  FaceRowStates states(int side) const {
    const auto& s = v[side];
    return {s[0].data(), s[1].data(), s[2].data(), s[3].data(),
            s[4].data(), s[5].data(), s[6].data()};
  }
};

template <class Solver, bool Magnetic>
void riemann_row_bench(benchmark::State& state) {
  const int n = int(state.range(0));
  const RowStates rows(n);
  std::vector<double> f[7];
  for (auto& x : f)
    x.assign(std::size_t(n), 0.0);
  std::vector<std::int8_t> sign(static_cast<std::size_t>(n));
  const FluxRow out{f[0].data(), f[1].data(), f[2].data(), f[3].data(),
                    f[4].data(), f[5].data(), f[6].data(), sign.data()};
  const IdealGas gas{5.0 / 3.0};
  for (auto _ : state) {
    riemann_row<IdealGas, Magnetic, Solver>(rows.states(0), rows.states(1), rows.bn.data(), n, gas,
                                            out);
    benchmark::DoNotOptimize(f[0].data());
  }
  state.SetItemsProcessed(state.iterations() * n);
}
BENCHMARK(riemann_row_bench<Hlld, true>)->Name("riemann_row<Hlld>")->Arg(66);
BENCHMARK(riemann_row_bench<Hlle, true>)->Name("riemann_row<Hlle, MHD>")->Arg(66);
BENCHMARK(riemann_row_bench<Hllc, false>)->Name("riemann_row<Hllc>")->Arg(66);

// The edge EMFs of one component over an n³ block of smooth face EMFs and velocities.
void ct_edge_emf(benchmark::State& state) {
  const int n = int(state.range(0));
  const BlockGeometry g = whole_box_geometry({n, n, n}, {0, 0, 0}, {1, 1, 1}, 2);
  State s = make_state(g, true, false);
  StageScratch scratch = make_stage_scratch(g, true, false);
  const std::size_t size = g.storage_size();
  for (std::size_t c = 0; c < size; ++c) {
    const double x = 0.001 * double(c);
    for (int d = 0; d < 3; ++d) {
      scratch.primitive.velocity[std::size_t(d)][c] = std::sin(x + d);
      s.face_field[std::size_t(d)][c] = std::cos(0.7 * x + d);
      scratch.ct.mass_sign[std::size_t(d)][c] = std::int8_t(int(c % 3) - 1);
      for (auto& e : scratch.ct.face_emf[std::size_t(d)])
        e[c] = std::sin(1.3 * x - d);
    }
  }
  for (auto _ : state) {
    edge_emf(2, scratch.primitive, s, scratch.ct);
    benchmark::DoNotOptimize(edge_emf_values(scratch.ct, 2));
  }
  state.SetItemsProcessed(state.iterations() * (n + 1) * (n + 1) * n);
}
BENCHMARK(ct_edge_emf)->Arg(64);

}  // namespace
}  // namespace brume::solver

BENCHMARK_MAIN();
