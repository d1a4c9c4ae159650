#include "physics/box_overview.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <limits>

#include "solver/exact_sum.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics {

namespace {

// The sums the overview needs, each exact.
enum Sum : int {
  mass,
  kinetic,
  magnetic,
  thermal,
  field_x,
  field_y,
  field_z,
  velocity_squared,
  mass_velocity_squared,
  sonic_squared,
  mass_sonic_squared,
  alfven_squared,
  mass_alfven_squared,
  cold_volume,
  unstable_volume,
  warm_volume,
  cold_mass,
  unstable_mass,
  warm_mass,
  sum_count
};

}  // namespace

io::Measurement BoxOverview::measure(const CellQuantities& q, const RunContext& context) const {
  std::array<solver::ExactSum, sum_count> sums;
  // min ρ, min T, −max ρ, −max T: one MPI_MIN reduces all four.
  const double huge = std::numeric_limits<double>::infinity();
  double extremes[4] = {huge, huge, huge, huge};
  const double gamma = context.isothermal ? 1.0 : context.gamma;
  for (std::size_t c = 0; c < q.size(); ++c) {
    const double rho = q.density[c], p = q.pressure[c], t = q.temperature[c];
    double v2 = 0.0, b2 = 0.0;
    for (int d = 0; d < 3; ++d) {
      v2 += q.velocity[d][c] * q.velocity[d][c];
      b2 += q.field[d][c] * q.field[d][c];
    }
    const double sonic2 = v2 * rho / (gamma * p);  // v² / c_s², c_s² = γp/ρ
    const double alfven2 = b2 > 0.0 ? v2 * rho / b2 : 0.0;
    sums[mass].add(rho);
    sums[kinetic].add(0.5 * rho * v2);
    sums[magnetic].add(0.5 * b2);
    if (!context.isothermal) sums[thermal].add(p / (context.gamma - 1.0));
    sums[field_x].add(q.field[0][c]);
    sums[field_y].add(q.field[1][c]);
    sums[field_z].add(q.field[2][c]);
    sums[velocity_squared].add(v2);
    sums[mass_velocity_squared].add(rho * v2);
    sums[sonic_squared].add(sonic2);
    sums[mass_sonic_squared].add(rho * sonic2);
    sums[alfven_squared].add(alfven2);
    sums[mass_alfven_squared].add(rho * alfven2);
    const int phase = t < phases_.cold_below ? 0 : (t > phases_.warm_above ? 2 : 1);
    sums[cold_volume + phase].add(1.0);
    sums[cold_mass + phase].add(rho);
    extremes[0] = std::min(extremes[0], rho);
    extremes[1] = std::min(extremes[1], t);
    extremes[2] = std::min(extremes[2], -rho);
    extremes[3] = std::min(extremes[3], -t);
  }
  for (solver::ExactSum& s : sums)
    s.combine(context.comm);
  MPI_Allreduce(MPI_IN_PLACE, extremes, 4, MPI_DOUBLE, MPI_MIN, context.comm);

  const units::CodeUnits& u = context.code_units;
  const double cells = double(q.box_cells[0]) * double(q.box_cells[1]) * double(q.box_cells[2]);
  const double cell_volume = q.spacing[0] * q.spacing[1] * q.spacing[2];
  const double total_mass = sums[mass].value();
  const double mean_field[3] = {sums[field_x].value() / cells, sums[field_y].value() / cells,
                                sums[field_z].value() / cells};
  const double mean_field_energy = 0.5 *
                                   (mean_field[0] * mean_field[0] + mean_field[1] * mean_field[1] +
                                    mean_field[2] * mean_field[2]) *
                                   cells * cell_volume;
  const double e_kinetic = sums[kinetic].value() * cell_volume;
  const double e_magnetic = sums[magnetic].value() * cell_volume;
  const double e_thermal = sums[thermal].value() * cell_volume;
  const double number_density = 1.0 / (context.mean_molecular_weight * units::cgs::hydrogen_mass);

  io::Measurement m;
  m.name = name();
  m.description = "The box in a few numbers: energies, rms velocity, Mach numbers, phases";
  m.notes.emplace_back("phase_boundaries", phases_.origin);
  auto number = [&](const char* key, double value, const char* unit, double to_cgs,
                    const char* description) {
    m.numbers.push_back({key, value, unit, to_cgs, description});
  };
  const double erg = u.energy(), kms = u.velocity / 1e5;
  number("kinetic_energy", e_kinetic * erg, "erg", 1.0, "Sum of rho v^2 / 2 over the box");
  number("magnetic_energy_mean_field", mean_field_energy * erg, "erg", 1.0,
         "|<B>|^2 / 8 pi times the box volume");
  number("magnetic_energy_fluctuating", (e_magnetic - mean_field_energy) * erg, "erg", 1.0,
         "Sum of |B - <B>|^2 / 8 pi over the box");
  number("thermal_energy", e_thermal * erg, "erg", 1.0, "Sum of p / (gamma - 1) over the box");
  number("total_energy", (e_kinetic + e_magnetic + e_thermal) * erg, "erg", 1.0,
         "Kinetic + magnetic + thermal");
  number("velocity_rms_volume", std::sqrt(sums[velocity_squared].value() / cells) * kms, "km/s",
         1e5, "sqrt(<v^2>) over volume");
  number("velocity_rms_mass", std::sqrt(sums[mass_velocity_squared].value() / total_mass) * kms,
         "km/s", 1e5, "sqrt(<v^2>) over mass");
  number("sonic_mach_volume", std::sqrt(sums[sonic_squared].value() / cells), "1", 1.0,
         "sqrt(<v^2 / c_s^2>) over volume, c_s^2 = gamma p / rho");
  number("sonic_mach_mass", std::sqrt(sums[mass_sonic_squared].value() / total_mass), "1", 1.0,
         "sqrt(<v^2 / c_s^2>) over mass");
  if (context.magnetic) {
    number("alfven_mach_volume", std::sqrt(sums[alfven_squared].value() / cells), "1", 1.0,
           "sqrt(<v^2 / v_A^2>) over volume, v_A^2 = B^2 / 4 pi rho");
    number("alfven_mach_mass", std::sqrt(sums[mass_alfven_squared].value() / total_mass), "1", 1.0,
           "sqrt(<v^2 / v_A^2>) over mass");
  }
  const char* phase_names[3] = {"cold", "unstable", "warm"};
  for (int p = 0; p < 3; ++p) {
    const std::string v = std::string(phase_names[p]) + "_volume_fraction";
    const std::string w = std::string(phase_names[p]) + "_mass_fraction";
    m.numbers.push_back({v, sums[cold_volume + p].value() / cells, "1", 1.0,
                         std::string("Volume fraction of ") + phase_names[p] + " gas"});
    m.numbers.push_back({w, sums[cold_mass + p].value() / total_mass, "1", 1.0,
                         std::string("Mass fraction of ") + phase_names[p] + " gas"});
  }
  number("cold_below", phases_.cold_below, "K", 1.0, "Phase boundary: cold gas is colder");
  number("warm_above", phases_.warm_above, "K", 1.0, "Phase boundary: warm gas is hotter");
  const double per_cm3 = u.density * number_density;
  number("number_density_min", extremes[0] * per_cm3, "cm^-3", 1.0, "Lowest n = rho / (mu m_H)");
  number("number_density_max", -extremes[2] * per_cm3, "cm^-3", 1.0, "Highest n");
  number("temperature_min", extremes[1], "K", 1.0, "Lowest temperature");
  number("temperature_max", -extremes[3], "K", 1.0, "Highest temperature");
  return m;
}

}  // namespace brume::physics
