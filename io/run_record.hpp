// What a checkpoint holds besides the fields: the run's own state (output schedules, counters,
// totals at the start, later the forcing's random state), as named numbers in the HDF5 group
// /run. A snapshot file with this group is a checkpoint.
#pragma once

#include <hdf5.h>

#include <optional>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

namespace brume::io {

class RunRecordError : public std::runtime_error {
 public:
  using std::runtime_error::runtime_error;
};

class RunRecord {
 public:
  void set(const std::string& name, double value);
  void set(const std::string& name, long long value);
  void set(const std::string& name, std::vector<double> values);
  // Throw RunRecordError naming the entry when it is missing.
  [[nodiscard]] double real(const std::string& name) const;
  [[nodiscard]] long long integer(const std::string& name) const;
  // An array entry; empty when absent (an empty array is not stored).
  [[nodiscard]] std::vector<double> array(const std::string& name) const;

  [[nodiscard]] const std::vector<std::pair<std::string, double>>& reals() const { return reals_; }
  [[nodiscard]] const std::vector<std::pair<std::string, long long>>& integers() const {
    return integers_;
  }
  [[nodiscard]] const std::vector<std::pair<std::string, std::vector<double>>>& arrays() const {
    return arrays_;
  }

 private:
  std::vector<std::pair<std::string, double>> reals_;
  std::vector<std::pair<std::string, long long>> integers_;
  std::vector<std::pair<std::string, std::vector<double>>> arrays_;
};

// Writes `record` as the attributes of a new group /run under `file`.
void write_run_record(hid_t file, const RunRecord& record);
// The group /run of `file`, if it has one. Throws RunRecordError for an entry of another kind.
[[nodiscard]] std::optional<RunRecord> read_run_record(hid_t file);

}  // namespace brume::io
