// A histogram's tallies over the cells of every rank, volume-weighted (integer cell counts) and
// mass-weighted (exact sums of the density: cells are of equal volume), and how it is stored in a
// Measurement: bin edges with their unit and factor to cgs, the fraction of the volume and of the
// mass in each bin, and the fractions outside the bins as numbers, so that bins plus outside
// slots sum to one.
#pragma once

#include <mpi.h>

#include <cstdint>
#include <string>
#include <vector>

#include "io/measurement.hpp"
#include "physics/distributions_exact_bins.hpp"
#include "physics/distributions_log_bins.hpp"

namespace brume::physics {

class HistogramTally {
 public:
  HistogramTally(std::size_t slots, ExponentWindow window)
      : counts_(slots, 0), mass_(slots, window) {}

  void add(std::size_t slot, double density) {
    ++counts_[slot];
    mass_.add(slot, density);
  }
  // Collective over comm: the tallies of every rank, the same bits on each.
  void combine(MPI_Comm comm);

  [[nodiscard]] std::size_t slots() const { return counts_.size(); }
  [[nodiscard]] std::int64_t count(std::size_t slot) const { return counts_[slot]; }
  [[nodiscard]] std::int64_t total_count() const { return total_count_; }
  [[nodiscard]] double volume_fraction(std::size_t slot) const;
  [[nodiscard]] double mass_fraction(std::size_t slot) const;

 private:
  std::vector<std::int64_t> counts_;
  ExactBinSums mass_;
  std::int64_t total_count_ = 0;  // set by combine()
  double total_mass_ = 0.0;       // set by combine()
};

// One axis of a histogram, its bins in the unit the edges are stored in.
struct HistogramAxis {
  std::string name;  // "density", "temperature", ...
  LogBins bins;
  std::string unit;
  double to_cgs = 1.0;
  std::string description;  // of the binned quantity
};

// <name>_edges, <name>_volume_fraction, <name>_mass_fraction and the numbers
// <name>_{volume,mass}_{underflow,overflow,undefined}. The tally has axis.bins.slots() slots.
void write_histogram(io::Measurement& m, const std::string& name, const HistogramAxis& axis,
                     const HistogramTally& tally);

// The slot of a 2D histogram: a * b_count + b inside, a_count * b_count outside.
[[nodiscard]] inline std::size_t joint_slot(std::size_t a, std::size_t b, std::size_t a_count,
                                            std::size_t b_count) {
  return a < a_count && b < b_count ? a * b_count + b : a_count * b_count;
}

// <name>_<a>_edges, <name>_<b>_edges, <name>_volume_fraction and <name>_mass_fraction of shape
// [a bins][b bins], and <name>_{volume,mass}_outside (either coordinate out of range or
// undefined). The tally has a.count · b.count + 1 slots.
void write_joint_histogram(io::Measurement& m, const std::string& name, const HistogramAxis& a,
                           const HistogramAxis& b, const HistogramTally& tally);

}  // namespace brume::physics
