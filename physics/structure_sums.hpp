// Sums over every pair of cells a lag apart along one axis, from whole lines (structure_pencils):
// Σ|δv_∥|^p, Σ(|δv_⊥1|^p + |δv_⊥2|^p) for p = 1 … orders, Σ δ(ρv_∥) |δv|², and over the pairs
// of two cold cells Σ|δv|² and their number. Each line is summed in its own order (position 0,
// 1, … along it), the line sums exactly (solver::ExactSum): the totals have the same bits for
// any number of ranks.
#pragma once

#include <mpi.h>

#include <vector>

#include "physics/structure_pencils.hpp"
#include "solver/exact_sum.hpp"

namespace brume::physics {

class StructureSums {
 public:
  StructureSums(int orders, std::size_t lags);

  // Adds the pairs of `pencils` at every lag of `lags` (each < pencils.length).
  void add(const StructurePencils& pencils, const std::vector<long>& lags);
  // Sums over every rank of `comm` (collective).
  void combine(MPI_Comm comm);

  [[nodiscard]] int orders() const { return orders_; }
  // Index `lag` is the position in the lag list; `order` is p (1 … orders).
  [[nodiscard]] double longitudinal(std::size_t lag, int order) const;
  [[nodiscard]] double transverse(std::size_t lag, int order) const;  // both components
  [[nodiscard]] double flux(std::size_t lag) const;                   // Σ δ(ρv_∥) |δv|²
  [[nodiscard]] double cold_square(std::size_t lag) const;            // Σ |δv|², cold pairs
  [[nodiscard]] long long cold_pairs(std::size_t lag) const;

 private:
  [[nodiscard]] std::size_t per_lag() const { return std::size_t(2 * orders_ + 2); }
  int orders_;
  std::vector<solver::ExactSum> sums_;  // [lag][quantity]
  std::vector<long long> cold_pairs_;   // [lag]
};

}  // namespace brume::physics
