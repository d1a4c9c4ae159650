// The eigenvectors of characteristic_waves.hpp: left and right vectors are inverse to each other
// (L R = I) and the right vectors are eigenvectors of the primitive-variable Jacobian with the
// textbook speeds, for random states and for the degenerate ones (B_n → 0, B_t → 0, both, and
// the triple umbilic c_a = a with B_t = 0).
#include "solver/characteristic_waves.hpp"

#include <gtest/gtest.h>

#include <array>
#include <cmath>
#include <random>
#include <vector>

namespace brume::solver {
namespace {

constexpr int kN = kWaveVariables;
using Matrix = std::array<std::array<double, kN>, kN>;

struct Sample {
  double rho, vn, vt1, vt2, p, bn, bt1, bt2;
};

// Columns of R (from_waves of unit amplitudes) and rows of L (to_waves of unit differences).
template <class Waves>
void matrices(const Waves& waves, Matrix& left, Matrix& right) {
  for (int j = 0; j < kN; ++j) {
    double e[kN] = {}, out[kN];
    e[j] = 1.0;
    waves.from_waves(e, out);
    for (int i = 0; i < kN; ++i)
      right[std::size_t(i)][std::size_t(j)] = out[i];
    waves.to_waves(e, out);
    for (int i = 0; i < kN; ++i)
      left[std::size_t(i)][std::size_t(j)] = out[i];
  }
}

// The 1D primitive equations ∂w/∂t + A ∂w/∂x = 0 in the variables (ρ, v_n, v_t1, v_t2, p, B_t1,
// B_t2) with constant B_n (ideal MHD, Heaviside–Lorentz units as brume uses; from memory, e.g.
// Stone et al. 2008, ApJS 178, 137, eq. A2). Isothermal gas: ∂p/∂x → a² ∂ρ/∂x in the v_n row.
Matrix jacobian(const Sample& w, double a2, bool isothermal, bool magnetic) {
  Matrix a{};
  const double r = w.rho, bn = magnetic ? w.bn : 0.0;
  const double b1 = magnetic ? w.bt1 : 0.0, b2 = magnetic ? w.bt2 : 0.0;
  for (int i = 0; i < kN; ++i)
    a[std::size_t(i)][std::size_t(i)] = w.vn;
  a[0][1] = r;
  if (isothermal) {
    a[1][0] = a2 / r;
  } else {
    a[1][4] = 1.0 / r;
    a[4][1] = r * a2;  // γ p
  }
  if (magnetic) {
    a[1][5] = b1 / r;
    a[1][6] = b2 / r;
    a[2][5] = -bn / r;
    a[3][6] = -bn / r;
    a[5][1] = b1;
    a[5][2] = -bn;
    a[6][1] = b2;
    a[6][3] = -bn;
  }
  return a;
}

// Textbook speeds relative to v_n in the order of the amplitudes (characteristic_waves.hpp):
// c_f,s² = ½ [a² + b² ± sqrt((a² + b²)² − 4 a² c_a²)] (e.g. Goedbloed & Poedts 2004, §5.2; from
// memory).
std::array<double, kN> speeds(const Sample& w, double a2, bool isothermal, bool magnetic) {
  if (!magnetic) {
    const double a = std::sqrt(a2);
    return {-a, 0.0, 0.0, 0.0, a, 0.0, 0.0};
  }
  const double ca2 = w.bn * w.bn / w.rho;
  const double b2 = ca2 + (w.bt1 * w.bt1 + w.bt2 * w.bt2) / w.rho;
  const double root = std::sqrt(std::fmax(0.0, (a2 + b2) * (a2 + b2) - 4.0 * a2 * ca2));
  const double cf = std::sqrt(0.5 * (a2 + b2 + root));
  const double cs = std::sqrt(std::fmax(0.0, 0.5 * (a2 + b2 - root)));
  const double ca = std::sqrt(ca2);
  (void)isothermal;
  return {-cf, -ca, -cs, 0.0, cs, ca, cf};
}

// The variables and waves that exist in a system (hydro: no B; isothermal: no p, no entropy).
std::vector<int> active_variables(bool isothermal, bool magnetic) {
  std::vector<int> v{0, 1, 2, 3};
  if (!isothermal) v.push_back(4);
  if (magnetic) {
    v.push_back(5);
    v.push_back(6);
  }
  return v;
}
std::vector<int> active_waves(bool isothermal, bool magnetic) {
  std::vector<int> k = magnetic ? std::vector<int>{0, 1, 2, 4, 5, 6} : std::vector<int>{0, 1, 2, 4};
  if (!isothermal) k.push_back(3);
  return k;
}

void check(const Sample& w, double gamma, bool isothermal, bool magnetic) {
  const double a2 = isothermal ? 0.8 : gamma * w.p / w.rho;
  Matrix left{}, right{};
  if (magnetic) {
    if (isothermal) {
      matrices(MhdWaves<true>(w.rho, a2, w.bn, w.bt1, w.bt2), left, right);
    } else {
      matrices(MhdWaves<false>(w.rho, a2, w.bn, w.bt1, w.bt2), left, right);
    }
  } else if (isothermal) {
    matrices(HydroWaves<true>(w.rho, a2), left, right);
  } else {
    matrices(HydroWaves<false>(w.rho, a2), left, right);
  }
  const std::vector<int> vars = active_variables(isothermal, magnetic);
  const std::vector<int> waves = active_waves(isothermal, magnetic);
  ASSERT_EQ(vars.size(), waves.size());
  // L R = I on the waves of the system. Entries of L and R are O(1)–O(10) for these states, so
  // round-off stays below 1e-13; 1e-12 leaves a margin (common practice, no source).
  for (int i : waves) {
    for (int j : waves) {
      double sum = 0.0;
      for (int v : vars)
        sum += left[std::size_t(i)][std::size_t(v)] * right[std::size_t(v)][std::size_t(j)];
      EXPECT_NEAR(sum, i == j ? 1.0 : 0.0, 1e-12)
          << "wave " << i << "," << j << " rho " << w.rho << " bn " << w.bn << " bt " << w.bt1
          << "," << w.bt2;
    }
  }
  // A r_k = λ_k r_k (Jacobian from memory, above), relative to |A| |r_k|; 1e-11 allows for
  // the round-off of the products (common practice, no source).
  const Matrix a = jacobian(w, a2, isothermal, magnetic);
  const std::array<double, kN> c = speeds(w, a2, isothermal, magnetic);
  for (int k : waves) {
    double scale = 0.0, norm = 0.0;
    for (int v : vars) {
      norm = std::fmax(norm, std::fabs(right[std::size_t(v)][std::size_t(k)]));
      for (int u : vars)
        scale = std::fmax(scale, std::fabs(a[std::size_t(v)][std::size_t(u)]));
    }
    EXPECT_GT(norm, 0.1) << "wave " << k;  // a vanishing eigenvector would pass A r = λ r
    for (int v : vars) {
      double ar = 0.0;
      for (int u : vars)
        ar += a[std::size_t(v)][std::size_t(u)] * right[std::size_t(u)][std::size_t(k)];
      const double lr = (w.vn + c[std::size_t(k)]) * right[std::size_t(v)][std::size_t(k)];
      EXPECT_NEAR(ar, lr, 1e-11 * scale * norm)
          << "wave " << k << " row " << v << " rho " << w.rho << " bn " << w.bn << " bt " << w.bt1
          << "," << w.bt2;
    }
  }
}

std::vector<Sample> samples() {
  std::mt19937 rng(20240611);
  std::uniform_real_distribution<double> u(-1.0, 1.0), pos(0.1, 10.0);
  std::vector<Sample> out;
  for (int n = 0; n < 200; ++n) {
    Sample w{pos(rng), u(rng), u(rng), u(rng), pos(rng), 2 * u(rng), 2 * u(rng), 2 * u(rng)};
    switch (n % 6) {
      case 1:
        w.bn = 0.0;  // B_n → 0: slow and Alfvén waves join the entropy wave
        break;
      case 2:
        w.bt1 = w.bt2 = 0.0;  // B_t → 0: β undefined
        break;
      case 3:
        w.bn = 0.0, w.bt1 = w.bt2 = 0.0;  // no field at all
        break;
      case 4:
        w.bt1 = 1e-9 * u(rng), w.bt2 = 1e-9 * u(rng);  // nearly degenerate
        break;
      default:
        break;
    }
    out.push_back(w);
  }
  // Triple umbilic: B_t = 0 and c_a = a, for γ = 5/3 (a² = γ p/ρ) and the isothermal a² = 0.8.
  out.push_back({2.0, 0.3, 0.0, 0.0, 1.2, std::sqrt(2.0 * 5.0 / 3.0 * 1.2 / 2.0), 0.0, 0.0});
  out.push_back({2.0, 0.3, 0.0, 0.0, 1.2, std::sqrt(2.0 * 0.8), 0.0, 0.0});
  return out;
}

TEST(CharacteristicWaves, AdiabaticMhdLeftTimesRightIsIdentityAndRightAreEigenvectors) {
  for (const Sample& w : samples())
    check(w, 5.0 / 3.0, false, true);
}

TEST(CharacteristicWaves, IsothermalMhdLeftTimesRightIsIdentityAndRightAreEigenvectors) {
  for (const Sample& w : samples())
    check(w, 1.0, true, true);
}

TEST(CharacteristicWaves, HydrodynamicsLeftTimesRightIsIdentityAndRightAreEigenvectors) {
  for (const Sample& w : samples()) {
    check(w, 1.4, false, false);
    check(w, 1.0, true, false);
  }
}

}  // namespace
}  // namespace brume::solver
