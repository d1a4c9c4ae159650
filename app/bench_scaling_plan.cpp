#include "app/bench_scaling_plan.hpp"

#include "app/bench_options.hpp"
#include "app/user_error.hpp"
#include "solver/decomposition.hpp"

namespace brume::app {

std::vector<int> scaling_rank_counts(int world) {
  std::vector<int> counts;
  for (int n = 1; n <= world; n *= 2)
    counts.push_back(n);
  return counts;
}

std::array<int, 3> weak_ranks_per_axis(int ranks) {
  std::array<int, 3> per_axis{1, 1, 1};
  for (int axis = 2; ranks > 1; ranks /= 2, axis = (axis + 2) % 3)
    per_axis[std::size_t(axis)] *= 2;
  return per_axis;
}

std::vector<ScalingCase> scaling_plan(const ScalingSizes& sizes, int world) {
  const struct {
    const char *physics, *reconstruction, *riemann;
  } schemes[] = {{"mhd", "plm", "hlld"}, {"hydro", "plm", "hllc"}};
  const std::vector<int> counts = scaling_rank_counts(world);
  std::vector<ScalingCase> plan;
  for (const auto& s : schemes) {
    auto scheme = [&](int cells) {
      return BenchCase{s.physics, s.reconstruction, s.riemann, cells,
                       sizes.steps > 0 ? sizes.steps : default_steps(cells)};
    };
    const int ghost_layers = solver::required_ghost_layers(bench_scheme(scheme(4)));
    for (const int n : sizes.strong_boxes) {
      const std::array<long, 3> box{n, n, n};
      for (const int ranks : counts) {
        try {
          (void)solver::choose_ranks_per_axis(ranks, box, {0, 0, 0}, ghost_layers);
        } catch (const solver::DecompositionError& error) {
          throw UserError("bench scaling: the " + std::to_string(n) + "³ box of strong scaling " +
                          "does not fit " + std::to_string(ranks) + " ranks: " + error.what() +
                          "; give a larger --cells or fewer ranks");
        }
        plan.push_back({"strong", ranks, {scheme(n), box, {0, 0, 0}}});
      }
    }
    const int b = sizes.weak_block;
    for (const int ranks : counts) {
      const std::array<int, 3> per_axis = weak_ranks_per_axis(ranks);
      const std::array<long, 3> box{long(b) * per_axis[0], long(b) * per_axis[1],
                                    long(b) * per_axis[2]};
      plan.push_back({"weak", ranks, {scheme(b), box, per_axis}});
    }
  }
  return plan;
}

}  // namespace brume::app
