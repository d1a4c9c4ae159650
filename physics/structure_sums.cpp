#include "physics/structure_sums.hpp"

#include <array>
#include <cmath>

namespace brume::physics {

namespace {

// Lines summed side by side: their partial sums stay in one small block of the stack.
constexpr long tile = 32;

// One lag: per line, the sums along it in position order; then each line sum into `sums`
// (2P + 2 of them: longitudinal p = 1 … P, transverse p = 1 … P, flux, cold |δv|²).
// Increments over an exact periodic shift (common practice, no source); the flux-based third
// order ⟨δ(ρv_∥)|δv|²⟩ after Kritsuk, Wagner & Norman 2013, J. Fluid Mech. 729, R1 (idea from
// memory, form brume's: docs/structure-functions.md).
template <int P>
void add_lag(const StructurePencils& pencils, long lag, solver::ExactSum* sums,
             long long& cold_pairs) {
  constexpr int flux = 2 * P;
  constexpr int cold_square = 2 * P + 1;
  constexpr int count = 2 * P + 2;
  const long n = pencils.length;
  const long m = pencils.lines;
  const double* vl = pencils.fields[longitudinal].data();
  const double* v1 = pencils.fields[transverse_1].data();
  const double* v2 = pencils.fields[transverse_2].data();
  const double* mo = pencils.fields[momentum].data();
  const double* co = pencils.fields[cold].data();
  for (long first = 0; first < m; first += tile) {
    const long width = m - first < tile ? m - first : tile;
    std::array<std::array<double, tile>, count + 1> partial{};
    for (long x = 0; x < n; ++x) {
      const long here = x * m + first;
      const long there = ((x + lag) % n) * m + first;
      for (long t = 0; t < width; ++t) {
        const double dl = vl[there + t] - vl[here + t];
        const double d1 = v1[there + t] - v1[here + t];
        const double d2 = v2[there + t] - v2[here + t];
        const double dm = mo[there + t] - mo[here + t];
        const double both_cold = co[there + t] * co[here + t];
        const double al = std::fabs(dl);
        const double a1 = std::fabs(d1);
        const double a2 = std::fabs(d2);
        double pl = al;
        double p1 = a1;
        double p2 = a2;
        partial[0][std::size_t(t)] += pl;
        partial[P][std::size_t(t)] += p1 + p2;
        for (int p = 1; p < P; ++p) {
          pl *= al;
          p1 *= a1;
          p2 *= a2;
          partial[std::size_t(p)][std::size_t(t)] += pl;
          partial[std::size_t(P + p)][std::size_t(t)] += p1 + p2;
        }
        const double square = dl * dl + d1 * d1 + d2 * d2;
        partial[flux][std::size_t(t)] += dm * square;
        partial[cold_square][std::size_t(t)] += both_cold * square;
        partial[count][std::size_t(t)] += both_cold;
      }
    }
    for (int q = 0; q < count; ++q) {
      for (long t = 0; t < width; ++t)
        sums[q].add(partial[std::size_t(q)][std::size_t(t)]);
    }
    for (long t = 0; t < width; ++t)  // whole numbers below 2^53: exact
      cold_pairs += static_cast<long long>(partial[count][std::size_t(t)]);
  }
}

template <int P>
void add_lags(const StructurePencils& pencils, const std::vector<long>& lags,
              std::vector<solver::ExactSum>& sums, std::vector<long long>& cold_pairs) {
  for (std::size_t l = 0; l < lags.size(); ++l) {
    add_lag<P>(pencils, lags[l], sums.data() + l * std::size_t(2 * P + 2), cold_pairs[l]);
  }
}

}  // namespace

StructureSums::StructureSums(int orders, std::size_t lags)
    : orders_(orders), sums_(lags * per_lag()), cold_pairs_(lags, 0) {}

void StructureSums::add(const StructurePencils& pencils, const std::vector<long>& lags) {
  switch (orders_) {  // the order is a compile-time constant of the kernel
    case 1:
      add_lags<1>(pencils, lags, sums_, cold_pairs_);
      break;
    case 2:
      add_lags<2>(pencils, lags, sums_, cold_pairs_);
      break;
    case 3:
      add_lags<3>(pencils, lags, sums_, cold_pairs_);
      break;
    case 4:
      add_lags<4>(pencils, lags, sums_, cold_pairs_);
      break;
    case 5:
      add_lags<5>(pencils, lags, sums_, cold_pairs_);
      break;
    default:
      add_lags<6>(pencils, lags, sums_, cold_pairs_);
      break;
  }
}

void StructureSums::combine(MPI_Comm comm) {
  for (solver::ExactSum& s : sums_)
    s.combine(comm);
  std::vector<long long> total(cold_pairs_.size());
  MPI_Allreduce(cold_pairs_.data(), total.data(), int(total.size()), MPI_LONG_LONG, MPI_SUM, comm);
  cold_pairs_ = total;
}

double StructureSums::longitudinal(std::size_t lag, int order) const {
  return sums_[lag * per_lag() + std::size_t(order - 1)].value();
}
double StructureSums::transverse(std::size_t lag, int order) const {
  return sums_[lag * per_lag() + std::size_t(orders_ + order - 1)].value();
}
double StructureSums::flux(std::size_t lag) const {
  return sums_[lag * per_lag() + std::size_t(2 * orders_)].value();
}
double StructureSums::cold_square(std::size_t lag) const {
  return sums_[lag * per_lag() + std::size_t(2 * orders_ + 1)].value();
}
long long StructureSums::cold_pairs(std::size_t lag) const {
  return cold_pairs_[lag];
}

}  // namespace brume::physics
