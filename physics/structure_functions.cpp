#include "physics/structure_functions.hpp"

#include <algorithm>
#include <climits>
#include <cmath>
#include <limits>
#include <string>
#include <vector>

#include "physics/structure_fit.hpp"
#include "physics/structure_lags.hpp"
#include "physics/structure_pencils.hpp"
#include "physics/structure_sums.hpp"

namespace brume::physics {

namespace {

constexpr double nan = std::numeric_limits<double>::quiet_NaN();

// A series over the lags: its value for the whole box (mean or pooled over the axes, [lags]) and
// per axis ([3][lags]), as indices into the measurement's arrays.
struct AxisSeries {
  std::size_t whole;
  std::size_t per_axis;
};

AxisSeries add_series(io::Measurement& m, const std::string& name, const std::string& unit,
                      double to_cgs, const std::string& description, const std::string& whole,
                      std::size_t lags) {
  io::add_array(m, name, unit, to_cgs, description + ", " + whole, {lags});
  io::add_array(m, name + "_per_axis", unit, to_cgs, description + ", per axis (x, y, z)",
                {3, lags});
  return {m.arrays.size() - 2, m.arrays.size() - 1};
}

// (cm/s)^p.
std::string velocity_power_unit(int p) {
  if (p == 1) return "cm/s";
  return "cm^" + std::to_string(p) + " s^-" + std::to_string(p);
}

void note_conventions(io::Measurement& m, const StructureSettings& s,
                      const std::vector<long>& lags) {
  m.notes.emplace_back(
      "increments",
      "dv = v(x + l e_d) - v(x), an exact periodic shift by l cells along axis d (no "
      "interpolation); every cell starts one pair per lag and axis");
  m.notes.emplace_back(
      "averages",
      "S_p = <|dv|^p> over all cells (volume weighted); longitudinal: dv of v_d; transverse: "
      "dv of the two other components, averaged over both; the axis mean is over the axes "
      "with more than one cell");
  m.notes.emplace_back("flux_third_order",
                       "<d(rho v_d) |dv|^2>, signed, |dv|^2 = sum over the three components");
  m.notes.emplace_back("cold_velocity_dispersion",
                       "sqrt(<|dv|^2>) over the pairs whose two cells are both colder than "
                       "cold_temperature (three components); pooled over the axes");
  m.notes.emplace_back("cold_threshold", s.cold_origin);
  m.notes.emplace_back(
      "lag_set",
      std::string(s.lag_set == StructureLagSet::every_cell
                      ? "every_cell"
                      : "logarithmic, " + std::to_string(s.lags_per_octave) + " per octave") +
          ", " + std::to_string(lags.size()) + " lags");
  m.notes.emplace_back("size_linewidth_fit",
                       "least squares of ln sigma against ln l over lags " +
                           std::to_string(s.fit_lowest_lag) + " to " +
                           std::to_string(s.fit_highest_lag) + " cells with at least " +
                           std::to_string(s.minimum_cold_pairs) +
                           " cold pairs; the points are correlated, the error is the formal one");
}

// σ ∝ ℓ^b of the cold gas, the size–linewidth relation of Larson 1981, MNRAS 194, 809, eq. 1
// (equation number from memory), fitted in ln–ln.
void fit_size_linewidth(io::Measurement& m, const StructureSettings& s,
                        const std::vector<long>& lags, const std::vector<double>& sigma,
                        const std::vector<long long>& pairs) {
  std::vector<double> x, y;
  for (std::size_t l = 0; l < lags.size(); ++l) {
    if (lags[l] < s.fit_lowest_lag || lags[l] > s.fit_highest_lag) continue;
    if (pairs[l] < s.minimum_cold_pairs || !(sigma[l] > 0.0)) continue;
    x.push_back(std::log(double(lags[l])));
    y.push_back(std::log(sigma[l]));
  }
  const SlopeFit fit = least_squares_slope(x, y);
  m.numbers.push_back({"size_linewidth_slope", fit.slope, "1", 1.0,
                       "d ln sigma / d ln l of the cold-gas velocity dispersion"});
  m.numbers.push_back({"size_linewidth_slope_error", fit.error, "1", 1.0,
                       "standard error of the slope (least squares)"});
  m.numbers.push_back(
      {"size_linewidth_fit_lags", double(fit.points), "1", 1.0, "lags used in the fit"});
  if (fit.points < 3) {
    m.warnings.push_back("size-linewidth slope not meaningful: " + std::to_string(fit.points) +
                         " lags in [" + std::to_string(s.fit_lowest_lag) + ", " +
                         std::to_string(s.fit_highest_lag) + "] cells have at least " +
                         std::to_string(s.minimum_cold_pairs) + " cold pairs (3 needed)");
  }
}

}  // namespace

io::Measurement StructureFunctions::measure(const CellQuantities& q,
                                            const RunContext& context) const {
  const StructureSettings& s = settings_;
  io::Measurement m;
  m.name = name();
  m.description = "velocity structure functions, flux-based third order, cold-gas dispersion";
  std::array<bool, 3> active{};
  long half = LONG_MAX;
  int active_count = 0;
  for (std::size_t d = 0; d < 3; ++d) {
    active[d] = q.box_cells[d] > 1;
    if (active[d]) {
      half = std::min(half, q.box_cells[d] / 2);
      ++active_count;
    }
  }
  const std::vector<long> lags =
      structure_lags(s.lag_set, s.lags_per_octave, active_count > 0 ? half : 0);
  note_conventions(m, s, lags);
  m.numbers.push_back(
      {"cold_temperature", s.cold_temperature, "K", 1.0, "cold gas lies below this temperature"});
  if (!s.periodic_box) {
    m.warnings.push_back(
        "structure functions: the box is not periodic on every face, but the shifts wrap "
        "around it; pairs across the boundary are not neighbours");
  }
  if (lags.empty()) {
    m.warnings.push_back("structure functions: no axis has two cells or more, no lag to measure");
    return m;
  }
  const std::size_t n_lags = lags.size();

  std::vector<StructureSums> sums(3, StructureSums(s.max_order, n_lags));
  const std::vector<double> cold = cold_cells(q, s.cold_temperature);
  PencilBuffers buffers;
  StructurePencils pencils;
  for (int d = 0; d < 3; ++d) {
    if (!active[std::size_t(d)]) continue;
    gather_pencils(q, d, cold, context.comm, buffers, pencils);
    sums[std::size_t(d)].add(pencils, lags);
    sums[std::size_t(d)].combine(context.comm);
  }

  const double box_cells = double(q.box_cells[0]) * double(q.box_cells[1]) * double(q.box_cells[2]);
  const units::CodeUnits& u = context.code_units;
  io::MeasuredArray& lag_cells = io::add_array(m, "lag_cells", "1", 1.0, "lag in cells", {n_lags});
  for (std::size_t l = 0; l < n_lags; ++l)
    lag_cells.values[l] = double(lags[l]);
  io::MeasuredArray& lag_length = io::add_array(
      m, "lag_length", "cm", u.length, "lag along x, y, z (cells times spacing)", {3, n_lags});
  for (std::size_t d = 0; d < 3; ++d) {
    for (std::size_t l = 0; l < n_lags; ++l)
      lag_length.values[d * n_lags + l] = double(lags[l]) * q.spacing[d];
  }
  if (active_count > 1) {
    double lowest = std::numeric_limits<double>::infinity(), highest = 0.0;
    for (std::size_t d = 0; d < 3; ++d) {
      if (!active[d]) continue;
      lowest = std::min(lowest, q.spacing[d]);
      highest = std::max(highest, q.spacing[d]);
    }
    if (highest != lowest) {
      m.warnings.push_back(
          "structure functions: the cell spacing differs between axes, so the axis means mix "
          "different lengths at one lag in cells");
    }
  }

  // Fills one series from a per-axis value, and its mean over the active axes.
  const auto fill = [&](AxisSeries series, auto&& value) {
    std::vector<double>& per_axis = m.arrays[series.per_axis].values;
    std::vector<double>& whole = m.arrays[series.whole].values;
    for (std::size_t l = 0; l < n_lags; ++l) {
      double total = 0.0;
      for (std::size_t d = 0; d < 3; ++d) {
        const double v = active[d] ? value(sums[d], l) : nan;
        per_axis[d * n_lags + l] = v;
        if (active[d]) total += v;
      }
      whole[l] = total / double(active_count);
    }
  };
  const std::string mean = "mean over the axes";
  for (int p = 1; p <= s.max_order; ++p) {
    const std::string unit = velocity_power_unit(p);
    const double to_cgs = std::pow(u.velocity, p);
    fill(add_series(m, "longitudinal_order_" + std::to_string(p), unit, to_cgs,
                    "S_" + std::to_string(p) + " = <|dv_d|^" + std::to_string(p) +
                        "> of the component along the lag",
                    mean, n_lags),
         [&](const StructureSums& sum, std::size_t l) {
           return sum.longitudinal(l, p) / box_cells;
         });
    fill(add_series(m, "transverse_order_" + std::to_string(p), unit, to_cgs,
                    "S_" + std::to_string(p) + " = <|dv_t|^" + std::to_string(p) +
                        "> of the two components across the lag",
                    mean, n_lags),
         [&](const StructureSums& sum, std::size_t l) {
           return sum.transverse(l, p) / (2.0 * box_cells);
         });
  }
  fill(add_series(m, "flux_third_order", "g s^-3", u.density * std::pow(u.velocity, 3),
                  "<d(rho v_d) |dv|^2>, signed", mean, n_lags),
       [&](const StructureSums& sum, std::size_t l) { return sum.flux(l) / box_cells; });

  // Cold gas: per axis, then pooled over the axes.
  const AxisSeries sigma_series =
      add_series(m, "cold_velocity_dispersion", "cm/s", u.velocity,
                 "sqrt(<|dv|^2>) over pairs of two cold cells", "pooled over the axes", n_lags);
  const AxisSeries count_series = add_series(
      m, "cold_pair_count", "1", 1.0, "pairs of two cold cells", "summed over the axes", n_lags);
  std::vector<double>& sigma = m.arrays[sigma_series.whole].values;
  std::vector<double>& sigma_per_axis = m.arrays[sigma_series.per_axis].values;
  std::vector<double>& count = m.arrays[count_series.whole].values;
  std::vector<double>& count_per_axis = m.arrays[count_series.per_axis].values;
  std::vector<double> pooled_sigma(n_lags, nan);
  std::vector<long long> pooled_pairs(n_lags, 0);
  for (std::size_t l = 0; l < n_lags; ++l) {
    double square = 0.0;
    for (std::size_t d = 0; d < 3; ++d) {
      const long long pairs = active[d] ? sums[d].cold_pairs(l) : 0;
      const double sq = active[d] ? sums[d].cold_square(l) : 0.0;
      count_per_axis[d * n_lags + l] = active[d] ? double(pairs) : nan;
      sigma_per_axis[d * n_lags + l] = pairs > 0 ? std::sqrt(sq / double(pairs)) : nan;
      pooled_pairs[l] += pairs;
      square += sq;
    }
    if (pooled_pairs[l] > 0) pooled_sigma[l] = std::sqrt(square / double(pooled_pairs[l]));
    sigma[l] = pooled_sigma[l];
    count[l] = double(pooled_pairs[l]);
  }
  fit_size_linewidth(m, s, lags, pooled_sigma, pooled_pairs);
  // Summed in code units, stored in cgs: the `unit` of each array is that of its values.
  for (io::MeasuredArray& a : m.arrays) {
    for (double& v : a.values)
      v *= a.to_cgs;
    a.to_cgs = 1.0;
  }
  return m;
}

std::unique_ptr<Diagnostic> make_structure_functions(const config::ResolvedConfig& config,
                                                     const RunContext&) {
  StructureSettings settings = structure_settings(config);
  if (!settings.enabled) return nullptr;
  return std::make_unique<StructureFunctions>(std::move(settings));
}

}  // namespace brume::physics
