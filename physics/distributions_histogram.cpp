#include "physics/distributions_histogram.hpp"

#include <algorithm>
#include <numeric>

namespace brume::physics {

void HistogramTally::combine(MPI_Comm comm) {
  // Integer sums: exact, in any order.
  MPI_Allreduce(MPI_IN_PLACE, counts_.data(), int(counts_.size()), MPI_INT64_T, MPI_SUM, comm);
  mass_.combine(comm);
  total_count_ = std::accumulate(counts_.begin(), counts_.end(), std::int64_t(0));
  total_mass_ = mass_.total();
}

double HistogramTally::volume_fraction(std::size_t slot) const {
  return total_count_ > 0 ? double(counts_[slot]) / double(total_count_) : 0.0;
}

double HistogramTally::mass_fraction(std::size_t slot) const {
  return total_mass_ > 0.0 ? mass_.value(slot) / total_mass_ : 0.0;
}

namespace {

void add_edges(io::Measurement& m, const std::string& name, const HistogramAxis& axis) {
  io::MeasuredArray& e = io::add_array(m, name + "_edges", axis.unit, axis.to_cgs,
                                       "Bin edges of " + axis.description + " (logarithmic bins)",
                                       {axis.bins.count + 1});
  e.values = axis.bins.edges();
}

void add_fractions(io::Measurement& m, const std::string& name, const std::string& what,
                   const std::vector<std::size_t>& shape, const HistogramTally& tally) {
  // add_array returns a reference into m.arrays: fill each before adding the next.
  io::MeasuredArray& v =
      io::add_array(m, name + "_volume_fraction", "1", 1.0,
                    "Fraction of the box's volume in each bin of " + what, shape);
  for (std::size_t s = 0; s < v.values.size(); ++s)
    v.values[s] = tally.volume_fraction(s);
  io::MeasuredArray& w = io::add_array(m, name + "_mass_fraction", "1", 1.0,
                                       "Fraction of the box's mass in each bin of " + what, shape);
  for (std::size_t s = 0; s < w.values.size(); ++s)
    w.values[s] = tally.mass_fraction(s);
}

void add_outside(io::Measurement& m, const std::string& name, const std::string& slot_name,
                 const std::string& meaning, std::size_t slot, const HistogramTally& tally) {
  m.numbers.push_back({name + "_volume_" + slot_name, tally.volume_fraction(slot), "1", 1.0,
                       "Volume fraction " + meaning});
  m.numbers.push_back({name + "_mass_" + slot_name, tally.mass_fraction(slot), "1", 1.0,
                       "Mass fraction " + meaning});
}

}  // namespace

void write_histogram(io::Measurement& m, const std::string& name, const HistogramAxis& axis,
                     const HistogramTally& tally) {
  add_edges(m, name, axis);
  add_fractions(m, name, axis.description, {axis.bins.count}, tally);
  add_outside(m, name, "underflow", "below the first bin (non-positive values included)",
              axis.bins.underflow(), tally);
  add_outside(m, name, "overflow", "above the last bin", axis.bins.overflow(), tally);
  add_outside(m, name, "undefined", "where the value is undefined (NaN)", axis.bins.undefined(),
              tally);
}

void write_joint_histogram(io::Measurement& m, const std::string& name, const HistogramAxis& a,
                           const HistogramAxis& b, const HistogramTally& tally) {
  add_edges(m, name + "_" + a.name, a);
  add_edges(m, name + "_" + b.name, b);
  add_fractions(m, name, a.description + " (first index) and " + b.description + " (second)",
                {a.bins.count, b.bins.count}, tally);
  add_outside(m, name, "outside", "outside the bins on either axis, or undefined",
              a.bins.count * b.bins.count, tally);
}

}  // namespace brume::physics
