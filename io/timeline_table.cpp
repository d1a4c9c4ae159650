#include "io/timeline_table.hpp"

#include <unistd.h>

#include <cstdio>
#include <fstream>
#include <sstream>
#include <stdexcept>

#include "io/atomic_file.hpp"
#include "io/hdf5_handles.hpp"
#include "io/statistics_file.hpp"

namespace brume::io {

namespace {

constexpr const char* columns_mark = "# columns:";

std::string number_text(double value) {
  char text[40];
  std::snprintf(text, sizeof text, "%.17g", value);
  return text;
}

std::string row_text(const std::vector<double>& row) {
  std::string line;
  for (std::size_t n = 0; n < row.size(); ++n) {
    if (n > 0) line += ' ';
    line += number_text(row[n]);
  }
  line += '\n';
  return line;
}

std::string header_text(const std::vector<MeasuredNumber>& columns) {
  std::string text =
      "# brume timeline: one row every statistics.timeline_every steps (docs/statistics.md)\n";
  text += columns_mark;
  for (const MeasuredNumber& c : columns) {
    text += ' ';
    text += c.name;
    text += '[';
    text += c.unit;
    text += ']';
  }
  text += '\n';
  return text;
}

}  // namespace

TimelineText read_timeline_text(const std::string& text, long step) {
  TimelineText t;
  std::istringstream lines(text);
  std::string line;
  int number = 0;
  while (std::getline(lines, line)) {
    ++number;
    if (line.rfind(columns_mark, 0) == 0) {
      std::istringstream words(line.substr(std::string(columns_mark).size()));
      std::string word;
      while (words >> word) {
        const std::size_t open = word.find('[');
        if (open == std::string::npos || word.back() != ']')
          throw std::runtime_error("line " + std::to_string(number) + ": column " + word +
                                   " is not name[unit]");
        t.names.push_back(word.substr(0, open));
        t.units.push_back(word.substr(open + 1, word.size() - open - 2));
      }
      continue;
    }
    if (line.empty() || line[0] == '#') continue;
    std::istringstream words(line);
    std::vector<double> row;
    std::string word;
    while (words >> word) {
      std::size_t used = 0;
      double value = 0.0;
      try {
        value = std::stod(word, &used);
      } catch (const std::exception&) {
        used = 0;
      }
      if (used != word.size())
        throw std::runtime_error("line " + std::to_string(number) + ": '" + word +
                                 "' is not a number");
      row.push_back(value);
    }
    if (row.size() != t.names.size())
      throw std::runtime_error("line " + std::to_string(number) + ": " +
                               std::to_string(row.size()) + " values for " +
                               std::to_string(t.names.size()) + " columns");
    if (row.front() > double(step)) {
      t.dropped_rows = true;
      continue;
    }
    t.rows.push_back(std::move(row));
  }
  return t;
}

TimelineTable::TimelineTable(std::filesystem::path folder) : folder_(std::move(folder)) {}

std::filesystem::path TimelineTable::text_file() const {
  return folder_ / "timeline.txt";
}

std::optional<TimelineText> read_timeline_file(const std::filesystem::path& file, long step) {
  std::ifstream in(file);
  if (!in) return std::nullopt;
  std::stringstream text;
  text << in.rdbuf();
  try {
    return read_timeline_text(text.str(), step);
  } catch (const std::runtime_error& error) {
    throw std::runtime_error(file.string() + ": " + error.what());
  }
}

void TimelineTable::resume(long step) {
  std::optional<TimelineText> t = read_timeline_file(text_file(), step);
  if (!t) return;  // the earlier run wrote no row
  columns_.clear();
  for (std::size_t n = 0; n < t->names.size(); ++n)
    columns_.push_back(MeasuredNumber{t->names[n], 0.0, t->units[n], 1.0, ""});
  rows_ = std::move(t->rows);
  rewrite_ = true;
}

void TimelineTable::append(const std::vector<MeasuredNumber>& row) {
  if (columns_.empty()) {
    columns_ = row;
  } else if (columns_.size() != row.size()) {
    throw std::runtime_error("timeline: a row of " + std::to_string(row.size()) + " numbers for " +
                             std::to_string(columns_.size()) + " columns");
  }
  // Resumed columns carry no description or factor: take them from the first new row.
  for (std::size_t n = 0; n < row.size(); ++n) {
    if (columns_[n].name != row[n].name)
      throw std::runtime_error("timeline: column " + row[n].name + " where " + columns_[n].name +
                               " was");
    columns_[n].description = row[n].description;
    columns_[n].to_cgs = row[n].to_cgs;
  }
  std::vector<double> values;
  for (const MeasuredNumber& n : row)
    values.push_back(n.value);
  rows_.push_back(values);
  if (rewrite_) {
    // A new table, or a resumed one: written whole, with the rows it keeps.
    std::string text = header_text(columns_);
    for (const std::vector<double>& r : rows_)
      text += row_text(r);
    write_file_atomically(text_file(), text);
    rewrite_ = false;
    return;
  }
  std::FILE* out = std::fopen(text_file().c_str(), "a");
  if (out == nullptr) throw std::runtime_error("cannot write " + text_file().string());
  const bool ok = std::fputs(row_text(values).c_str(), out) >= 0;
  if ((std::fclose(out) != 0) || !ok)
    throw std::runtime_error("cannot write " + text_file().string());
}

void TimelineTable::write_hdf5() const {
  const std::filesystem::path file = folder_ / "timeline.h5";
  const std::string temporary =
      file.string() + ".partial-" + std::to_string(static_cast<long>(::getpid()));
  H5Eset_auto2(H5E_DEFAULT, nullptr, nullptr);
  try {
    {
      H5Handle h5(checked(H5Fcreate(temporary.c_str(), H5F_ACC_TRUNC, H5P_DEFAULT, H5P_DEFAULT),
                          "creating " + temporary),
                  H5Fclose);
      write_attribute(h5.get(), "format", std::string("brume-timeline-1"));
      for (std::size_t c = 0; c < columns_.size(); ++c) {
        MeasuredArray column{columns_[c].name,        columns_[c].unit, columns_[c].to_cgs,
                             columns_[c].description, {rows_.size()},   {}};
        for (const std::vector<double>& row : rows_)
          column.values.push_back(row[c]);
        write_measured_array(h5.get(), column);
      }
      if (!h5.close()) throw std::runtime_error("closing " + temporary + " failed");
    }
    if (!flush_to_disk(temporary)) throw std::runtime_error("flushing " + temporary + " failed");
    if (std::rename(temporary.c_str(), file.c_str()) != 0)
      throw std::runtime_error("renaming " + temporary + " failed");
  } catch (const std::exception& error) {
    std::remove(temporary.c_str());
    throw std::runtime_error("cannot write " + file.string() + ": " + error.what());
  }
}

}  // namespace brume::io
