// Column density and Stokes maps of uniform and simple boxes through SkyMaps::measure() on one
// rank: the values the model's equations give (Planck Collaboration Int. XX 2015, A&A 576, A105,
// eqs. 5-7, from memory: Q + iU ∝ p0 n cos²γ e^{2iψ}), the angles of the stated convention
// (docs/sky-maps.md: IAU, north +v, east −u), the density cut and the map layout.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>
#include <stdexcept>
#include <string>

#include "physics/sky_maps.hpp"
#include "solver/units/constants.hpp"
#include "tests/sky/sky_test_support.hpp"

namespace brume::physics {
namespace {

using sky_testing::CellValues;

const std::array<int, 3> kCells{8, 6, 4};
const std::array<double, 3> kSize{2.0, 1.5, 1.0};  // cells of 0.25 along every axis
constexpr double kP0 = 0.1;

// Uniform maps sum 4 to 8 equal terms and scale them once: a few ulps.
constexpr double kRoundOff = 1e-14;

const io::MeasuredArray& array(const io::Measurement& m, const std::string& name) {
  for (const io::MeasuredArray& a : m.arrays) {
    if (a.name == name) return a;
  }
  throw std::runtime_error("no array " + name);
}

template <class Fill>
io::Measurement measured(Fill&& fill, SkySettings settings = {}) {
  settings.polarization_fraction = kP0;
  const CellQuantities q = sky_testing::whole_box(kCells, kSize, fill);
  return SkyMaps(settings).measure(q, sky_testing::one_rank(kCells, kSize));
}

// With code units of 1 g cm^-3 and 1 cm and μ = 1, a column of density ρ over a length L holds
// ρ L / m_H particles per cm² (n = ρ / (μ m_H)).
double column(double rho, double length) {
  return rho * length / units::cgs::hydrogen_mass;
}

void expect_uniform(const io::MeasuredArray& a, double expected, double tolerance) {
  for (const double v : a.values)
    EXPECT_NEAR(v, expected, tolerance) << a.name;
}

TEST(SkyStokes, FieldInThePlaneOfTheSkyGivesTheIntrinsicFraction) {
  const io::Measurement m = measured([](int, int, int) {
    return CellValues{2.0, {0.0, 1.0, 0.0}};
  });
  // Along x the field (along y) lies along u: polarization along v (north), ψ = 0, field
  // orientation 90°.
  const double n_x = column(2.0, kSize[0]);
  expect_uniform(array(m, "column_density_along_x"), n_x, kRoundOff * n_x);
  expect_uniform(array(m, "stokes_i_along_x"), n_x, kRoundOff * n_x);
  expect_uniform(array(m, "stokes_q_along_x"), kP0 * n_x, kRoundOff * n_x);
  expect_uniform(array(m, "stokes_u_along_x"), 0.0, kRoundOff * n_x);
  expect_uniform(array(m, "polarization_fraction_along_x"), kP0, kRoundOff);
  expect_uniform(array(m, "polarization_angle_along_x"), 0.0, 1e-12);
  expect_uniform(array(m, "field_angle_along_x"), 90.0, 1e-12);
  // Along z the field lies along v (north): polarization east-west, ψ = 90°, field 0°.
  const double n_z = column(2.0, kSize[2]);
  expect_uniform(array(m, "stokes_q_along_z"), -kP0 * n_z, kRoundOff * n_z);
  expect_uniform(array(m, "polarization_fraction_along_z"), kP0, kRoundOff);
  expect_uniform(array(m, "polarization_angle_along_z"), 90.0, 1e-12);
  expect_uniform(array(m, "field_angle_along_z"), 0.0, 1e-12);
}

TEST(SkyStokes, FieldAlongTheLineOfSightIsUnpolarized) {
  const io::Measurement m = measured([](int, int, int) {
    return CellValues{2.0, {0.0, 1.0, 0.0}};
  });
  // cos²γ = 0 exactly: Q and U vanish exactly, p = 0.
  expect_uniform(array(m, "stokes_q_along_y"), 0.0, 0.0);
  expect_uniform(array(m, "stokes_u_along_y"), 0.0, 0.0);
  expect_uniform(array(m, "polarization_fraction_along_y"), 0.0, 0.0);
  const double n_y = column(2.0, kSize[1]);
  expect_uniform(array(m, "stokes_i_along_y"), n_y, kRoundOff * n_y);
}

TEST(SkyStokes, ObliqueFieldAnglesFromNorthThroughEast) {
  const double c = std::cos(std::numbers::pi / 6.0), s = std::sin(std::numbers::pi / 6.0);
  const io::Measurement m = measured([&](int, int, int) { return CellValues{1.0, {c, s, 0.0}}; });
  // Along z, b = cos30° x + sin30° y = cos30° u + sin30° v: north component ½, east −cos30°, so
  // the field points 60° west of north: −60°, and ψ = −60° + 90° = 30° (geometry of the
  // convention, common practice, no source). Tolerance: atan2 of values with a few ulps of error.
  expect_uniform(array(m, "field_angle_along_z"), -60.0, 1e-12);
  expect_uniform(array(m, "polarization_angle_along_z"), 30.0, 1e-12);
  expect_uniform(array(m, "polarization_fraction_along_z"), kP0, kRoundOff);
  // Along x, (u, v) = (y, z): the field has sin30° in the plane (along u) and cos30° along the
  // line of sight: cos²γ = ¼, so p = p0 / 4 (eqs. 6-7), ψ = 0.
  expect_uniform(array(m, "polarization_fraction_along_x"), 0.25 * kP0, kRoundOff);
  expect_uniform(array(m, "polarization_angle_along_x"), 0.0, 1e-12);
}

TEST(SkyStokes, AlignmentCorrectedIntensity) {
  SkySettings settings;
  settings.intensity = SkyIntensity::alignment_corrected;
  const io::Measurement m = measured(
      [](int, int, int) {
        return CellValues{1.0, {0.0, 1.0, 0.0}};
      },
      settings);
  // I = ∫ n [1 − p0 (cos²γ − 2/3)] ds (Planck Int. XX eq. 5, from memory): in the plane of the
  // sky I = N (1 − p0/3), p = p0 / (1 − p0/3); along the line of sight I = N (1 + 2 p0/3).
  expect_uniform(array(m, "polarization_fraction_along_x"), kP0 / (1.0 - kP0 / 3.0), kRoundOff);
  const double n_y = column(1.0, kSize[1]);
  expect_uniform(array(m, "stokes_i_along_y"), n_y * (1.0 + 2.0 * kP0 / 3.0), kRoundOff * n_y);
  expect_uniform(array(m, "column_density_along_y"), n_y, kRoundOff * n_y);
}

TEST(SkyStokes, DensityCutRemovesTheDenseGas) {
  SkySettings settings;
  settings.density_cut = 10.0;  // code density
  const io::Measurement m = measured(
      [](int, int, int k) {
        return CellValues{k < 2 ? 1.0 : 100.0, {0.0, 1.0, 0.0}};
      },
      settings);
  // Along z two of the four cells of every column are kept: N = 1 × 0.5.
  const double n_z = column(1.0, 0.5);
  expect_uniform(array(m, "column_density_along_z"), n_z, kRoundOff * n_z);
  // Along x the rows k ≥ 2 hold dense gas only: nothing is left, and p is reported as 0.
  const io::MeasuredArray& n_x = array(m, "column_density_along_x");
  const io::MeasuredArray& p_x = array(m, "polarization_fraction_along_x");
  ASSERT_EQ(n_x.shape, (std::vector<std::size_t>{4, 6}));  // [v = z][u = y]
  for (std::size_t k = 0; k < 4; ++k) {
    for (std::size_t j = 0; j < 6; ++j) {
      const std::size_t at = k * 6 + j;
      if (k < 2) {
        EXPECT_NEAR(n_x.values[at], column(1.0, kSize[0]), kRoundOff * column(1.0, kSize[0]));
        EXPECT_NEAR(p_x.values[at], kP0, kRoundOff);
      } else {
        EXPECT_EQ(n_x.values[at], 0.0);
        EXPECT_EQ(p_x.values[at], 0.0);
      }
    }
  }
}

// Distinct integer densities make every sum exact, so the maps must equal the direct sums over
// the stated layout bit for bit: along x [z][y], along y [x][z], along z [y][x].
TEST(SkyStokes, MapsHoldTheLineOfSightSumsInTheStatedLayout) {
  auto rho = [](long i, long j, long k) { return double(1 + i + 10 * j + 100 * k); };
  const io::Measurement m = measured([&](int i, int j, int k) {
    return CellValues{rho(i, j, k), {0.0, 0.0, 0.0}};
  });
  const double per_cell = 0.25 / units::cgs::hydrogen_mass;
  const io::MeasuredArray& x = array(m, "column_density_along_x");
  const io::MeasuredArray& y = array(m, "column_density_along_y");
  const io::MeasuredArray& z = array(m, "column_density_along_z");
  ASSERT_EQ(x.shape, (std::vector<std::size_t>{4, 6}));
  ASSERT_EQ(y.shape, (std::vector<std::size_t>{8, 4}));
  ASSERT_EQ(z.shape, (std::vector<std::size_t>{6, 8}));
  for (long k = 0; k < 4; ++k) {
    for (long j = 0; j < 6; ++j) {
      double s = 0.0;
      for (long i = 0; i < 8; ++i)
        s += rho(i, j, k);
      EXPECT_EQ(x.values[std::size_t(k * 6 + j)], s * per_cell) << j << " " << k;
    }
  }
  for (long i = 0; i < 8; ++i) {
    for (long k = 0; k < 4; ++k) {
      double s = 0.0;
      for (long j = 0; j < 6; ++j)
        s += rho(i, j, k);
      EXPECT_EQ(y.values[std::size_t(i * 4 + k)], s * per_cell) << i << " " << k;
    }
  }
  for (long j = 0; j < 6; ++j) {
    for (long i = 0; i < 8; ++i) {
      double s = 0.0;
      for (long k = 0; k < 4; ++k)
        s += rho(i, j, k);
      EXPECT_EQ(z.values[std::size_t(j * 8 + i)], s * per_cell) << i << " " << j;
    }
  }
}

}  // namespace
}  // namespace brume::physics
