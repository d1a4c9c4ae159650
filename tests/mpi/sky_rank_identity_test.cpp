// The sky maps (column density, Stokes I, Q, U, fraction and angles) of an evolved magnetized box
// are bitwise the same on 1, 2 and 4 ranks in several decompositions (DESIGN.md §4: each line of
// sight is summed cell by cell in global order), every rank holds the same result, and the spectra
// agree too. Tolerance: none for the maps (every bit); 1e-12 relative for the spectra, which only
// need round-off agreement (they are computed on rank 0 from the same maps, so they match exactly
// in practice).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstring>
#include <string>
#include <vector>

#include "app/run_loop.hpp"
#include "app/source_terms.hpp"
#include "physics/cell_quantities.hpp"
#include "physics/sky_maps.hpp"
#include "tests/mpi/decomposed_run.hpp"

namespace brume::mpi_testing {
namespace {

constexpr long kSteps = 4;

physics::SkySettings sky_settings() {
  physics::SkySettings s;
  s.polarization_fraction = 0.2;
  s.intensity = physics::SkyIntensity::alignment_corrected;
  s.fit_lowest = 1.0;
  s.fit_highest = 4.0;
  return s;
}

// A bit pattern of every value of every array, to compare ranks within one run.
std::uint64_t fingerprint(const io::Measurement& m) {
  std::uint64_t h = 1469598103934665603ULL;  // FNV-1a (common practice, no source)
  for (const io::MeasuredArray& a : m.arrays) {
    for (const double v : a.values) {
      std::uint64_t bits = 0;
      std::memcpy(&bits, &v, sizeof bits);
      h = (h ^ bits) * 1099511628211ULL;
    }
  }
  return h;
}

struct SkyRun {
  io::Measurement result;
  bool ranks_agree = false;
  double density_contrast = 0.0;  // max / min column density along z
};

SkyRun sky_on(int ranks, const std::array<int, 3>& per_axis, physics::SkySettings settings) {
  DecomposedRun run = start_decomposed("tests/mpi/decaying_box.yaml", ranks, per_axis,
                                       {"clock.max_steps=" + std::to_string(kSteps)});
  SkyRun out;
  if (!run.member()) return out;
  const MPI_Comm comm = run.decomposition->comm();
  app::RunLimits limits;
  limits.stop_time = 1e9;
  limits.max_steps = kSteps;
  limits.progress_interval = 1e9;
  const io::Log quiet(io::Verbosity::quiet, false);
  (void)app::run_loop(*run.integrator, run.state, limits, quiet, *run.decomposition);
  const physics::RunContext context = app::run_context(run.setup, comm, run.ghosts);
  const physics::CellQuantities cells = physics::cell_quantities(run.state, context);
  out.result = physics::SkyMaps(std::move(settings)).measure(cells, context);
  const std::uint64_t mine = fingerprint(out.result);
  std::uint64_t low = mine, high = mine;
  MPI_Allreduce(MPI_IN_PLACE, &low, 1, MPI_UINT64_T, MPI_MIN, comm);
  MPI_Allreduce(MPI_IN_PLACE, &high, 1, MPI_UINT64_T, MPI_MAX, comm);
  out.ranks_agree = low == high;
  for (const io::MeasuredArray& a : out.result.arrays) {
    if (a.name != "column_density_along_z") continue;
    double lo = a.values[0], hi = a.values[0];
    for (const double v : a.values) {
      lo = std::min(lo, v);
      hi = std::max(hi, v);
    }
    out.density_contrast = hi / lo;
  }
  return out;
}

bool is_map(const io::MeasuredArray& a) {
  return a.shape.size() == 2;
}

void expect_same(const io::Measurement& reference, const io::Measurement& run,
                 const std::string& layout) {
  ASSERT_EQ(reference.arrays.size(), run.arrays.size()) << layout;
  for (std::size_t n = 0; n < reference.arrays.size(); ++n) {
    const io::MeasuredArray& a = reference.arrays[n];
    const io::MeasuredArray& b = run.arrays[n];
    ASSERT_EQ(a.name, b.name) << layout;
    ASSERT_EQ(a.values.size(), b.values.size()) << a.name << ", " << layout;
    if (is_map(a)) {
      EXPECT_EQ(std::memcmp(a.values.data(), b.values.data(), a.values.size() * sizeof(double)), 0)
          << a.name << " differs in some bit, " << layout;
    } else {
      for (std::size_t c = 0; c < a.values.size(); ++c)
        EXPECT_NEAR(b.values[c], a.values[c], 1e-12 * std::fabs(a.values[c]))
            << a.name << "[" << c << "], " << layout;
    }
  }
}

TEST(MpiSkyMaps, MapsAreBitwiseIdenticalOn1To4Ranks) {
  const std::vector<physics::SkySettings> variants = [] {
    physics::SkySettings cut = sky_settings();
    cut.intensity = physics::SkyIntensity::column;
    cut.density_cut = 1.0;  // the initial density: removes the cells compressed since
    return std::vector<physics::SkySettings>{sky_settings(), cut};
  }();
  for (const physics::SkySettings& settings : variants) {
    const SkyRun reference = sky_on(1, {1, 1, 1}, settings);
    if (world_rank() == 0) {
      ASSERT_EQ(reference.result.arrays.size(), 3U * 13U);
      // The box must have structure after the steps, or the sums would not be exercised.
      EXPECT_GT(reference.density_contrast, 1.0001);
      std::printf("[sky identity] column density contrast along z after %ld steps: %.6f\n", kSteps,
                  reference.density_contrast);
    }
    const std::vector<std::pair<int, std::array<int, 3>>> layouts{
        {2, {2, 1, 1}}, {2, {1, 2, 1}}, {2, {1, 1, 2}}, {4, {2, 2, 1}},
        {4, {1, 2, 2}}, {4, {4, 1, 1}}, {4, {2, 1, 2}}};
    for (const auto& [ranks, per_axis] : layouts) {
      if (ranks > world_size()) continue;
      const SkyRun run = sky_on(ranks, per_axis, settings);
      if (world_rank() != 0) continue;
      const std::string layout = layout_name(ranks, per_axis);
      EXPECT_TRUE(run.ranks_agree) << layout;
      expect_same(reference.result, run.result, layout);
    }
  }
}

}  // namespace
}  // namespace brume::mpi_testing
