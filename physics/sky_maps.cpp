#include "physics/sky_maps.hpp"

#include <mpi.h>

#include <algorithm>
#include <array>
#include <cmath>
#include <numbers>
#include <string>

#include "physics/sky_column_sums.hpp"
#include "physics/sky_eb_spectra.hpp"
#include "physics/sky_power_law.hpp"
#include "physics/sky_stokes.hpp"
#include "physics/sky_wavenumber_bins.hpp"
#include "solver/units/constants.hpp"

namespace brume::physics {

namespace {

constexpr const char* angle_convention =
    "IAU: projected along a, the map axes are (u, v) = (y, z), (z, x), (x, y) for a = x, y, z "
    "(u x v = a); the observer sits at +infinity on a looking towards -a, north is +v and east "
    "is -u. psi = 0.5 atan2(U, Q) is the polarization angle from north through east, in "
    "(-90, 90] degrees; Q > 0 is polarization along v. The HEALPix/COSMO convention has the "
    "opposite sign of U. field_angle = psi + 90 degrees (wrapped) is the plane-of-sky field "
    "orientation. The wavevector angle of the E/B decomposition is measured the same way.";

constexpr const char* map_layout =
    "Maps are [v][u], u fastest: along x [z][y], along y [x][z], along z [y][x] (the snapshot's "
    "density [z][y][x] summed over axis 2, 1 (then transposed) and 0).";

// Spectra of one map, computed on rank 0 and sent to every rank, so all ranks hold the same bits.
SkySpectra spectra_on_every_rank(const SkyStokesMaps& m, double area, MPI_Comm comm) {
  int rank = 0;
  MPI_Comm_rank(comm, &rank);
  SkySpectra s;
  if (rank == 0) s = sky_spectra(m.geometry, m.i, m.q, m.u, area);
  long annuli = long(s.wavenumber.size());
  MPI_Bcast(&annuli, 1, MPI_LONG, 0, comm);
  std::vector<double> packed(6 * std::size_t(annuli));
  auto arrays = [&s] {
    return std::array<std::vector<double>*, 6>{&s.wavenumber, &s.modes, &s.tt, &s.ee, &s.bb, &s.te};
  };
  if (rank == 0) {
    std::size_t at = 0;
    for (std::vector<double>* a : arrays()) {
      std::copy(a->begin(), a->end(), packed.begin() + std::ptrdiff_t(at));
      at += a->size();
    }
  }
  MPI_Bcast(packed.data(), int(packed.size()), MPI_DOUBLE, 0, comm);
  std::size_t at = 0;
  for (std::vector<double>* a : arrays()) {
    a->assign(packed.begin() + std::ptrdiff_t(at),
              packed.begin() + std::ptrdiff_t(at + std::size_t(annuli)));
    at += std::size_t(annuli);
  }
  return s;
}

void add_map(io::Measurement& out, const std::string& name, const std::string& unit, double to_cgs,
             const std::string& description, const SkyMapGeometry& g,
             const std::vector<double>& values) {
  io::MeasuredArray& a = io::add_array(out, name, unit, to_cgs, description,
                                       {std::size_t(g.cells_v), std::size_t(g.cells_u)});
  a.values = values;
}

void add_curve(io::Measurement& out, const std::string& name, const std::string& unit,
               const std::string& description, const std::vector<double>& values) {
  io::MeasuredArray& a = io::add_array(out, name, unit, 1.0, description, {values.size()});
  a.values = values;
}

void add_number(io::Measurement& out, const std::string& name, double value,
                const std::string& description) {
  io::add_number(out, name, value, "1", 1.0, description);
}

}  // namespace

io::Measurement SkyMaps::measure(const CellQuantities& cells, const RunContext& context) const {
  io::Measurement out;
  out.name = name();
  out.description =
      "Column density and optically thin dust-polarization maps with their E/B spectra";
  const double deg = std::numbers::pi / 180.0;
  const units::CodeUnits& cu = context.code_units;
  const double per_particle =
      cu.density * cu.length / (context.mean_molecular_weight * units::cgs::hydrogen_mass);
  for (const int a : settings_.axes) {
    const std::string along = "_along_" + axis_letter(a);
    const std::string seen = " (line of sight " + axis_letter(a) + ")";
    const SkyColumnSums sums = sky_column_sums(cells, context, a, settings_.density_cut);
    const SkyStokesMaps m =
        sky_stokes_maps(sums, settings_, cells.spacing[std::size_t(a)] * per_particle);
    const SkyMapGeometry& g = m.geometry;
    add_map(out, "column_density" + along, "cm^-2", 1.0,
            "N = sum of n ds, n = rho / (mu m_H)" + seen, g, m.column_density);
    add_map(out, "stokes_i" + along, "cm^-2", 1.0, "Stokes I in units of the column density" + seen,
            g, m.i);
    add_map(out, "stokes_q" + along, "cm^-2", 1.0,
            "Stokes Q in units of the column density (IAU)" + seen, g, m.q);
    add_map(out, "stokes_u" + along, "cm^-2", 1.0,
            "Stokes U in units of the column density (IAU)" + seen, g, m.u);
    add_map(out, "polarization_fraction" + along, "1", 1.0,
            "p = sqrt(Q^2 + U^2) / I (0 where I = 0)" + seen, g, m.fraction);
    add_map(out, "polarization_angle" + along, "deg", deg,
            "psi = atan2(U, Q) / 2 from north through east (0 where I = 0)" + seen, g, m.angle);
    add_map(out, "field_angle" + along, "deg", deg,
            "plane-of-sky field orientation psi + 90 deg, wrapped into (-90, 90]" + seen, g,
            m.field_angle);

    const double area = g.size_u * g.size_v * cu.length * cu.length;  // cm²
    const SkySpectra s = spectra_on_every_rank(m, area, context.comm);
    if (s.wavenumber.empty()) {
      out.notes.emplace_back("spectra" + along, "none: the map (" + std::to_string(g.cells_u) +
                                                    " x " + std::to_string(g.cells_v) +
                                                    " cells) holds no full annulus");
      continue;
    }
    add_curve(out, "spectrum_wavenumber" + along, "1",
              "mean wavenumber of each annulus, units of 2 pi / L (L: longer map edge)" + seen,
              s.wavenumber);
    add_curve(out, "spectrum_modes" + along, "1", "Fourier modes in each annulus" + seen, s.modes);
    const std::string norm = ": <Re X Y*> A / (N_u N_v)^2, X the DFT of the map, A its area";
    add_curve(out, "spectrum_tt" + along, "cm^-2", "TT (T = I)" + norm + seen, s.tt);
    add_curve(out, "spectrum_ee" + along, "cm^-2", "EE" + norm + seen, s.ee);
    add_curve(out, "spectrum_bb" + along, "cm^-2", "BB" + norm + seen, s.bb);
    add_curve(out, "spectrum_te" + along, "cm^-2", "TE" + norm + seen, s.te);

    const long largest = sky_largest_annulus(g);
    SkyFitRange range{settings_.fit_lowest, settings_.fit_highest > 0.0
                                                ? std::min(settings_.fit_highest, double(largest))
                                                : std::floor(0.5 * double(largest))};
    const SkyPowerLaw tt = sky_power_law(s.wavenumber, s.tt, range);
    const SkyPowerLaw ee = sky_power_law(s.wavenumber, s.ee, range);
    const SkyPowerLaw bb = sky_power_law(s.wavenumber, s.bb, range);
    const double ratio = sky_bb_over_ee(s.wavenumber, s.modes, s.ee, s.bb, range);
    add_number(out, "fit_lowest" + along, range.lowest, "lowest annulus of the fits" + seen);
    add_number(out, "fit_highest" + along, range.highest, "highest annulus of the fits" + seen);
    add_number(out, "slope_tt" + along, tt.slope, "least-squares slope of ln TT vs ln k" + seen);
    add_number(out, "slope_ee" + along, ee.slope, "least-squares slope of ln EE vs ln k" + seen);
    add_number(out, "slope_bb" + along, bb.slope, "least-squares slope of ln BB vs ln k" + seen);
    add_number(out, "bb_over_ee" + along, ratio,
               "sum of |B|^2 over sum of |E|^2, modes of the fit range" + seen);
    if (sky_annuli_in_range(s.wavenumber, range) < 2) {
      out.warnings.push_back("along " + axis_letter(a) + ": the fit range [" +
                             std::to_string(range.lowest) + ", " + std::to_string(range.highest) +
                             "] holds fewer than two annuli: the slopes are NaN");
    }
  }
  add_number(out, "polarization_fraction", settings_.polarization_fraction,
             "intrinsic polarization fraction p0 (a parameter of the model, not a prediction)");
  out.numbers.push_back(io::MeasuredNumber{"density_cut", settings_.number_density_cut, "cm^-3",
                                           1.0, "gas denser than this left out (0: none)"});
  out.notes.emplace_back("angle_convention", angle_convention);
  out.notes.emplace_back("map_layout", map_layout);
  out.notes.emplace_back(
      "intensity", settings_.intensity == SkyIntensity::column
                       ? "column: I = sum of n ds (a field in the plane of the sky gives p = p0)"
                       : "alignment_corrected: I = sum of n [1 - p0 (cos^2 gamma - 2/3)] ds");
  out.notes.emplace_back("model",
                         "optically thin dust emission, uniform grain temperature and "
                         "emissivity per particle, constant p0 (Planck Collaboration Int. XX "
                         "2015, eqs. 5-7); p0 is a parameter, not a prediction");
  if (!context.magnetic) {
    out.notes.emplace_back("polarization", "none: the run has no magnetic field, Q = U = 0");
  }
  return out;
}

std::unique_ptr<Diagnostic> make_sky_maps(const config::ResolvedConfig& config,
                                          const RunContext& context) {
  return std::make_unique<SkyMaps>(sky_settings(config, context));
}

}  // namespace brume::physics
