// The time series of a run: one row of named numbers every few steps, kept in memory and appended
// to a plain table (`timeline.txt`: a header line of names with units, then one line per row, full
// precision) as it grows, and written as HDF5 (`timeline.h5`: one dataset per column, with unit
// and description) at every checkpoint and at the end. Rank 0 only.
#pragma once

#include <filesystem>
#include <optional>
#include <string>
#include <vector>

#include "io/measurement.hpp"

namespace brume::io {

class TimelineTable {
 public:
  explicit TimelineTable(std::filesystem::path folder);

  // Rows of an earlier run continued by a restart: those of timeline.txt up to `step` (the
  // table's first column); the next append writes the table anew with them (move the earlier
  // file aside first when it has later rows). Throws std::runtime_error when it cannot be read.
  void resume(long step);
  // Appends a row; the first row fixes the columns (names, units, descriptions), later rows must
  // have the same names. Throws std::runtime_error when the file cannot be written.
  void append(const std::vector<MeasuredNumber>& row);
  // Writes timeline.h5 anew (temporary name, flush, rename).
  void write_hdf5() const;

  [[nodiscard]] std::size_t rows() const { return rows_.size(); }
  [[nodiscard]] const std::vector<MeasuredNumber>& columns() const { return columns_; }

 private:
  [[nodiscard]] std::filesystem::path text_file() const;
  std::filesystem::path folder_;
  std::vector<MeasuredNumber> columns_;  // names, units, descriptions (values unused)
  std::vector<std::vector<double>> rows_;
  bool rewrite_ = true;  // the next append writes the whole table
};

// The rows of `text` (a timeline.txt) as numbers, with the header's column names; rows after
// `step` dropped. Throws std::runtime_error naming the line for a malformed table.
struct TimelineText {
  std::vector<std::string> names;
  std::vector<std::string> units;
  std::vector<std::vector<double>> rows;
  bool dropped_rows = false;
};
[[nodiscard]] TimelineText read_timeline_text(const std::string& text, long step);

// The same for a file: nothing when it cannot be opened; std::runtime_error naming the file and
// the line for a malformed table.
[[nodiscard]] std::optional<TimelineText> read_timeline_file(const std::filesystem::path& file,
                                                             long step);

}  // namespace brume::io
