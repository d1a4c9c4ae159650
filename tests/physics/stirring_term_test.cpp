// The stirring term on one block: no net momentum (mass-weighted mean removed), the total energy
// gains exactly the kinetic energy the kick adds and that is the work reported, and the force
// field is spectrally solenoidal (ζ = 1) or compressive (ζ = 0), checked with numpy's FFT.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <string>

#include "physics/stirring_term.hpp"
#include "solver/exact_sum.hpp"
#include "tests/support/run_python.hpp"

namespace brume::physics {
namespace {

StirringSettings settings(double zeta) {
  StirringSettings s;
  s.solenoidal_weight = zeta;
  s.amplitude = StirringAmplitude::velocity_rms;
  s.velocity_rms = 2.0;
  s.seed = 17;
  return s;
}

RunContext context(const std::array<long, 3>& cells, const std::array<double, 3>& size) {
  RunContext c;
  c.box_cells = cells;
  c.box_size = size;
  c.comm = MPI_COMM_SELF;
  return c;
}

// A moving, lumpy ideal-gas state: density 1 + 0.5 sin, velocity and pressure varied.
solver::State lumpy_state(const std::array<int, 3>& cells, const std::array<double, 3>& size) {
  const auto g = solver::whole_box_geometry(cells, {0, 0, 0}, size, 2);
  solver::State s = solver::make_state(g, false, false);
  for (int k = 0; k < cells[2]; ++k) {
    for (int j = 0; j < cells[1]; ++j) {
      for (int i = 0; i < cells[0]; ++i) {
        const auto c = std::size_t(g.index(i, j, k));
        const double x = g.centre(0, i), y = g.centre(1, j), z = g.centre(2, k);
        const double rho = 1.0 + 0.5 * std::sin(6.0 * x + 2.0 * y) * std::cos(4.0 * z);
        const double v[3] = {0.3 * std::cos(3.0 * y), -0.2 * x, 0.1};
        s.density[c] = rho;
        double kinetic = 0.0;
        for (std::size_t d = 0; d < 3; ++d) {
          s.momentum[d][c] = rho * v[d];
          kinetic += 0.5 * rho * v[d] * v[d];
        }
        s.energy[c] = kinetic + 1.5 / (5.0 / 3.0 - 1.0);
      }
    }
  }
  return s;
}

template <class F>
void for_interior(const solver::State& s, F&& f) {
  const auto& g = s.geometry;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      for (int i = 0; i < g.cells[0]; ++i)
        f(std::size_t(g.index(i, j, k)));
    }
  }
}

TEST(StirringTerm, InjectsNoNetMomentumAndPutsItsWorkIntoTheEnergy) {
  // Subtracting the mass-weighted mean acceleration makes Σ ρ a' = 0 exactly in real arithmetic
  // (common practice, no source); in doubles the net momentum change must be round-off: below
  // 1e-13 of Σ |Δm| (a few ulps per cell over 2000 cells).
  const std::array<int, 3> cells{16, 12, 10};
  const std::array<double, 3> size{1.0, 0.75, 0.625};
  solver::State s = lumpy_state(cells, size);
  const solver::State before = s;
  StirringTerm term(settings(0.6), context({16, 12, 10}, size));
  const double dt = 0.05;
  term.advance(s, dt);
  term.advance(s, dt);
  std::array<double, 3> net{}, moved{};
  double energy_change = 0.0, kinetic_change = 0.0;
  for_interior(s, [&](std::size_t c) {
    double k0 = 0.0, k1 = 0.0;
    for (std::size_t d = 0; d < 3; ++d) {
      const double dm = s.momentum[d][c] - before.momentum[d][c];
      net[d] += dm;
      moved[d] += std::fabs(dm);
      k0 += 0.5 * before.momentum[d][c] * before.momentum[d][c] / before.density[c];
      k1 += 0.5 * s.momentum[d][c] * s.momentum[d][c] / s.density[c];
    }
    energy_change += s.energy[c] - before.energy[c];
    kinetic_change += k1 - k0;
    EXPECT_EQ(s.density[c], before.density[c]);
  });
  for (std::size_t d = 0; d < 3; ++d) {
    std::printf("[stirring momentum] axis %zu: net change %.3e, sum of |changes| %.3e\n", d, net[d],
                moved[d]);
    EXPECT_GT(moved[d], 0.0);
    EXPECT_LT(std::fabs(net[d]), 1e-13 * moved[d]) << "axis " << d;
  }
  const double volume = s.geometry.spacing[0] * s.geometry.spacing[1] * s.geometry.spacing[2];
  // The thermal energy is untouched: ΔE = ΔE_kin cell by cell, to round-off of the energies
  // (~3, summed over 1920 cells: 1e-12 relative to the change is ample).
  EXPECT_NEAR(energy_change, kinetic_change, 1e-10 * std::fabs(kinetic_change));
  EXPECT_NEAR(term.work(), energy_change * volume, 1e-10 * std::fabs(energy_change * volume));
  EXPECT_NE(term.work(), 0.0);
  EXPECT_DOUBLE_EQ(term.stirred_time(), 2 * dt);
  EXPECT_NE(term.report().find("work done"), std::string::npos);
}

TEST(StirringTerm, SavesAndRestoresItsState) {
  // A checkpoint round trip continues bit for bit (DESIGN.md §4). Tolerance: none.
  const std::array<int, 3> cells{8, 8, 8};
  const std::array<double, 3> size{1.0, 1.0, 1.0};
  solver::State a = lumpy_state(cells, size), b = a;
  StirringTerm straight(settings(1.0), context({8, 8, 8}, size));
  StirringTerm stopped(settings(1.0), context({8, 8, 8}, size));
  straight.advance(a, 0.02);
  stopped.advance(b, 0.02);
  io::RunRecord record;
  stopped.save(record);
  StirringTerm resumed(settings(1.0), context({8, 8, 8}, size));
  resumed.restore(record);
  straight.advance(a, 0.03);
  resumed.advance(b, 0.03);
  for (std::size_t d = 0; d < 3; ++d)
    EXPECT_EQ(a.momentum[d], b.momentum[d]);
  EXPECT_EQ(a.energy, b.energy);
  // The saved work is a double: the resumed total may differ from the exact one by its last bit.
  EXPECT_DOUBLE_EQ(straight.work(), resumed.work());
}

// Writes the acceleration of a 24 × 16 × 12 box (edges 1.5, 1, 0.75: k = 2π n / L_d differs per
// axis) as float64, x then y then z, i fastest.
std::filesystem::path write_field(double zeta, const std::string& name) {
  const std::array<int, 3> cells{24, 16, 12};
  const std::array<double, 3> size{1.5, 1.0, 0.75};
  solver::State s = lumpy_state(cells, size);
  StirringSettings set = settings(zeta);
  set.profile = StirringProfile::flat;
  StirringTerm term(set, context({24, 16, 12}, size));
  term.advance(s, 0.01);
  const auto path = std::filesystem::temp_directory_path() / name;
  std::ofstream out(path, std::ios::binary);
  for (int d = 0; d < 3; ++d) {
    const auto& a = term.acceleration(d);
    out.write(reinterpret_cast<const char*>(a.data()), std::streamsize(a.size() * sizeof(double)));
  }
  return path;
}

void expect_projection(double zeta, const char* part) {
  const auto path = write_field(zeta, std::string("brume-stirring-") + part + ".bin");
  const auto script =
      std::filesystem::path(BRUME_SOURCE_DIR) / "tests/physics/stirring_spectrum.py";
  const auto result =
      testing::run_python(script, {path.string(), "24", "16", "12", "1.5", "1.0", "0.75", part});
  std::filesystem::remove(path);
  EXPECT_EQ(result.exit_code, 0) << result.output;
  std::printf("%s", result.output.c_str());
}

TEST(StirringTerm, SolenoidalForceHasNoCompressivePart) {
  // Federrath et al. 2010, A&A 512, A81, eq. 9 (ζ = 1): k·F̂(k) = 0 for every k, measured with
  // numpy's FFT (tests/physics/stirring_spectrum.py states the tolerance).
  expect_projection(1.0, "compressive");
}

TEST(StirringTerm, CompressiveForceHasNoSolenoidalPart) {
  // ζ = 0: k × F̂(k) = 0 for every k.
  expect_projection(0.0, "solenoidal");
}

}  // namespace
}  // namespace brume::physics
