#include "physics/diffusion_operator.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

#include "physics/diffusion_kernels.hpp"

namespace brume::physics {

namespace {

// The diffusivities that set the explicit limit: conduction acts on θ with D = (γ − 1) κ / ρ; a
// longitudinal plane wave of the viscous stress obeys ∂v/∂t = ⁴⁄₃ ν ∂²v, the fastest of its modes;
// the field diffuses with η (common practice, no source).
constexpr double longitudinal_viscous_factor = 4.0 / 3.0;

template <bool Magnetic, bool Energy>
void primitives_of(const solver::State& y, double gamma, const IndexBox& box,
                   std::array<std::vector<double>, 3>& velocity, std::vector<double>& theta) {
  const solver::BlockGeometry& g = y.geometry;
  const double* rho = y.density.data();
  const std::array<const double*, 3> m{y.momentum[0].data(), y.momentum[1].data(),
                                       y.momentum[2].data()};
  const double* e = Energy ? y.energy.data() : nullptr;
  std::array<const double*, 3> b{};
  std::array<std::ptrdiff_t, 3> s{};
  for (int d = 0; d < 3; ++d) {
    if (Magnetic) b[std::size_t(d)] = y.face_field[std::size_t(d)].data();
    s[std::size_t(d)] = g.step(d);
  }
  const std::array<double*, 3> v{velocity[0].data(), velocity[1].data(), velocity[2].data()};
  double* t = theta.data();
  for (int k = box.lower[2]; k < box.upper[2]; ++k) {
    for (int j = box.lower[1]; j < box.upper[1]; ++j) {
      const std::ptrdiff_t row = g.index(box.lower[0], j, k);
      const int n = box.upper[0] - box.lower[0];
      for (int i = 0; i < n; ++i) {
        const std::ptrdiff_t c = row + i;
        const double inverse = 1.0 / rho[c];
        const double vx = m[0][c] * inverse, vy = m[1][c] * inverse, vz = m[2][c] * inverse;
        v[0][c] = vx;
        v[1][c] = vy;
        v[2][c] = vz;
        if constexpr (Energy) {
          double internal = e[c] - 0.5 * (m[0][c] * vx + m[1][c] * vy + m[2][c] * vz);
          if constexpr (Magnetic) {
            const double bx = 0.5 * (b[0][c] + b[0][c + s[0]]);
            const double by = 0.5 * (b[1][c] + b[1][c + s[1]]);
            const double bz = 0.5 * (b[2][c] + b[2][c + s[2]]);
            internal -= 0.5 * (bx * bx + by * by + bz * bz);
          }
          t[c] = (gamma - 1.0) * internal * inverse;
        }
      }
    }
  }
}

// κ(θ) = κ_ref (θ/θ_ref)^a, or κ_ref; θ below zero counts as zero.
template <ConductionLaw Law>
void conductivity_of(const DiffusionCoefficients& k, const solver::BlockGeometry& g,
                     const IndexBox& box, const std::vector<double>& theta,
                     std::vector<double>& kappa) {
  const double* t = theta.data();
  double* out = kappa.data();
  const double inverse_reference = 1.0 / k.reference_theta;
  for (int kk = box.lower[2]; kk < box.upper[2]; ++kk) {
    for (int j = box.lower[1]; j < box.upper[1]; ++j) {
      const std::ptrdiff_t row = g.index(box.lower[0], j, kk);
      const int n = box.upper[0] - box.lower[0];
      for (int i = 0; i < n; ++i) {
        const std::ptrdiff_t c = row + i;
        if constexpr (Law == ConductionLaw::power_law) {
          out[c] = k.conductivity *
                   std::pow(std::fmax(t[c], 0.0) * inverse_reference, k.conductivity_exponent);
        } else {
          out[c] = k.conductivity;
        }
      }
    }
  }
}

}  // namespace

DiffusionOperator::DiffusionOperator(const DiffusionCoefficients& coefficients,
                                     const solver::BlockGeometry& geometry)
    : coefficients_(coefficients), geometry_(geometry) {
  const std::size_t n = geometry.storage_size();
  for (auto& a : velocity_)
    a.assign(n, 0.0);
  for (auto& a : momentum_flux_)
    a.assign(n, 0.0);
  for (auto& a : emf_)
    a.assign(n, 0.0);
  theta_.assign(n, 0.0);
  kappa_.assign(n, 0.0);
  energy_flux_.assign(n, 0.0);
}

void DiffusionOperator::cell_primitives(const solver::State& y) {
  const IndexBox box = cells_with_ghosts(geometry_, 1);
  const bool energy = !y.isothermal;
  if (y.magnetic && energy)
    primitives_of<true, true>(y, coefficients_.gamma, box, velocity_, theta_);
  if (y.magnetic && !energy)
    primitives_of<true, false>(y, coefficients_.gamma, box, velocity_, theta_);
  if (!y.magnetic && energy)
    primitives_of<false, true>(y, coefficients_.gamma, box, velocity_, theta_);
  if (!y.magnetic && !energy)
    primitives_of<false, false>(y, coefficients_.gamma, box, velocity_, theta_);
  if (!energy || !coefficients_.conducts()) return;
  if (coefficients_.conduction == ConductionLaw::power_law) {
    conductivity_of<ConductionLaw::power_law>(coefficients_, geometry_, box, theta_, kappa_);
  } else {
    conductivity_of<ConductionLaw::constant>(coefficients_, geometry_, box, theta_, kappa_);
  }
}

void DiffusionOperator::face_fluxes(const solver::State& y, int d) {
  for (auto& f : momentum_flux_)
    std::fill(f.begin(), f.end(), 0.0);
  std::fill(energy_flux_.begin(), energy_flux_.end(), 0.0);
  const bool energy = !y.isothermal;
  if (energy && coefficients_.conducts())
    add_conduction_flux(geometry_, d, theta_, kappa_, energy_flux_);
  if (coefficients_.viscous()) {
    add_viscous_flux(geometry_, d, coefficients_.viscosity, y.density, velocity_, momentum_flux_,
                     energy_flux_);
  }
  if (energy && y.magnetic && coefficients_.resistive())
    add_poynting_flux(geometry_, d, emf_, y.face_field, energy_flux_);
}

// U_c += −(F_{c+s} − F_c) / Δx_d: the finite-volume divergence (common practice, no source).
void DiffusionOperator::add_flux_divergence(solver::State& rate, int d) const {
  const solver::BlockGeometry& g = geometry_;
  const std::ptrdiff_t s = g.step(d);
  const double inverse = 1.0 / g.spacing[d];
  const bool energy = !rate.isothermal;
  for (int k = 0; k < g.cells[2]; ++k) {
    for (int j = 0; j < g.cells[1]; ++j) {
      const std::ptrdiff_t row = g.index(0, j, k);
      for (std::size_t m = 0; m < 3; ++m) {
        const double* f = momentum_flux_[m].data();
        double* r = rate.momentum[m].data();
        for (std::ptrdiff_t c = row; c < row + g.cells[0]; ++c)
          r[c] -= (f[c + s] - f[c]) * inverse;
      }
      if (!energy) continue;
      const double* f = energy_flux_.data();
      double* r = rate.energy.data();
      for (std::ptrdiff_t c = row; c < row + g.cells[0]; ++c)
        r[c] -= (f[c + s] - f[c]) * inverse;
    }
  }
}

void DiffusionOperator::rate(const solver::State& y, solver::State& rate) {
  for (auto& r : rate.momentum)
    std::fill(r.begin(), r.end(), 0.0);
  std::fill(rate.energy.begin(), rate.energy.end(), 0.0);
  cell_primitives(y);
  const bool resistive = y.magnetic && coefficients_.resistive();
  if (resistive) ohmic_emf(geometry_, coefficients_.resistivity, y.face_field, emf_);
  for (int d = 0; d < 3; ++d) {
    if (!geometry_.active(d)) continue;
    face_fluxes(y, d);
    add_flux_divergence(rate, d);
  }
  if (resistive) {
    set_face_rates(geometry_, emf_, rate.face_field);
  } else {
    for (auto& r : rate.face_field)
      std::fill(r.begin(), r.end(), 0.0);
  }
}

double DiffusionOperator::explicit_step(const solver::State& y) {
  const solver::BlockGeometry& g = geometry_;
  double largest = 0.0;
  if (coefficients_.viscous())
    largest = std::max(largest, longitudinal_viscous_factor * coefficients_.viscosity);
  if (y.magnetic && coefficients_.resistive())
    largest = std::max(largest, coefficients_.resistivity);
  if (!y.isothermal && coefficients_.conducts()) {
    cell_primitives(y);
    const double factor = coefficients_.gamma - 1.0;
    for (int k = 0; k < g.cells[2]; ++k) {
      for (int j = 0; j < g.cells[1]; ++j) {
        const std::ptrdiff_t row = g.index(0, j, k);
        for (std::ptrdiff_t c = row; c < row + g.cells[0]; ++c)
          largest = std::max(largest, factor * kappa_[std::size_t(c)] / y.density[std::size_t(c)]);
      }
    }
  }
  double inverse_squares = 0.0;
  for (int d = 0; d < 3; ++d) {
    if (g.active(d)) inverse_squares += 1.0 / (g.spacing[d] * g.spacing[d]);
  }
  if (largest <= 0.0 || inverse_squares <= 0.0) return std::numeric_limits<double>::infinity();
  return 1.0 / (2.0 * largest * inverse_squares);
}

}  // namespace brume::physics
