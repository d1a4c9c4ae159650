// The schema: every section and key brume reads, assembled from the sections that modules
// contribute. It is the single source of truth for parsing, defaults, checks and documentation.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "io/config/section.hpp"
#include "io/config/value.hpp"

namespace brume::config {

// One key of the schema with its place and the facts derived from its specification.
struct KeyEntry {
  std::size_t section = 0;             // index into Schema::sections()
  std::size_t key = 0;                 // index into that section's keys
  std::string path;                    // "box.cells"
  double unit_factor = 1.0;            // key's unit to cgs (1 unless a quantity)
  std::optional<Value> default_value;  // the default, read and checked; none when required
};

class Schema {
 public:
  Schema() = default;
  // Checks the sections and throws std::logic_error on any inconsistency: malformed or duplicate
  // paths, a subsection without its parent, duplicate names, a key named like a subsection, a
  // choice key without choices, three values of a non-numeric kind, a bad unit, a default that
  // does not pass its own key's checks, or an activation that names no choice of a choice key.
  explicit Schema(std::vector<Section> sections);

  // The sections of several modules, in the order given.
  [[nodiscard]] static Schema combine(const std::vector<std::vector<Section>>& contributions);

  [[nodiscard]] const std::vector<Section>& sections() const { return sections_; }
  [[nodiscard]] const std::vector<KeyEntry>& keys() const { return keys_; }

  [[nodiscard]] const Section* section(std::string_view path) const;
  [[nodiscard]] const KeyEntry* entry(std::string_view key_path) const;
  [[nodiscard]] const Key& spec(const KeyEntry& entry) const;
  [[nodiscard]] const Section& owner(const KeyEntry& entry) const;

  // Direct subsections of path ("" for the top level), in schema order.
  [[nodiscard]] std::vector<const Section*> children(std::string_view path) const;

 private:
  void check_section(const Section& section) const;
  void index_keys();
  void check_activations() const;

  std::vector<Section> sections_;
  std::vector<KeyEntry> keys_;
};

}  // namespace brume::config
