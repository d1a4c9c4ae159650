#include "physics/spectra_diagnostic.hpp"

#include <mpi.h>

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>
#include <span>
#include <vector>

#include "physics/spectra_power.hpp"
#include "physics/spectra_shells.hpp"
#include "solver/distributed_fft.hpp"

namespace brume::physics {

struct SpectraDiagnostic::Workspace {
  std::unique_ptr<solver::DistributedFft> fft;
  SpectralShells shells;
  std::vector<double> scratch;  // one derived field on this block
  std::vector<double> weight;   // ρ^p on this block
};

namespace {

// One spectrum being summed: where its shells start in the buffer of local sums.
struct Spectrum {
  std::string name, unit;
  double to_cgs = 1.0;
  std::string description;
  std::size_t start = 0;
};

class Sums {
 public:
  explicit Sums(std::size_t shells) : shells_(shells) {}
  std::span<double> add(std::string name, std::string unit, double to_cgs,
                        std::string description) {
    spectra_.push_back(
        {std::move(name), std::move(unit), to_cgs, std::move(description), values_.size()});
    values_.resize(values_.size() + shells_, 0.0);
    return shells(spectra_.size() - 1);
  }
  std::span<double> shells(std::size_t spectrum) {
    return {values_.data() + spectra_[spectrum].start, shells_};
  }
  std::vector<double>& values() { return values_; }
  [[nodiscard]] const std::vector<Spectrum>& spectra() const { return spectra_; }

 private:
  std::size_t shells_;
  std::vector<Spectrum> spectra_;
  std::vector<double> values_;
};

constexpr const char* parseval =
    "E(k) = (1/2) sum over the modes of shell k of |f_hat|^2 with f_hat = DFT(f)/N (N cells), so "
    "that sum_k E(k) = (1/2) <|f|^2>, the mean over cells of |f|^2 (summed over components)";

// The spectrum of a vector field, one component at a time.
template <class Component>
void add_vector_power(solver::DistributedFft& fft, const SpectralShells& shells,
                      Component&& component, std::span<double> into) {
  for (int d = 0; d < 3; ++d) {
    fft.forward(component(d), 0);
    add_shell_power(shells, fft.coefficients(0), into);
  }
}

// ρ^p (p = 1/2 or 1/3) once per cell, for the three components.
template <bool cube_root>
void fill_weight(const CellQuantities& q, std::vector<double>& weight) {
  const double* rho = q.density.data();
  for (std::size_t c = 0; c < weight.size(); ++c)
    weight[c] = cube_root ? std::cbrt(rho[c]) : std::sqrt(rho[c]);
}

// weight × v_d into `scratch`, unit stride over the block.
std::span<const double> weighted_velocity(const CellQuantities& q, int d,
                                          const std::vector<double>& weight,
                                          std::vector<double>& scratch) {
  const double* v = q.velocity[std::size_t(d)].data();
  for (std::size_t c = 0; c < scratch.size(); ++c)
    scratch[c] = weight[c] * v[c];
  return scratch;
}

}  // namespace

SpectraDiagnostic::SpectraDiagnostic(SpectraFields fields) : fields_(fields) {}
SpectraDiagnostic::~SpectraDiagnostic() = default;

io::Measurement SpectraDiagnostic::measure(const CellQuantities& q,
                                           const RunContext& context) const {
  const MPI_Comm comm = context.comm;
  const int stale_here =
      workspace_ && workspace_->fft->matches(comm, q.box_cells, q.offset, q.cells) ? 0 : 1;
  int stale = 0;
  MPI_Allreduce(&stale_here, &stale, 1, MPI_INT, MPI_MAX, comm);
  if (stale != 0) {
    workspace_.reset();  // the old plan's collectives first, on every rank
    auto w = std::make_unique<Workspace>();
    w->fft = std::make_unique<solver::DistributedFft>(comm, q.box_cells, q.offset, q.cells, 3);
    w->shells = spectral_shells(*w->fft, context.box_size);
    w->scratch.assign(q.size(), 0.0);
    w->weight.assign(q.size(), 0.0);
    workspace_ = std::move(w);
  }
  solver::DistributedFft& fft = *workspace_->fft;
  const SpectralShells& shells = workspace_->shells;
  std::vector<double>& scratch = workspace_->scratch;
  std::vector<double>& weight = workspace_->weight;
  const std::size_t n_shells = shells.shell_count;

  io::Measurement m;
  m.name = "spectra";
  m.description = "Shell-averaged Fourier power spectra (docs/spectra.md)";

  const units::CodeUnits& u = context.code_units;
  const double v2 = u.velocity * u.velocity;
  double lowest_density = q.density.empty() ? std::numeric_limits<double>::infinity()
                                            : *std::min_element(q.density.begin(), q.density.end());
  MPI_Allreduce(MPI_IN_PLACE, &lowest_density, 1, MPI_DOUBLE, MPI_MIN, comm);
  const bool positive = lowest_density > 0.0;
  if (!positive && (fields_.kinetic || fields_.cube_root || fields_.log_density)) {
    m.warnings.push_back("the density is not positive everywhere (minimum " +
                         std::to_string(lowest_density) +
                         "): the spectra of sqrt(rho) v, rho^(1/3) v and ln rho are left out");
  }

  Sums sums(n_shells);
  std::size_t velocity = 0, solenoidal = 0, compressive = 0;
  double mean_flow_here = 0.0;
  if (fields_.velocity) {
    velocity = sums.spectra().size();
    sums.add("velocity_power", "cm^2 s^-2", v2, "E(k) of the velocity v");
    solenoidal = sums.spectra().size();
    sums.add("velocity_solenoidal_power", "cm^2 s^-2", v2,
             "E(k) of the solenoidal (divergence-free) part of v");
    compressive = sums.spectra().size();
    sums.add("velocity_compressive_power", "cm^2 s^-2", v2,
             "E(k) of the compressive (curl-free) part of v");
    for (int d = 0; d < 3; ++d) {
      fft.forward(q.velocity[std::size_t(d)], d);
      add_shell_power(shells, fft.coefficients(d), sums.shells(velocity));
      if (shells.zero_mode >= 0) {
        const std::size_t z = std::size_t(shells.zero_mode);
        mean_flow_here += shells.weight[z] * std::norm(fft.coefficients(d)[z]);
      }
    }
    add_helmholtz_power(shells, {fft.coefficients(0), fft.coefficients(1), fft.coefficients(2)},
                        sums.shells(solenoidal), sums.shells(compressive));
  }
  if (fields_.kinetic && positive) {
    fill_weight<false>(q, weight);
    add_vector_power(
        fft, shells, [&](int d) { return weighted_velocity(q, d, weight, scratch); },
        sums.add("kinetic_energy_power", "erg cm^-3", u.pressure(),
                 "E(k) of sqrt(rho) v: the kinetic energy spectrum"));
  }
  if (fields_.cube_root && positive) {
    fill_weight<true>(q, weight);
    add_vector_power(
        fft, shells, [&](int d) { return weighted_velocity(q, d, weight, scratch); },
        sums.add("cube_root_weighted_velocity_power", "g^(2/3) cm^-2 s^-2",
                 std::cbrt(u.density * u.density) * v2,
                 "E(k) of rho^(1/3) v (Kritsuk et al. 2007, ApJ 665, 416)"));
  }
  const bool magnetic = fields_.magnetic && context.magnetic;
  if (magnetic) {
    add_vector_power(
        fft, shells, [&](int d) { return std::span<const double>(q.field[std::size_t(d)]); },
        sums.add("magnetic_field_power", "erg cm^-3", u.pressure(),
                 "E(k) of the cell-centred B: the magnetic energy spectrum (B^2/(8 pi) in cgs)"));
  }
  if (fields_.density) {
    fft.forward(q.density, 0);
    add_shell_power(
        shells, fft.coefficients(0),
        sums.add("density_power", "g^2 cm^-6", u.density * u.density, "E(k) of the density rho"));
  }
  if (fields_.log_density && positive) {
    for (std::size_t c = 0; c < scratch.size(); ++c)
      scratch[c] = std::log(q.density[c]);
    fft.forward(scratch, 0);
    add_shell_power(shells, fft.coefficients(0),
                    sums.add("log_density_power", "1", 1.0,
                             "E(k) of ln rho, rho in code units (the unit changes only k = 0)"));
  }

  // One reduction for every spectrum and the mean flow (FFT results agree across rank counts
  // to round-off; DESIGN §4 asks no more of them).
  std::vector<double>& values = sums.values();
  values.push_back(mean_flow_here);
  MPI_Allreduce(MPI_IN_PLACE, values.data(), int(values.size()), MPI_DOUBLE, MPI_SUM, comm);
  const double mean_flow = values.back();
  values.pop_back();

  const double fundamental = 2.0 * std::numbers::pi / shells.longest_edge;  // code units
  io::MeasuredArray& k = io::add_array(
      m, "wavenumber", "2pi/L", fundamental / u.length,
      "shell k = floor(|k| L / (2 pi) + 1/2), L the longest box edge: the values are in units "
      "of 2 pi / L; to_cgs turns them into cm^-1",
      {n_shells});
  for (std::size_t s = 0; s < n_shells; ++s)
    k.values[s] = double(s);
  io::MeasuredArray& count =
      io::add_array(m, "mode_count", "1", 1.0,
                    "number of Fourier modes (full spectrum) in each shell", {n_shells});
  for (std::size_t s = 0; s < n_shells; ++s)
    count.values[s] = double(shells.mode_count[s]);
  // Stored in cgs, the unit named (the sums ran in code units).
  for (std::size_t i = 0; i < sums.spectra().size(); ++i) {
    const Spectrum& sp = sums.spectra()[i];
    io::MeasuredArray& a =
        io::add_array(m, sp.name, sp.unit, 1.0, sp.description + "; " + parseval, {n_shells});
    const std::span<double> shell_values = sums.shells(i);
    std::transform(shell_values.begin(), shell_values.end(), a.values.begin(),
                   [&](double v) { return v * sp.to_cgs; });
  }
  add_number(m, "fundamental_wavenumber", fundamental / u.length, "cm^-1", 1.0,
             "2 pi / L, L the longest box edge: the unit of wavenumber");
  if (fields_.velocity) {
    const std::span<double> sol = sums.shells(solenoidal), comp = sums.shells(compressive);
    io::MeasuredArray& ratio = io::add_array(
        m, "velocity_compressive_ratio", "1", 1.0,
        "compressive / (solenoidal + compressive) velocity power in each shell (NaN where both "
        "are 0, as in shell 0 of a cubic box, which holds only the mean flow)",
        {n_shells});
    double total_sol = 0.0, total_comp = 0.0;
    for (std::size_t s = 0; s < n_shells; ++s) {
      const double both = sol[s] + comp[s];
      ratio.values[s] = both > 0.0 ? comp[s] / both : std::numeric_limits<double>::quiet_NaN();
      total_sol += sol[s];
      total_comp += comp[s];
    }
    const double nan = std::numeric_limits<double>::quiet_NaN();
    add_number(m, "velocity_compressive_ratio_total",
               total_sol + total_comp > 0.0 ? total_comp / (total_sol + total_comp) : nan, "1", 1.0,
               "compressive / (solenoidal + compressive) velocity power, all k > 0");
    add_number(m, "velocity_compressive_to_solenoidal",
               total_sol > 0.0 ? total_comp / total_sol : nan, "1", 1.0,
               "compressive / solenoidal velocity power, all k > 0");
    add_number(m, "velocity_mean_flow_power", mean_flow * v2, "cm^2 s^-2", 1.0,
               "(1/2) |<v>|^2: the k = 0 power, in velocity_power but in neither part");
  }
  if (fields_.magnetic && !context.magnetic) {
    m.notes.emplace_back("magnetic_field", "left out: the run is hydrodynamic");
  }
  m.notes.emplace_back("normalization", parseval);
  m.notes.emplace_back(
      "shells",
      "k_d = n_d L / L_d for the integer DFT index n_d along axis d (integers in a cubic box); "
      "shells above the smallest N_d/2 are only partly filled (corners of the k cube)");
  m.notes.emplace_back(
      "helmholtz",
      "projection in Fourier space: compressive part k (k.v)/|k|^2, solenoidal part the rest; "
      "k = 0 in neither; a Nyquist component (even axis, index N/2) is averaged over its two "
      "signs");
  m.notes.emplace_back("methods",
                       "Helmholtz projection: common practice; rho^(1/3) v: Kritsuk et al. "
                       "2007, ApJ 665, 416; sqrt(rho) v: kinetic energy spectrum");
  return m;
}

std::unique_ptr<Diagnostic> make_spectra(const config::ResolvedConfig& config,
                                         const RunContext& context) {
  (void)context;
  const SpectraSettings settings = spectra_settings(config);
  if (!settings.enabled) return nullptr;
  return std::make_unique<SpectraDiagnostic>(settings.fields);
}

}  // namespace brume::physics
