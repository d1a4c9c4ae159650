#include "problems/linear_wave_eigenmode.hpp"

#include <Eigen/Dense>
#include <Eigen/Eigenvalues>
#include <Eigen/SVD>

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace brume::problems {

namespace {

// At most 7 × 7: bounded sizes keep Eigen on its small-matrix paths.
using Matrix = Eigen::Matrix<double, Eigen::Dynamic, Eigen::Dynamic, 0, 7, 7>;
using Vector = Eigen::Matrix<double, Eigen::Dynamic, 1, 0, 7, 1>;

// Positions of the primitive (and conserved) variables: ρ, v (3), p (ideal gas), B_t1, B_t2 (MHD).
struct Layout {
  bool magnetic, isothermal;
  [[nodiscard]] Eigen::Index size() const { return 4 + (isothermal ? 0 : 1) + (magnetic ? 2 : 0); }
  [[nodiscard]] Eigen::Index pressure() const { return 4; }
  [[nodiscard]] Eigen::Index by() const { return isothermal ? 4 : 5; }
  [[nodiscard]] Eigen::Index bz() const { return by() + 1; }
};

// A(W) of W_t + A(W) W_x = 0: the 1D ideal-MHD equations in primitive variables with B_x constant
// — continuity, momentum with magnetic pressure and tension, pressure, induction (common
// practice, no source). Isothermal gas: p = c_s² ρ and no pressure row.
Matrix primitive_jacobian(const Layout& l, const WaveGas& gas, const WaveBackground& w) {
  const Eigen::Index n = l.size();
  Matrix a = Matrix::Zero(n, n);
  const double rho = w.density, vx = w.velocity[0];
  for (Eigen::Index i = 0; i < n; ++i)
    a(i, i) = vx;  // advection along the wave
  a(0, 1) = rho;
  if (l.isothermal) {
    a(1, 0) = gas.sound_speed * gas.sound_speed / rho;
  } else {
    a(1, l.pressure()) = 1.0 / rho;
    a(l.pressure(), 1) = gas.gamma * w.pressure;
  }
  if (l.magnetic) {
    const double bx = w.field[0], by = w.field[1], bz = w.field[2];
    a(1, l.by()) = by / rho;
    a(1, l.bz()) = bz / rho;
    a(2, l.by()) = -bx / rho;
    a(3, l.bz()) = -bx / rho;
    a(l.by(), 1) = by;
    a(l.by(), 2) = -bx;
    a(l.bz(), 1) = bz;
    a(l.bz(), 3) = -bx;
  }
  return a;
}

// ∂U/∂W: the change from primitive to conserved perturbations (E = p/(γ−1) + ρv²/2 + B²/2).
Matrix conserved_from_primitive(const Layout& l, const WaveGas& gas, const WaveBackground& w) {
  const Eigen::Index n = l.size();
  Matrix m = Matrix::Identity(n, n);
  double v2 = 0.0;
  for (Eigen::Index i = 0; i < 3; ++i) {
    const double v = w.velocity[static_cast<std::size_t>(i)];
    m(1 + i, 0) = v;
    m(1 + i, 1 + i) = w.density;
    v2 += v * v;
  }
  if (!l.isothermal) {
    const Eigen::Index e = l.pressure();
    m(e, 0) = 0.5 * v2;
    for (Eigen::Index i = 0; i < 3; ++i)
      m(e, 1 + i) = w.density * w.velocity[static_cast<std::size_t>(i)];
    m(e, e) = 1.0 / (gas.gamma - 1.0);
    if (l.magnetic) {
      m(e, l.by()) = w.field[1];
      m(e, l.bz()) = w.field[2];
    }
  }
  return m;
}

// Index of the family's eigenvalue among the eigenvalues sorted ascending (slow ≤ Alfvén ≤ fast on
// each side, the entropy wave in the middle; hydrodynamics: the sound waves at both ends).
Eigen::Index sorted_position(const Layout& l, WaveFamily family, int direction) {
  const Eigen::Index n = l.size();
  const bool plus = direction > 0;
  switch (family) {
    case WaveFamily::fast:
      return plus ? n - 1 : 0;
    case WaveFamily::alfven:
      return plus ? n - 2 : 1;
    case WaveFamily::slow:
      return plus ? n - 3 : 2;
    case WaveFamily::entropy:
      return n / 2;
  }
  return 0;
}

}  // namespace

Eigenmode linear_eigenmode(const WaveGas& gas, const WaveBackground& w, WaveFamily family,
                           int direction) {
  const Layout l{gas.magnetic, gas.isothermal};
  if (family == WaveFamily::entropy && gas.isothermal) {
    throw std::invalid_argument("isothermal gas has no entropy wave");
  }
  if ((family == WaveFamily::alfven || family == WaveFamily::slow) && !gas.magnetic) {
    throw std::invalid_argument("Alfven and slow waves need a magnetized gas");
  }
  if ((family == WaveFamily::alfven || family == WaveFamily::slow) && w.field[0] == 0.0) {
    throw std::invalid_argument("Alfven and slow waves need a field component along the wave");
  }
  const Matrix a = primitive_jacobian(l, gas, w);
  const Eigen::EigenSolver<Matrix> solver(a, false);
  std::vector<double> speeds;
  for (Eigen::Index i = 0; i < a.rows(); ++i)
    speeds.push_back(solver.eigenvalues()(i).real());
  std::sort(speeds.begin(), speeds.end());
  const auto k = static_cast<std::size_t>(sorted_position(l, family, direction));
  const double lambda = speeds[k];
  const double scale = 1.0 + std::fabs(speeds.front()) + std::fabs(speeds.back());
  const double tol = 1e-7 * scale;
  const bool degenerate = (k > 0 && speeds[k] - speeds[k - 1] <= tol) ||
                          (k + 1 < speeds.size() && speeds[k + 1] - speeds[k] <= tol);

  Vector r = Vector::Zero(a.rows());
  if (!degenerate) {
    // The null vector of A − λI: the right singular vector of the smallest singular value.
    const Matrix shifted = a - lambda * Matrix::Identity(a.rows(), a.cols());
    const Eigen::JacobiSVD<Matrix> svd(shifted, Eigen::ComputeFullV);
    r = svd.matrixV().col(a.cols() - 1);
  } else if (family == WaveFamily::entropy) {
    r(0) = 1.0;  // δρ alone is advected unchanged in adiabatic gas whatever the other modes do
  } else {
    throw std::invalid_argument(
        "the wave speed coincides with another family's: the eigenvector "
        "is not unique for this background state");
  }
  const double residual = (a * r - lambda * r).norm();
  if (residual > 1e-8 * scale * r.norm()) {
    throw std::invalid_argument("no eigenvector found for this family and background state");
  }

  Vector u = conserved_from_primitive(l, gas, w) * r;
  const double norm = u.norm();
  r /= norm;
  u /= norm;
  std::vector<Eigen::Index> sign_order{0};
  if (l.magnetic) {
    sign_order.push_back(l.by());
    sign_order.push_back(l.bz());
  }
  sign_order.push_back(2);
  sign_order.push_back(3);
  for (Eigen::Index i : sign_order) {
    if (std::fabs(u(i)) > 1e-8) {
      if (u(i) < 0.0) {
        r = -r;
        u = -u;
      }
      break;
    }
  }

  Eigenmode mode;
  mode.speed = lambda;
  mode.density = r(0);
  mode.velocity = {r(1), r(2), r(3)};
  mode.pressure = l.isothermal ? gas.sound_speed * gas.sound_speed * r(0) : r(l.pressure());
  if (l.magnetic) mode.field = {0.0, r(l.by()), r(l.bz())};
  mode.conserved.assign(u.data(), u.data() + u.size());
  return mode;
}

}  // namespace brume::problems
