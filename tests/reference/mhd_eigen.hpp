// Test-side reference: flux Jacobian A = ∂F/∂U of the 1D ideal (or isothermal) MHD / Euler
// system by complex-step differentiation of conserved_flux (exact to round-off, no subtraction),
// its eigen-decomposition (Eigen), and the right eigenvector of a chosen wave family.
// Nothing here types in published eigenvectors: they are computed from A.
#pragma once

#include <Eigen/Dense>
#include <Eigen/Eigenvalues>
#include <algorithm>
#include <cmath>
#include <complex>
#include <numeric>
#include <stdexcept>
#include <vector>

#include "tests/reference/conserved_flux.hpp"

namespace brume::reference {

// ∂F/∂U_j = Im F(U + i h e_j) / h. Squire & Trapp 1998, SIAM Rev. 40, 110 (complex step).
[[nodiscard]] inline Eigen::MatrixXd flux_jacobian(const WaveSystem& sys, const Primitive& w) {
  const int n = sys.size();
  const Vector7<double> u = to_conserved(sys, w);
  const double h = 1e-30;
  Eigen::MatrixXd a(n, n);
  for (int j = 0; j < n; ++j) {
    Vector7<std::complex<double>> uc{};
    for (std::size_t i = 0; i < 7; ++i)
      uc[i] = u[i];
    uc[static_cast<std::size_t>(j)] += std::complex<double>(0.0, h);
    const Vector7<std::complex<double>> f = conserved_flux(sys, uc, w.bx);
    for (int i = 0; i < n; ++i)
      a(i, j) = f[static_cast<std::size_t>(i)].imag() / h;
  }
  return a;
}

// Textbook characteristic speeds relative to v_x: a² = γp/ρ (or c_s²), c_a = |B_x|/sqrt(ρ),
// c_f,s² = ½ [a² + B²/ρ ± sqrt((a² + B²/ρ)² − 4 a² B_x²/ρ)]
// (common practice, e.g. Goedbloed & Poedts 2004, Principles of MHD, §5.2; from memory).
struct TextbookSpeeds {
  double sound, alfven, fast, slow;
};

[[nodiscard]] inline TextbookSpeeds textbook_speeds(const WaveSystem& sys, const Primitive& w) {
  const double a2 =
      sys.isothermal ? sys.sound_speed * sys.sound_speed : sys.gamma * w.pressure / w.density;
  if (!sys.magnetic) return {std::sqrt(a2), 0.0, std::sqrt(a2), 0.0};
  const double bx2 = w.bx * w.bx / w.density;
  const double b2 = bx2 + (w.by * w.by + w.bz * w.bz) / w.density;
  const double root = std::sqrt(std::max(0.0, (a2 + b2) * (a2 + b2) - 4.0 * a2 * bx2));
  const double cf2 = 0.5 * (a2 + b2 + root);
  return {std::sqrt(a2), std::sqrt(bx2), std::sqrt(cf2), std::sqrt(a2 * bx2 / cf2)};
}

// Wave families, slowest to fastest. Hydrodynamics: Fast± are the sound waves; the shear waves
// travel with Alfvén± (c_a = 0). Isothermal systems have no Entropy wave.
enum class Family { FastMinus, AlfvenMinus, SlowMinus, Entropy, SlowPlus, AlfvenPlus, FastPlus };

[[nodiscard]] inline double family_speed(const WaveSystem& sys, const Primitive& w, Family f) {
  const TextbookSpeeds c = textbook_speeds(sys, w);
  switch (f) {
    case Family::FastMinus:
      return w.vx - c.fast;
    case Family::AlfvenMinus:
      return w.vx - c.alfven;
    case Family::SlowMinus:
      return w.vx - c.slow;
    case Family::Entropy:
      return w.vx;
    case Family::SlowPlus:
      return w.vx + c.slow;
    case Family::AlfvenPlus:
      return w.vx + c.alfven;
    case Family::FastPlus:
      return w.vx + c.fast;
  }
  return w.vx;
}

struct Characteristics {
  Eigen::VectorXd speeds;  // ascending
  Eigen::MatrixXd right;   // column k: right eigenvector of speeds(k), unit 2-norm
  double max_imaginary;    // largest |Im λ| found (should be round-off: the system is hyperbolic)
};

[[nodiscard]] inline Characteristics characteristics(const WaveSystem& sys, const Primitive& w) {
  const Eigen::MatrixXd a = flux_jacobian(sys, w);
  const Eigen::EigenSolver<Eigen::MatrixXd> es(a);
  const Eigen::Index n = a.rows();
  std::vector<Eigen::Index> order(static_cast<std::size_t>(n));
  std::iota(order.begin(), order.end(), Eigen::Index{0});
  std::sort(order.begin(), order.end(), [&](Eigen::Index i, Eigen::Index j) {
    return es.eigenvalues()(i).real() < es.eigenvalues()(j).real();
  });
  Characteristics c{Eigen::VectorXd(n), Eigen::MatrixXd(n, n), 0.0};
  for (Eigen::Index k = 0; k < n; ++k) {
    const Eigen::Index i = order[static_cast<std::size_t>(k)];
    c.speeds(k) = es.eigenvalues()(i).real();
    c.max_imaginary = std::max(c.max_imaginary, std::abs(es.eigenvalues()(i).imag()));
    c.right.col(k) = es.eigenvectors().col(i).real().normalized();
  }
  return c;
}

// Right eigenvector of family f, normalized to unit 2-norm, with the sign fixed so that the
// first of the components (ρ, B_y, B_z, ρv_y, ρv_z) whose magnitude exceeds 1e-8 is positive
// (density for fast, slow and entropy waves; the field for Alfvén waves).
// When the family's speed is degenerate (within 1e-7 · (1 + max |λ|)) the eigenvector is not
// unique: the Entropy family is then the member of the eigenspace with δρ = 1, δv_t = 0 and
// δB_t = 0 (hydrodynamics: entropy and shear waves share v_x); other families throw
// std::invalid_argument. Throws also if no eigenvalue of A matches the textbook speed.
[[nodiscard]] inline Eigen::VectorXd right_eigenvector(const WaveSystem& sys, const Primitive& w,
                                                       Family f) {
  if (sys.isothermal && f == Family::Entropy) {
    throw std::invalid_argument("right_eigenvector: isothermal systems have no entropy wave");
  }
  const Characteristics c = characteristics(sys, w);
  const double target = family_speed(sys, w, f);
  const double tol = 1e-7 * (1.0 + c.speeds.cwiseAbs().maxCoeff());
  std::vector<Eigen::Index> group;
  for (Eigen::Index k = 0; k < c.speeds.size(); ++k) {
    if (std::abs(c.speeds(k) - target) <= tol) group.push_back(k);
  }
  if (group.empty()) throw std::invalid_argument("right_eigenvector: no eigenvalue at that speed");
  Eigen::VectorXd r;
  if (group.size() == 1) {
    r = c.right.col(group.front());
  } else if (f == Family::Entropy) {
    Eigen::MatrixXd basis(c.speeds.size(), static_cast<Eigen::Index>(group.size()));
    for (std::size_t g = 0; g < group.size(); ++g) {
      basis.col(static_cast<Eigen::Index>(g)) = c.right.col(group[g]);
    }
    // Entropy wave: δρ = 1 with no tangential velocity (δv_t = (δm_t − v_t δρ)/ρ = 0) and no
    // tangential field perturbation; solved in the least-squares sense within the eigenspace.
    const Eigen::Index rows = sys.magnetic ? 5 : 3;
    Eigen::MatrixXd constraint = Eigen::MatrixXd::Zero(rows, c.speeds.size());
    constraint(0, 0) = 1.0;
    constraint(1, 2) = 1.0;
    constraint(1, 0) = -w.vy;
    constraint(2, 3) = 1.0;
    constraint(2, 0) = -w.vz;
    if (sys.magnetic) {
      constraint(3, sys.by_index()) = 1.0;
      constraint(4, sys.bz_index()) = 1.0;
    }
    Eigen::VectorXd target_values = Eigen::VectorXd::Zero(rows);
    target_values(0) = 1.0;
    r = basis * (constraint * basis).colPivHouseholderQr().solve(target_values);
  } else {
    throw std::invalid_argument("right_eigenvector: degenerate family, eigenvector not unique");
  }
  r.normalize();
  std::vector<int> sign_order{0};
  if (sys.magnetic) {
    sign_order.push_back(sys.by_index());
    sign_order.push_back(sys.bz_index());
  }
  sign_order.push_back(2);
  sign_order.push_back(3);
  for (int i : sign_order) {
    if (std::abs(r(i)) > 1e-8) {
      if (r(i) < 0.0) r = -r;
      break;
    }
  }
  return r;
}

}  // namespace brume::reference
