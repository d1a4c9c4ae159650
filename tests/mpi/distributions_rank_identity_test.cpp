// The distributions and Jeans diagnostics on 1, 2 and 4 ranks must give bitwise the same
// Measurement (DESIGN.md §4: integer counts and exact sums for every histogram and box sum;
// minima by MPI_MIN). Tolerance: none (every bit). The field spans several decades in density,
// pressure and field strength, so that many bins and the exponent windows of the exact sums are
// exercised.
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>
#include <string>
#include <vector>

#include "physics/cell_quantities.hpp"
#include "physics/distributions_diagnostic.hpp"
#include "physics/jeans_diagnostic.hpp"
#include "solver/units/constants.hpp"
#include "tests/mpi/sub_communicator.hpp"

namespace brume::mpi_testing {
namespace {

constexpr std::array<long, 3> kBox{16, 8, 8};

physics::RunContext context_on(MPI_Comm comm) {
  physics::RunContext c;
  c.code_units =
      units::code_units_from_number_density(units::cgs::parsec, units::cgs::kilometre, 1.0, 1.27);
  c.mean_molecular_weight = 1.27;
  c.box_cells = kBox;
  c.box_size = {16.0, 8.0, 8.0};
  c.comm = comm;
  return c;
}

// The block of rank r of a layout per_axis (x fastest), with values from global coordinates.
physics::CellQuantities block_of(int rank, const std::array<int, 3>& per_axis) {
  physics::CellQuantities q;
  const std::array<int, 3> where{rank % per_axis[0], (rank / per_axis[0]) % per_axis[1],
                                 rank / (per_axis[0] * per_axis[1])};
  for (std::size_t d = 0; d < 3; ++d) {
    q.cells[d] = int(kBox[d]) / per_axis[d];
    q.offset[d] = long(where[d]) * q.cells[d];
    q.spacing[d] = 1.0;
  }
  q.box_cells = kBox;
  const std::size_t n = std::size_t(q.cells[0]) * std::size_t(q.cells[1]) * std::size_t(q.cells[2]);
  q.density.resize(n);
  q.pressure.resize(n);
  q.temperature.resize(n);
  for (std::size_t d = 0; d < 3; ++d) {
    q.velocity[d].resize(n);
    q.field[d].resize(n);
  }
  for (int k = 0; k < q.cells[2]; ++k) {
    for (int j = 0; j < q.cells[1]; ++j) {
      for (int i = 0; i < q.cells[0]; ++i) {
        const double x = double(q.offset[0] + i), y = double(q.offset[1] + j),
                     z = double(q.offset[2] + k);
        const std::size_t c = q.at(i, j, k);
        const double rho = 30.0 * std::exp(4.0 * std::sin(0.7 * x + 0.3 * y) * std::cos(0.5 * z));
        q.density[c] = rho;
        q.pressure[c] = 0.01 * std::pow(rho, 0.7) * (1.2 + std::sin(1.3 * y + 0.2 * x));
        q.temperature[c] = 7000.0 * q.pressure[c] / rho;
        q.velocity[0][c] = 3.0 * std::sin(0.4 * y + 0.9 * z);
        q.velocity[1][c] = 2.0 * std::cos(0.6 * x);
        q.velocity[2][c] = 1.0 + std::sin(0.8 * x * y);
        q.field[0][c] = 0.2 + 0.1 * std::cos(0.3 * z + x);
        q.field[1][c] = 0.05 * std::sin(0.7 * x + y);
        q.field[2][c] = 0.001 * (1.0 + x);
      }
    }
  }
  return q;
}

// Every array value and number bit for bit, and the same notes and warnings.
std::string first_difference(const io::Measurement& a, const io::Measurement& b) {
  if (a.arrays.size() != b.arrays.size() || a.numbers.size() != b.numbers.size())
    return "different contents";
  for (std::size_t i = 0; i < a.arrays.size(); ++i) {
    const auto& x = a.arrays[i];
    const auto& y = b.arrays[i];
    if (x.name != y.name || x.values.size() != y.values.size() ||
        std::memcmp(x.values.data(), y.values.data(), x.values.size() * sizeof(double)) != 0)
      return "array " + x.name;
  }
  for (std::size_t i = 0; i < a.numbers.size(); ++i) {
    const double x = a.numbers[i].value, y = b.numbers[i].value;
    if (std::memcmp(&x, &y, sizeof x) != 0) return "number " + a.numbers[i].name;
  }
  if (a.notes != b.notes) return "notes";
  if (a.warnings != b.warnings) return "warnings";
  return "";
}

std::vector<io::Measurement> measure_on(int ranks, const std::array<int, 3>& per_axis) {
  const SubCommunicator sub(ranks);
  if (!sub.member()) return {};
  int rank = 0;
  MPI_Comm_rank(sub.comm(), &rank);
  const physics::RunContext context = context_on(sub.comm());
  const physics::CellQuantities q = block_of(rank, per_axis);
  physics::DistributionsSettings d;
  d.density = {40, 1e-1, 1e5};
  d.pressure = {30, 1e-2, 1e6};
  d.temperature = {30, 1.0, 1e7};
  d.plasma_beta = {30, 1e-4, 1e4};
  d.dynamic_ratio = {30, 1e-3, 1e6};
  d.field = {30, 1e-2, 1e2};
  physics::JeansSettings j;
  j.critical_density_factor = 0.01;  // part of the gas above the critical density
  return {physics::DistributionsDiagnostic(d, std::nullopt).measure(q, context),
          physics::JeansDiagnostic(j).measure(q, context)};
}

TEST(MpiDistributionsIdentity, HistogramsAndJeansAreBitwiseIdenticalOn1To4Ranks) {
  const std::vector<io::Measurement> reference = measure_on(1, {1, 1, 1});
  if (world_rank() == 0) {
    ASSERT_EQ(reference.size(), 2u);
    for (const io::MeasuredNumber& n : reference[1].numbers) {
      if (n.name == "critical_log_density")
        std::printf("[distributions identity] s_crit %g\n", n.value);
      if (n.name == "volume_fraction_above_critical") {  // the rate's integral is exercised
        EXPECT_GT(n.value, 0.0);
        EXPECT_LT(n.value, 1.0);
      }
    }
    std::printf("[distributions identity] %zu + %zu arrays, %zu + %zu numbers\n",
                reference[0].arrays.size(), reference[1].arrays.size(), reference[0].numbers.size(),
                reference[1].numbers.size());
  }
  const std::vector<std::pair<int, std::array<int, 3>>> layouts{
      {2, {2, 1, 1}}, {2, {1, 1, 2}}, {4, {2, 2, 1}}, {4, {1, 2, 2}}};
  for (const auto& [ranks, per_axis] : layouts) {
    if (ranks > world_size()) continue;
    const std::vector<io::Measurement> run = measure_on(ranks, per_axis);
    if (world_rank() != 0) continue;
    ASSERT_EQ(run.size(), 2u);
    for (std::size_t m = 0; m < 2; ++m)
      EXPECT_EQ(first_difference(reference[m], run[m]), "")
          << reference[m].name << " on " << ranks << " ranks";
  }
}

}  // namespace
}  // namespace brume::mpi_testing
