// The fully resolved configuration: every key of the active sections with its value (defaults
// filled in) and where the value came from, plus the original text for provenance.
#pragma once

#include <array>
#include <map>
#include <memory>
#include <set>
#include <string>
#include <string_view>

#include "io/config/schema.hpp"
#include "io/config/value.hpp"

namespace brume::config {

struct Source {
  enum class Origin { file, command_line, default_value };
  Origin origin = Origin::default_value;
  std::string where;  // file: the file's display name; command_line: the whole --set argument
  int line = 0;       // file only, 1-based
  int column = 0;     // 1-based: in the file, or inside the --set argument

  // "input.yaml:3:9", "--set box.size=20pc" or "default".
  [[nodiscard]] std::string to_string() const;
};

struct Setting {
  Value value;
  Source source;
};

class ResolvedConfig {
 public:
  ResolvedConfig(const Schema& schema, std::string file_name, std::string original_text);

  // Typed getters by dotted path. Quantities are returned in cgs. A path that is not a key of the
  // schema, a key of another kind or count, or a key of an inactive section is a programming
  // error: std::logic_error naming the path.
  [[nodiscard]] long long integer(std::string_view path) const;
  [[nodiscard]] double real(std::string_view path) const;  // real or quantity
  [[nodiscard]] bool flag(std::string_view path) const;
  [[nodiscard]] const std::string& text(std::string_view path) const;  // text or choice
  [[nodiscard]] std::array<long long, 3> integers3(std::string_view path) const;
  [[nodiscard]] std::array<double, 3> reals3(std::string_view path) const;  // real or quantity

  [[nodiscard]] const Setting& setting(std::string_view path) const;
  [[nodiscard]] const Source& source(std::string_view path) const { return setting(path).source; }
  // True when the section applies (its activation, and those of its parents, hold).
  [[nodiscard]] bool active(std::string_view section_path) const;

  // The configuration as YAML that load_text() reads back to the same values; quantities in their
  // schema unit with the unit written out. with_comments adds descriptions and "(default)" marks.
  [[nodiscard]] std::string to_yaml(bool with_comments) const;

  [[nodiscard]] const Schema& schema() const { return *schema_; }
  [[nodiscard]] const std::string& file_name() const { return file_name_; }
  [[nodiscard]] const std::string& original_text() const { return original_text_; }

  // Filled by the loader.
  void assign(const std::string& path, Setting setting);
  void set_inactive(const std::string& section_path);

 private:
  const KeyEntry& checked(std::string_view path, const char* getter) const;

  std::shared_ptr<const Schema> schema_;
  std::string file_name_;
  std::string original_text_;
  std::map<std::string, Setting, std::less<>> settings_;
  std::set<std::string, std::less<>> inactive_;
};

// The resolved values of one section, read by name: what a section validator sees.
class SectionValues {
 public:
  SectionValues(const ResolvedConfig& config, std::string section_path)
      : config_(config), prefix_(std::move(section_path) + ".") {}

  [[nodiscard]] long long integer(std::string_view key) const { return config_.integer(at(key)); }
  [[nodiscard]] double real(std::string_view key) const { return config_.real(at(key)); }
  [[nodiscard]] bool flag(std::string_view key) const { return config_.flag(at(key)); }
  [[nodiscard]] const std::string& text(std::string_view key) const {
    return config_.text(at(key));
  }
  [[nodiscard]] std::array<long long, 3> integers3(std::string_view key) const {
    return config_.integers3(at(key));
  }
  [[nodiscard]] std::array<double, 3> reals3(std::string_view key) const {
    return config_.reals3(at(key));
  }
  // The whole configuration, for rules that look beyond the section.
  [[nodiscard]] const ResolvedConfig& config() const { return config_; }

 private:
  [[nodiscard]] std::string at(std::string_view key) const { return prefix_ + std::string(key); }

  const ResolvedConfig& config_;
  std::string prefix_;
};

}  // namespace brume::config
