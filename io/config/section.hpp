// A section of the configuration: a dotted path ("box.boundaries"), a description, its keys and
// the cross-key rules that check its resolved values.
#pragma once

#include <functional>
#include <optional>
#include <string>
#include <vector>

#include "io/config/key.hpp"

namespace brume::config {

class SectionValues;  // resolved.hpp: read access to one section's resolved values

// A broken cross-key rule, reported at the position of `key` (a key of the section).
struct Issue {
  std::string key;
  std::string message;
};

using Validator = std::function<std::optional<Issue>(const SectionValues&)>;

// A section that applies only when a choice key elsewhere has a given value, e.g. the parameters
// "problem.blast_wave" apply when problem.name is blast_wave. An inactive section is still
// checked when present in the input, but its required keys may be missing and its values are
// neither kept nor written.
struct Activation {
  std::string key_path;  // full dotted path of a choice key
  std::string value;     // the choice that activates the section
};

struct Section {
  std::string path;
  std::string description;
  std::vector<Key> keys;
  std::vector<Validator> validators;
  std::optional<Activation> only_when;

  [[nodiscard]] const Key* find(std::string_view key_name) const;
  // The last component of the path ("boundaries" for "box.boundaries").
  [[nodiscard]] std::string leaf() const;
  // The path of the enclosing section, empty for a top-level section.
  [[nodiscard]] std::string parent() const;
};

}  // namespace brume::config
