// The first-order fallback at the periodic wrap of one block: a face across the wrap is replaced
// once, with one flux, on both of its cells, exactly as a face inside the box. A low-β blast
// (after Gardiner & Stone 2005, J. Comput. Phys. 205, 509, §5.5) is centred on the box corner,
// where the wrap runs through it, and on the box centre; the fallback is needed in both. Cell
// centres and blast centres are multiples of 1/64: every distance is exact.
#include <gtest/gtest.h>

#include <bit>
#include <cmath>
#include <cstdint>

#include "solver/exact_sum.hpp"
#include "tests/solver/solver_test_support.hpp"

namespace brume::solver {
namespace {

using namespace testing;

constexpr int cells = 32;  // a power of two: centres and the half-box shift are exact
constexpr int steps = 24;

struct BlastRun {
  State state;
  long fallback_cells = 0;
  long density_floors = 0;  // pressure floors keep the mass and are allowed
  double mass_before = 0.0, mass_after = 0.0;
};

double exact_mass(const State& s) {
  ExactSum sum;
  const BlockGeometry& g = s.geometry;
  for (int j = 0; j < g.cells[1]; ++j)
    for (int i = 0; i < g.cells[0]; ++i)
      sum.add(s.density[g.index(i, j, 0)]);
  return sum.value();
}

// ρ = 1, p = 0.1 outside and 10 inside r = 0.125 of (centre, centre) (nearest periodic image),
// |B| = √10 at 45°: ambient β = 2p/B² = 0.02.
BlastRun run_blast(double centre) {
  SchemeOptions o;
  o.magnetic = true;
  o.reconstruction = Reconstruction::plm;
  o.riemann = RiemannSolver::hlld;
  BlastRun run{make_box_state({cells, cells, 1}, true, false, 2)};
  State& s = run.state;
  const double b = std::sqrt(5.0);  // each component: |B| = √10
  add_uniform_field(s, {b, b, 0.0});
  set_primitive(
      s,
      [&](double x, double y, double) {
        const double dx = std::fmin(std::fabs(x - centre), 1.0 - std::fabs(x - centre));
        const double dy = std::fmin(std::fabs(y - centre), 1.0 - std::fabs(y - centre));
        return Primitive{1.0, 0, 0, 0, dx * dx + dy * dy < 0.125 * 0.125 ? 10.0 : 0.1};
      },
      o.gamma);
  run.mass_before = exact_mass(s);
  auto integrator = make_integrator(o, s.geometry, periodic_box());
  for (int n = 0; n < steps; ++n) {
    const StepReport r = integrator->advance(s, integrator->stable_time_step(s));
    EXPECT_TRUE(r.ok()) << "step " << n;
    run.fallback_cells += r.fallback_cells;
    run.density_floors += r.density_floors;
  }
  run.mass_after = exact_mass(s);
  return run;
}

std::uint64_t bits(double x) {
  return std::bit_cast<std::uint64_t>(x);
}

class FallbackAtTheWrap : public ::testing::Test {
 protected:
  static void SetUpTestSuite() {
    // Centred on cell (3, 3), not on a face: the flagged cells, 3 to 5 cells away along the
    // diagonal across B, straddle the wrap and are not mirror images across it (those would
    // hide a one-sided correction).
    corner_ = new BlastRun(run_blast(3.5 / cells));
    centre_ = new BlastRun(run_blast(0.5 + 3.5 / cells));
    std::printf(
        "[fallback at the wrap] fallback cells: corner %ld, centre %ld; relative mass "
        "change: corner %.3e, centre %.3e\n",
        corner_->fallback_cells, centre_->fallback_cells,
        (corner_->mass_after - corner_->mass_before) / corner_->mass_before,
        (centre_->mass_after - centre_->mass_before) / centre_->mass_before);
  }
  static void TearDownTestSuite() {
    delete corner_;
    delete centre_;
  }
  static BlastRun* corner_;
  static BlastRun* centre_;
};
BlastRun* FallbackAtTheWrap::corner_ = nullptr;
BlastRun* FallbackAtTheWrap::centre_ = nullptr;

TEST_F(FallbackAtTheWrap, IsNeededAndNoDensityFloorIs) {
  // The checks below test the fallback only if it acted, and mass only without density floors.
  EXPECT_GT(corner_->fallback_cells, 0);
  EXPECT_EQ(corner_->density_floors, 0);
  EXPECT_EQ(centre_->density_floors, 0);
}

// A conservative update in a periodic box changes the total mass by round-off only (common
// practice, no source). The total is summed exactly, so what remains is the rounding of each
// cell's update, ~1e-16 of its mass per step in random directions: bound 2e-15 over 24 steps. A
// flux correction applied to one side of a face only would change the mass by its dt/dx ΔF,
// orders of magnitude more.
TEST_F(FallbackAtTheWrap, ConservesMassToRoundOff) {
  EXPECT_LE(std::fabs(corner_->mass_after - corner_->mass_before) / corner_->mass_before, 2e-15);
  EXPECT_LE(std::fabs(centre_->mass_after - centre_->mass_before) / centre_->mass_before, 2e-15);
}

// The periodic box has no preferred origin: the blast on the corner is the blast on the centre
// shifted by half a box, cell for cell and bit for bit, as long as every face across the wrap is
// treated as a face inside (common practice, no source). Tolerance: none.
TEST_F(FallbackAtTheWrap, IsTheCentredRunShiftedByHalfABox) {
  const State& a = corner_->state;
  const State& b = centre_->state;
  const BlockGeometry& g = a.geometry;
  auto shifted = [&](int i, int j) {
    return g.index((i + cells / 2) % cells, (j + cells / 2) % cells, 0);
  };
  long differences = 0;
  for (int j = 0; j < cells; ++j) {
    for (int i = 0; i < cells; ++i) {
      const std::ptrdiff_t c = g.index(i, j, 0), d = shifted(i, j);
      bool same =
          bits(a.density[c]) == bits(b.density[d]) && bits(a.energy[c]) == bits(b.energy[d]);
      for (int m = 0; m < 3; ++m)
        same = same && bits(a.momentum[m][c]) == bits(b.momentum[m][d]);
      for (int m = 0; m < 2; ++m)
        same = same && bits(a.face_field[m][c]) == bits(b.face_field[m][d]);
      differences += same ? 0 : 1;
    }
  }
  EXPECT_EQ(differences, 0);
}

}  // namespace
}  // namespace brume::solver
