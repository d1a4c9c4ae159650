#include "physics/distributions_diagnostic.hpp"

#include <cmath>
#include <utility>

#include "physics/distributions_histogram.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics {

namespace cgs = units::cgs;

namespace {

// Factors from code values to the units the bins are in.
struct BinUnits {
  double number_density = 1.0;  // cm^-3 per code density
  double pressure = 1.0;        // K cm^-3 (P/k_B) per code pressure
  double field = 1.0;           // μG per code field
};

struct Tallies {
  HistogramTally density, phase, temperature, beta, ratio, field_density;
};

Tallies empty_tallies(const DistributionsSettings& s, ExponentWindow w, bool magnetic) {
  const std::size_t nd = s.density.count;
  return {HistogramTally(s.density.slots(), w),
          HistogramTally(nd * s.pressure.count + 1, w),
          HistogramTally(s.temperature.slots(), w),
          HistogramTally(magnetic ? s.plasma_beta.slots() : 0, w),
          HistogramTally(magnetic ? s.dynamic_ratio.slots() : 0, w),
          HistogramTally(magnetic ? nd * s.field.count + 1 : 0, w)};
}

// One pass over the cells, unit stride; the magnetic histograms are chosen at compile time.
template <bool Magnetic>
void tally_cells(const CellQuantities& q, const DistributionsSettings& s, const BinUnits& u,
                 Tallies& t) {
  const LogBinner density(s.density), pressure(s.pressure), temperature(s.temperature);
  const LogBinner beta(s.plasma_beta), ratio(s.dynamic_ratio), field(s.field);
  const std::size_t nd = s.density.count, np = s.pressure.count, nb = s.field.count;
  const double* bx = q.field[0].data();
  const double* by = q.field[1].data();
  const double* bz = q.field[2].data();
  for (std::size_t c = 0; c < q.size(); ++c) {
    const double rho = q.density[c];
    const double p = q.pressure[c];
    const std::size_t n_slot = density.slot(rho * u.number_density);
    t.density.add(n_slot, rho);
    t.phase.add(joint_slot(n_slot, pressure.slot(p * u.pressure), nd, np), rho);
    t.temperature.add(temperature.slot(q.temperature[c]), rho);
    if constexpr (Magnetic) {
      const double b2 = bx[c] * bx[c] + by[c] * by[c] + bz[c] * bz[c];
      const double v2 = q.velocity[0][c] * q.velocity[0][c] + q.velocity[1][c] * q.velocity[1][c] +
                        q.velocity[2][c] * q.velocity[2][c];
      t.beta.add(beta.slot(2.0 * p / b2), rho);
      t.ratio.add(ratio.slot(rho * v2 / b2), rho);
      t.field_density.add(joint_slot(n_slot, field.slot(std::sqrt(b2) * u.field), nd, nb), rho);
    }
  }
}

HistogramAxis axis(const char* name, const LogBins& bins, const char* unit, double to_cgs,
                   const char* description) {
  return {name, bins, unit, to_cgs, description};
}

}  // namespace

DistributionsDiagnostic::DistributionsDiagnostic(DistributionsSettings settings,
                                                 std::optional<EquilibriumCurve> curve)
    : settings_(std::move(settings)), curve_(std::move(curve)) {}

io::Measurement DistributionsDiagnostic::measure(const CellQuantities& cells,
                                                 const RunContext& context) const {
  const DistributionsSettings& s = settings_;
  const BinUnits u{
      context.code_units.density / (context.mean_molecular_weight * cgs::hydrogen_mass),
      context.code_units.pressure() / cgs::boltzmann,
      context.code_units.magnetic_field() / cgs::microgauss};
  const ExponentWindow window = global_exponent_window(cells.density, context.comm);
  Tallies t = empty_tallies(s, window, context.magnetic);
  if (context.magnetic) {
    tally_cells<true>(cells, s, u, t);
  } else {
    tally_cells<false>(cells, s, u, t);
  }
  for (HistogramTally* h :
       {&t.density, &t.phase, &t.temperature, &t.beta, &t.ratio, &t.field_density}) {
    h->combine(context.comm);
  }

  io::Measurement m;
  m.name = name();
  m.description =
      "Volume- and mass-weighted PDFs and phase diagrams of the gas (docs/distributions.md)";
  const HistogramAxis n_axis = axis("density", s.density, "cm^-3", 1.0, "number density n");
  const HistogramAxis p_axis =
      axis("pressure", s.pressure, "K cm^-3", cgs::boltzmann, "thermal pressure P/k_B");
  write_histogram(m, "density", n_axis, t.density);
  write_joint_histogram(m, "phase", n_axis, p_axis, t.phase);
  write_histogram(m, "temperature", axis("temperature", s.temperature, "K", 1.0, "temperature T"),
                  t.temperature);
  if (context.magnetic) {
    write_histogram(m, "plasma_beta",
                    axis("plasma_beta", s.plasma_beta, "1", 1.0, "plasma beta 2p/B^2"), t.beta);
    write_histogram(m, "dynamic_ratio",
                    axis("dynamic_ratio", s.dynamic_ratio, "1", 1.0,
                         "dynamic over magnetic pressure rho v^2/B^2"),
                    t.ratio);
    write_joint_histogram(m, "field_density", n_axis,
                          axis("field", s.field, "uG", cgs::microgauss, "field strength |B|"),
                          t.field_density);
  } else {
    m.notes.emplace_back("magnetic_histograms",
                         "none: the gas is not magnetized (plasma beta, dynamic ratio and the "
                         "field-density diagram are not measured)");
  }
  if (curve_) {
    io::add_array(m, "phase_equilibrium_density", "cm^-3", 1.0,
                  "Number densities of the equilibrium curve (density bin centres)",
                  {curve_->density.size()})
        .values = curve_->density;
    io::add_array(m, "phase_equilibrium_pressure", "K cm^-3", cgs::boltzmann,
                  "Thermal-equilibrium pressure P_eq/k_B of the cooling in use, n Lambda(T) = "
                  "Gamma (NaN: no equilibrium within the temperature floor and ceiling)",
                  {curve_->pressure.size()})
        .values = curve_->pressure;
  } else {
    m.notes.emplace_back("equilibrium_curve",
                         "none: cooling is off, so there is no thermal equilibrium to draw");
  }
  m.numbers.push_back({"cells", double(t.density.total_count()), "1", 1.0,
                       "Cells measured (every cell has the same volume)"});
  m.notes.emplace_back(
      "conventions",
      "bins logarithmic; volume weights are cell counts, mass weights the cell densities "
      "(cells of equal volume), both summed exactly; over the bins plus underflow, overflow and "
      "undefined (or outside, for the diagrams) the fractions sum to 1; plasma_beta = 2p/B^2 and "
      "dynamic_ratio = rho v^2/B^2 in code units (magnetic pressure B^2/2)");
  return m;
}

std::unique_ptr<Diagnostic> make_distributions(const config::ResolvedConfig& config,
                                               const RunContext& context) {
  static_cast<void>(context);
  if (!config.flag("distributions.enabled")) return nullptr;
  DistributionsSettings settings = distributions_settings(config);
  std::optional<EquilibriumCurve> curve;
  if (config.flag("cooling.enabled")) {
    curve = equilibrium_curve(cooling_settings(config), settings.density);
  }
  return std::make_unique<DistributionsDiagnostic>(std::move(settings), std::move(curve));
}

}  // namespace brume::physics
