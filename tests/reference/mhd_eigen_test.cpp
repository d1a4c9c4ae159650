// Tests of the flux Jacobian and its eigen-decomposition (tests/reference/mhd_eigen.hpp).
#include "tests/reference/mhd_eigen.hpp"

#include <gtest/gtest.h>

#include <Eigen/SVD>
#include <cmath>
#include <vector>

namespace brume::reference {
namespace {

// The linear-wave state of Gardiner & Stone 2008, J. Comput. Phys. 227, 4123, §8.1 (from
// memory): ρ = 1, p = 1/γ, v = 0, B = (1, √2, ½), γ = 5/3; chosen so that c_s = ½, c_a = 1,
// c_f = 2.
const Primitive kLinearWave{1.0, 0.0, 0.0, 0.0, 0.6, 1.0, std::sqrt(2.0), 0.5};
// A moving, oblique state with no special symmetry.
const Primitive kOblique{1.7, 0.3, -0.4, 0.25, 0.9, -0.8, 0.6, 1.1};

WaveSystem adiabatic_mhd() {
  return {true, false, 5.0 / 3.0, 1.0};
}
WaveSystem isothermal_mhd() {
  return {true, true, 5.0 / 3.0, 0.9};
}
WaveSystem adiabatic_hydro() {
  return {false, false, 1.4, 1.0};
}
WaveSystem isothermal_hydro() {
  return {false, true, 1.4, 0.9};
}

// Expected speeds, ascending, from the textbook formulas (textbook_speeds).
std::vector<double> expected_speeds(const WaveSystem& sys, const Primitive& w) {
  const TextbookSpeeds c = textbook_speeds(sys, w);
  const double v = w.vx;
  if (sys.magnetic && !sys.isothermal) {
    return {v - c.fast, v - c.alfven, v - c.slow, v, v + c.slow, v + c.alfven, v + c.fast};
  }
  if (sys.magnetic)
    return {v - c.fast, v - c.alfven, v - c.slow, v + c.slow, v + c.alfven, v + c.fast};
  if (!sys.isothermal) return {v - c.sound, v, v, v, v + c.sound};
  return {v - c.sound, v, v, v + c.sound};
}

TEST(ReferenceMhdEigen, LinearWaveStateHasSpeedsHalfOneTwo) {
  // Gardiner & Stone 2008 §8.1 (from memory): c_s = 1/2, c_a = 1, c_f = 2 for this state.
  const TextbookSpeeds c = textbook_speeds(adiabatic_mhd(), kLinearWave);
  EXPECT_NEAR(c.slow, 0.5, 1e-14);
  EXPECT_NEAR(c.alfven, 1.0, 1e-14);
  EXPECT_NEAR(c.fast, 2.0, 1e-14);
}

// Complex step vs central differences (independent plumbing check): step 1e-6 gives a
// truncation error ~1e-12 and cancellation ~1e-10 relative to the entries; 1e-7 absolute.
TEST(ReferenceMhdEigen, JacobianMatchesFiniteDifferences) {
  for (const WaveSystem& sys :
       {adiabatic_mhd(), isothermal_mhd(), adiabatic_hydro(), isothermal_hydro()}) {
    const Eigen::MatrixXd a = flux_jacobian(sys, kOblique);
    const Vector7<double> u = to_conserved(sys, kOblique);
    for (int j = 0; j < sys.size(); ++j) {
      const double d = 1e-6 * (1.0 + std::abs(u[static_cast<std::size_t>(j)]));
      Vector7<double> up = u, um = u;
      up[static_cast<std::size_t>(j)] += d;
      um[static_cast<std::size_t>(j)] -= d;
      const auto fp = conserved_flux(sys, up, kOblique.bx),
                 fm = conserved_flux(sys, um, kOblique.bx);
      for (int i = 0; i < sys.size(); ++i) {
        const double fd =
            (fp[static_cast<std::size_t>(i)] - fm[static_cast<std::size_t>(i)]) / (2 * d);
        EXPECT_NEAR(a(i, j), fd, 1e-7 * (1.0 + std::abs(fd))) << "A(" << i << "," << j << ")";
      }
    }
    // The mass flux is ρv_x itself: first row (0, 1, 0, ...) (common practice, no source).
    EXPECT_EQ(a(0, 1), 1.0);
    EXPECT_EQ(a.row(0).cwiseAbs().sum(), 1.0);
  }
}

// Eigenvalues of A equal the textbook speeds (v_x ± c_f, ± c_a, ± c_s, v_x; hydro: v_x ± a and
// v_x three times, or twice for isothermal gas). Eigen's eigenvalues carry errors ~ ε ‖A‖ for
// simple eigenvalues and ~ sqrt(ε) ‖A‖ at most for the (non-defective) repeated hydro ones;
// 1e-9 (simple) and 1e-6 (hydro) relative to ‖A‖ bound them.
TEST(ReferenceMhdEigen, EigenvaluesAreTheTextbookSpeeds) {
  for (const Primitive& w : {kLinearWave, kOblique}) {
    for (const WaveSystem& sys :
         {adiabatic_mhd(), isothermal_mhd(), adiabatic_hydro(), isothermal_hydro()}) {
      const Characteristics c = characteristics(sys, w);
      const double norm = flux_jacobian(sys, w).norm();
      const double tol = (sys.magnetic ? 1e-9 : 1e-6) * norm;
      const std::vector<double> expected = expected_speeds(sys, w);
      ASSERT_EQ(c.speeds.size(), static_cast<Eigen::Index>(expected.size()));
      EXPECT_LE(c.max_imaginary, tol);
      for (std::size_t k = 0; k < expected.size(); ++k) {
        EXPECT_NEAR(c.speeds(static_cast<Eigen::Index>(k)), expected[k], tol)
            << "wave " << k << ", size " << sys.size();
      }
    }
  }
}

// A r = λ r to round-off (residual ≤ 1e-10 ‖A‖ for unit r) and the eigenvectors span the
// space: the smallest singular value of R (unit columns) is bounded away from 0 (1e-3 for the
// MHD states, whose waves are all distinct; 1e-6 for hydro with its repeated eigenvalue).
TEST(ReferenceMhdEigen, RightEigenvectorsSatisfyAndAreIndependent) {
  for (const Primitive& w : {kLinearWave, kOblique}) {
    for (const WaveSystem& sys :
         {adiabatic_mhd(), isothermal_mhd(), adiabatic_hydro(), isothermal_hydro()}) {
      const Eigen::MatrixXd a = flux_jacobian(sys, w);
      const Characteristics c = characteristics(sys, w);
      for (Eigen::Index k = 0; k < c.speeds.size(); ++k) {
        const Eigen::VectorXd r = c.right.col(k);
        EXPECT_NEAR(r.norm(), 1.0, 1e-12);
        EXPECT_LE((a * r - c.speeds(k) * r).norm(), 1e-10 * a.norm()) << "wave " << k;
      }
      const Eigen::JacobiSVD<Eigen::MatrixXd> svd(c.right);
      EXPECT_GT(svd.singularValues().minCoeff(), sys.magnetic ? 1e-3 : 1e-6);
    }
  }
}

// δp of a conserved perturbation δU: p = (γ−1)(E − m²/(2ρ) − B²/2) linearized.
double pressure_perturbation(const WaveSystem& sys, const Primitive& w, const Eigen::VectorXd& r) {
  const double v2 = w.vx * w.vx + w.vy * w.vy + w.vz * w.vz;
  const double vdm = w.vx * r(1) + w.vy * r(2) + w.vz * r(3);
  const double bdb = sys.magnetic ? w.by * r(sys.by_index()) + w.bz * r(sys.bz_index()) : 0.0;
  return (sys.gamma - 1.0) * (r(4) - vdm + 0.5 * v2 * r(0) - bdb);
}

// Wave properties of the chosen eigenvectors (common practice; e.g. Goedbloed & Poedts 2004,
// §5.2, from memory): Alfvén waves carry no density, normal-velocity or pressure perturbation
// and turn B_t (δB_t ⟂ B_t); fast and slow waves are isentropic (δp = a² δρ); the entropy wave
// carries δρ alone (v, p, B unchanged). Round-off tolerance 1e-10 on unit vectors.
TEST(ReferenceMhdEigen, ChosenEigenvectorsHaveTheirWaveProperties) {
  const WaveSystem sys = adiabatic_mhd();
  for (const Primitive& w : {kLinearWave, kOblique}) {
    const Eigen::MatrixXd a = flux_jacobian(sys, w);
    const double a2 = sys.gamma * w.pressure / w.density;
    for (Family f : {Family::FastMinus, Family::AlfvenMinus, Family::SlowMinus, Family::Entropy,
                     Family::SlowPlus, Family::AlfvenPlus, Family::FastPlus}) {
      const Eigen::VectorXd r = right_eigenvector(sys, w, f);
      const double lambda = family_speed(sys, w, f);
      EXPECT_NEAR(r.norm(), 1.0, 1e-12);
      EXPECT_LE((a * r - lambda * r).norm(), 1e-9 * a.norm());
      const double dp = pressure_perturbation(sys, w, r);
      if (f == Family::AlfvenMinus || f == Family::AlfvenPlus) {
        EXPECT_NEAR(r(0), 0.0, 1e-10);
        EXPECT_NEAR(r(1), 0.0, 1e-10);
        EXPECT_NEAR(dp, 0.0, 1e-10);
        EXPECT_NEAR(w.by * r(5) + w.bz * r(6), 0.0, 1e-10);
        EXPECT_GT(r(5), 0.0);  // sign convention: first non-zero of (ρ, B_y, B_z) positive
      } else if (f == Family::Entropy) {
        EXPECT_GT(r(0), 0.0);
        const Eigen::VectorXd dv = (r.segment(1, 3) - r(0) * Eigen::Vector3d(w.vx, w.vy, w.vz));
        EXPECT_LE(dv.norm(), 1e-10);
        EXPECT_NEAR(dp, 0.0, 1e-10);
        EXPECT_NEAR(r(5), 0.0, 1e-10);
        EXPECT_NEAR(r(6), 0.0, 1e-10);
      } else {
        EXPECT_GT(r(0), 0.0);
        EXPECT_NEAR(dp, a2 * r(0), 1e-10);
      }
    }
  }
}

// Hydrodynamics: the entropy wave shares v_x with the two shear waves; the helper picks the
// member of that eigenspace with δρ = 1 and δv_t = 0, which is δU ∝ (1, v, v²/2) (Toro 2009
// §3.2, right eigenvectors of the 3D Euler equations; from memory).
TEST(ReferenceMhdEigen, HydroEntropyWaveFromDegenerateEigenspace) {
  const WaveSystem sys = adiabatic_hydro();
  const Primitive w = kOblique;
  const Eigen::VectorXd r = right_eigenvector(sys, w, Family::Entropy);
  Eigen::VectorXd expected(5);
  const double v2 = w.vx * w.vx + w.vy * w.vy + w.vz * w.vz;
  expected << 1.0, w.vx, w.vy, w.vz, 0.5 * v2;
  expected.normalize();
  // The eigenspace of the triple eigenvalue is computed to ~1e-10 here (non-defective);
  // 1e-8 leaves margin while any other member of the eigenspace is O(1) away.
  EXPECT_LE((r - expected).norm(), 1e-8);
  EXPECT_THROW((void)right_eigenvector(sys, w, Family::AlfvenPlus), std::invalid_argument);
  EXPECT_THROW((void)right_eigenvector(isothermal_hydro(), w, Family::Entropy),
               std::invalid_argument);
}

}  // namespace
}  // namespace brume::reference
