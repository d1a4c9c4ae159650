#include "physics/jeans_diagnostic.hpp"

#include <mpi.h>

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>
#include <string>

#include "io/config/number_text.hpp"
#include "physics/distributions_histogram.hpp"
#include "physics/jeans_star_formation.hpp"
#include "solver/exact_sum.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics {

namespace cgs = units::cgs;

namespace {

// Box sums of pass 1 (code units), exact in any order.
struct BoxMoments {
  double cells = 0.0;
  double mass = 0.0;           // Σρ
  double momentum[3] = {};     // Σρv
  double twice_kinetic = 0.0;  // Σρv²
  double pressure = 0.0;       // Σp
  double magnetic = 0.0;       // ΣB²/2
};

BoxMoments box_moments(const CellQuantities& q, MPI_Comm comm) {
  solver::ExactSum mass, momentum[3], kinetic, pressure, magnetic;
  for (std::size_t c = 0; c < q.size(); ++c) {
    const double rho = q.density[c];
    double v2 = 0.0, b2 = 0.0;
    for (int d = 0; d < 3; ++d) {
      const double v = q.velocity[std::size_t(d)][c];
      const double b = q.field[std::size_t(d)][c];
      momentum[d].add(rho * v);
      v2 += v * v;
      b2 += b * b;
    }
    mass.add(rho);
    kinetic.add(rho * v2);
    pressure.add(q.pressure[c]);
    magnetic.add(0.5 * b2);
  }
  long cells = long(q.size());
  MPI_Allreduce(MPI_IN_PLACE, &cells, 1, MPI_LONG, MPI_SUM, comm);
  BoxMoments m;
  m.cells = double(cells);
  for (solver::ExactSum* s :
       {&mass, &momentum[0], &momentum[1], &momentum[2], &kinetic, &pressure, &magnetic}) {
    s->combine(comm);
  }
  m.mass = mass.value();
  for (int d = 0; d < 3; ++d)
    m.momentum[d] = momentum[d].value();
  m.twice_kinetic = kinetic.value();
  m.pressure = pressure.value();
  m.magnetic = magnetic.value();
  return m;
}

// Pass 2 tallies: slot 0 where the criterion holds, slot 1 elsewhere.
struct Pass2 {
  HistogramTally contrast, below_length, below_truelove, above_critical;
  double smallest_jeans_squared = std::numeric_limits<double>::infinity();
};

struct Pass2Inputs {
  double mean_density = 1.0;
  double gravity = 1.0;           // G in code units
  double length_squared = 0.0;    // chosen resolution length²
  double truelove_squared = 0.0;  // (4 Δx)²
  double critical_density = 0.0;  // ρ_crit = ρ̄ e^{s_crit}, code units (∞: none)
};

// λ_J² = π c² / (G ρ), c² = p/ρ, plus v_A² = B²/ρ with MagneticSupport (code units: B²/2 is the
// magnetic pressure). Jeans 1902, Phil. Trans. R. Soc. A 199, 1 (from memory); the magnetosonic
// variant: common practice, no source.
template <bool MagneticSupport>
void tally_cells(const CellQuantities& q, const LogBins& contrast_bins, const Pass2Inputs& in,
                 Pass2& t) {
  const LogBinner contrast(contrast_bins);
  const double inverse_mean = 1.0 / in.mean_density;
  const double pi_over_g = std::numbers::pi / in.gravity;
  double smallest = t.smallest_jeans_squared;
  for (std::size_t c = 0; c < q.size(); ++c) {
    const double rho = q.density[c];
    double c2 = q.pressure[c];
    if constexpr (MagneticSupport) {
      c2 += q.field[0][c] * q.field[0][c] + q.field[1][c] * q.field[1][c] +
            q.field[2][c] * q.field[2][c];
    }
    c2 /= rho;
    const double jeans_squared = pi_over_g * c2 / rho;
    smallest = std::min(smallest, jeans_squared);
    t.contrast.add(contrast.slot(rho * inverse_mean), rho);
    t.below_length.add(jeans_squared < in.length_squared ? 0 : 1, rho);
    t.below_truelove.add(jeans_squared < in.truelove_squared ? 0 : 1, rho);
    t.above_critical.add(rho > in.critical_density ? 0 : 1, rho);
  }
  t.smallest_jeans_squared = smallest;
}

std::string percent(double fraction) {
  return config::format_digits(100.0 * fraction, 3) + " %";
}

}  // namespace

io::Measurement JeansDiagnostic::measure(const CellQuantities& cells,
                                         const RunContext& context) const {
  const JeansSettings& s = settings_;
  const units::CodeUnits& u = context.code_units;
  const double gravity = cgs::gravitational_constant * u.density * u.time() * u.time();

  // Pass 1: the box's mean density, velocity dispersion, sound speed and plasma beta.
  const BoxMoments b = box_moments(cells, context.comm);
  const double mean_density = b.mass / b.cells;
  double mean_velocity2 = 0.0;
  for (const double p : b.momentum)
    mean_velocity2 += (p / b.mass) * (p / b.mass);
  const double dispersion2 = b.twice_kinetic / b.mass - mean_velocity2;  // mass-weighted, 3D
  const double sound2 = b.pressure / b.mass;  // mass-weighted mean of c_s² = p/ρ
  const double mach = std::sqrt(dispersion2 / sound2);
  const double box_length =
      std::cbrt(context.box_size[0] * context.box_size[1] * context.box_size[2]);
  const double virial = box_virial_parameter(dispersion2, gravity, mean_density, box_length);
  const double beta = context.magnetic && b.magnetic > 0.0
                          ? b.pressure / b.magnetic
                          : std::numeric_limits<double>::infinity();
  const double s_crit = km_critical_log_density(s.critical_density_factor, virial, mach, beta);

  // The resolution lengths: from the largest cell width of the axes with more than one cell.
  double cell_width = 0.0;
  for (std::size_t d = 0; d < 3; ++d) {
    if (context.box_cells[d] > 1) cell_width = std::max(cell_width, cells.spacing[d]);
  }
  const double length = s.length > 0.0 ? s.length / u.length : s.cells * cell_width;
  const double truelove = 4.0 * cell_width;

  // Pass 2: the PDF of s, the Jeans fractions and the gas above the critical density.
  const ExponentWindow window = global_exponent_window(cells.density, context.comm);
  const LogBins contrast_bins{s.pdf_bins, std::exp(s.pdf_lowest), std::exp(s.pdf_highest)};
  Pass2 t{HistogramTally(contrast_bins.slots(), window), HistogramTally(2, window),
          HistogramTally(2, window), HistogramTally(2, window)};
  const Pass2Inputs in{mean_density, gravity, length * length, truelove * truelove,
                       std::isnan(s_crit) ? std::numeric_limits<double>::infinity()
                                          : mean_density * std::exp(s_crit)};
  const bool magnetic_support = s.magnetic_support && context.magnetic;
  if (magnetic_support) {
    tally_cells<true>(cells, contrast_bins, in, t);
  } else {
    tally_cells<false>(cells, contrast_bins, in, t);
  }
  for (HistogramTally* h : {&t.contrast, &t.below_length, &t.below_truelove, &t.above_critical})
    h->combine(context.comm);
  double smallest = t.smallest_jeans_squared;
  MPI_Allreduce(MPI_IN_PLACE, &smallest, 1, MPI_DOUBLE, MPI_MIN, context.comm);
  const double smallest_jeans = std::sqrt(smallest);

  std::vector<double> pdf(s.pdf_bins);
  for (std::size_t k = 0; k < s.pdf_bins; ++k)
    pdf[k] = t.contrast.volume_fraction(k);
  const double integral = std::isnan(s_crit)
                              ? std::numeric_limits<double>::quiet_NaN()
                              : multi_free_fall_integral(pdf, s.pdf_lowest, s.pdf_highest, s_crit);
  const double rate = s.efficiency / s.time_factor * integral;

  io::Measurement m;
  m.name = name();
  m.description =
      "Jeans resolution and multi-free-fall star-formation rate per free-fall time "
      "(docs/jeans.md)";
  write_histogram(m, "density_contrast",
                  {"density_contrast", contrast_bins, "1", 1.0,
                   "density contrast rho/mean rho (bins of equal width in s = ln(rho/mean rho))"},
                  t.contrast);
  const double pc = cgs::parsec / u.length;  // code lengths per parsec
  add_number(m, "resolution_length", length / pc, "pc", cgs::parsec,
             "Resolution length the Jeans length is compared with");
  add_number(m, "truelove_length", truelove / pc, "pc", cgs::parsec,
             "Four cell widths (Truelove et al. 1997, ApJ 489, L179)");
  add_number(m, "volume_fraction_below_length", t.below_length.volume_fraction(0), "1", 1.0,
             "Volume fraction with Jeans length below resolution_length");
  add_number(m, "mass_fraction_below_length", t.below_length.mass_fraction(0), "1", 1.0,
             "Mass fraction with Jeans length below resolution_length");
  add_number(m, "volume_fraction_below_truelove", t.below_truelove.volume_fraction(0), "1", 1.0,
             "Volume fraction with Jeans length below 4 cells");
  add_number(m, "mass_fraction_below_truelove", t.below_truelove.mass_fraction(0), "1", 1.0,
             "Mass fraction with Jeans length below 4 cells");
  add_number(m, "smallest_jeans_length", smallest_jeans / pc, "pc", cgs::parsec,
             "Smallest Jeans length of any cell");
  add_number(m, "smallest_jeans_length_cells", smallest_jeans / cell_width, "1", 1.0,
             "Smallest Jeans length of any cell in cell widths");
  add_number(m, "mean_density", mean_density, "g cm^-3", u.density, "Mean density of the box");
  add_number(m, "mach_number", mach, "1", 1.0,
             "3D mass-weighted velocity dispersion over the mass-weighted rms isothermal sound "
             "speed sqrt(sum p / sum rho)");
  add_number(m, "virial_parameter", virial, "1", 1.0, "5 sigma_v^2 / (pi G mean_rho L^2)");
  add_number(m, "plasma_beta", beta, "1", 1.0,
             "Mean thermal over mean magnetic pressure (inf without a field)");
  add_number(m, "critical_log_density", s_crit, "1", 1.0,
             "s_crit = ln[(pi^2/5) phi_x^2 alpha_vir M^2 / (1 + 1/beta)] (KM)");
  add_number(m, "critical_number_density",
             mean_density * std::exp(s_crit) * u.density /
                 (context.mean_molecular_weight * cgs::hydrogen_mass),
             "cm^-3", 1.0, "n_crit = mean n exp(s_crit)");
  add_number(m, "volume_fraction_above_critical", t.above_critical.volume_fraction(0), "1", 1.0,
             "Volume fraction denser than the critical density");
  add_number(m, "mass_fraction_above_critical", t.above_critical.mass_fraction(0), "1", 1.0,
             "Mass fraction denser than the critical density");
  add_number(m, "multi_free_fall_integral", integral, "1", 1.0,
             "Integral from s_crit of exp(3s/2) p(s) ds over the binned volume-weighted PDF");
  add_number(m, "star_formation_rate_per_free_fall", rate, "1", 1.0,
             "SFR_ff = (epsilon/phi_t) x multi_free_fall_integral");
  add_number(m, "efficiency", s.efficiency, "1", 1.0, "epsilon");
  add_number(m, "time_factor", s.time_factor, "1", 1.0, "phi_t");
  add_number(m, "critical_density_factor", s.critical_density_factor, "1", 1.0, "phi_x");

  m.notes.emplace_back(
      "jeans_length",
      magnetic_support
          ? "lambda_J = sqrt(pi (c_s^2 + v_A^2) / (G rho)), c_s^2 = p/rho (isothermal sound "
            "speed), "
            "v_A^2 = B^2/rho (magnetic support)"
          : "lambda_J = sqrt(pi c_s^2 / (G rho)), c_s^2 = p/rho (isothermal sound speed, thermal "
            "support only)");
  if (s.magnetic_support && !context.magnetic) {
    m.notes.emplace_back("magnetic_support", "requested, but the gas is not magnetized");
  }
  m.notes.emplace_back(
      "star_formation_model",
      "multi-free-fall KM (Federrath & Klessen 2012, ApJ 761, 156, Table 1; from memory): "
      "SFR_ff = (epsilon/phi_t) integral_{s_crit}^inf exp(3s/2) p_V(s) ds on the binned "
      "volume-weighted PDF of s = ln(rho/mean rho); s_crit = ln[(pi^2/5) phi_x^2 alpha_vir M^2 / "
      "(1 + 1/beta)] (Krumholz & McKee 2005, ApJ 630, 250); alpha_vir = 5 sigma_v^2/(pi G "
      "mean_rho L^2), L the cube root of the box volume");

  m.warnings.emplace_back(
      "brume has no self-gravity: star_formation_rate_per_free_fall is an estimate from the "
      "density PDF only, not a measured collapse");
  const double unresolved = t.below_truelove.mass_fraction(0);
  if (t.below_truelove.count(0) > 0) {
    m.warnings.push_back("UNDER-RESOLVED: " + percent(unresolved) + " of the mass (" +
                         percent(t.below_truelove.volume_fraction(0)) +
                         " of the volume) has a Jeans length below 4 cells (Truelove et al. "
                         "1997); with self-gravity this gas could fragment artificially");
  }
  if (std::isnan(s_crit)) {
    m.warnings.emplace_back(
        "the critical density is undefined (Mach number or virial parameter zero or not finite): "
        "no star-formation estimate");
  } else if (t.above_critical.count(0) == 0) {
    m.warnings.emplace_back(
        "no gas above the critical density: star_formation_rate_per_free_fall is 0");
  }
  const double outside = t.contrast.volume_fraction(contrast_bins.overflow()) +
                         t.contrast.volume_fraction(contrast_bins.underflow()) +
                         t.contrast.volume_fraction(contrast_bins.undefined());
  if (outside > 0.0) {
    m.warnings.push_back(percent(outside) +
                         " of the volume lies outside the PDF bins (jeans.pdf_lowest, "
                         "jeans.pdf_highest) and is left out of the star-formation integral");
  }
  if (context.box_cells[0] <= 1 || context.box_cells[1] <= 1 || context.box_cells[2] <= 1) {
    m.warnings.emplace_back(
        "the box is not three-dimensional: the virial parameter and Mach number of the critical "
        "density assume a 3D box");
  }
  return m;
}

std::unique_ptr<Diagnostic> make_jeans(const config::ResolvedConfig& config,
                                       const RunContext& context) {
  static_cast<void>(context);
  if (!config.flag("jeans.enabled")) return nullptr;
  return std::make_unique<JeansDiagnostic>(jeans_settings(config));
}

}  // namespace brume::physics
