// The one error type of the configuration engine: a user mistake in an input file or a --set
// argument, with where it is (file, 1-based line and column) and which key it concerns.
#pragma once

#include <stdexcept>
#include <string>

namespace brume::config {

class Error : public std::runtime_error {
 public:
  // line/column 0 mean "not known" and are left out of the message. The full message reads
  // "FILE:LINE:COL: KEY.PATH: DETAIL" with the parts that are known.
  Error(std::string file, int line, int column, std::string key_path, std::string detail);

  [[nodiscard]] const std::string& file() const { return file_; }
  [[nodiscard]] int line() const { return line_; }
  [[nodiscard]] int column() const { return column_; }
  [[nodiscard]] const std::string& key_path() const { return key_path_; }
  [[nodiscard]] const std::string& detail() const { return detail_; }

 private:
  std::string file_;
  int line_;
  int column_;
  std::string key_path_;
  std::string detail_;
};

}  // namespace brume::config
