#include "io/config/schema.hpp"

#include <algorithm>
#include <set>
#include <stdexcept>

#include "io/config/value_reader.hpp"

namespace brume::config {

namespace {

[[noreturn]] void fail(const std::string& where, const std::string& what) {
  throw std::logic_error("configuration schema: " + where + ": " + what);
}

// Names are lower-case identifiers: [a-z][a-z0-9_]*.
bool valid_name(std::string_view name) {
  if (name.empty() || name.front() < 'a' || name.front() > 'z') return false;
  return std::all_of(name.begin(), name.end(), [](char c) {
    return (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9') || c == '_';
  });
}

bool valid_path(std::string_view path) {
  std::size_t start = 0;
  while (true) {
    const auto dot = path.find('.', start);
    if (!valid_name(path.substr(start, dot == std::string_view::npos ? dot : dot - start))) {
      return false;
    }
    if (dot == std::string_view::npos) return true;
    start = dot + 1;
  }
}

Value read_default(const Key& key, const std::string& path) {
  YAML::Node node;
  try {
    node = YAML::Load(*key.fallback);
  } catch (const YAML::Exception& e) {
    fail(path, "default '" + *key.fallback + "' is not YAML: " + e.msg);
  }
  const ReadResult result = read_value(key, node, YAML::Mark());
  if (!result.value) fail(path, "default '" + *key.fallback + "': " + result.failure.detail);
  return *result.value;
}

}  // namespace

Schema::Schema(std::vector<Section> sections) : sections_(std::move(sections)) {
  std::set<std::string> paths;
  for (const Section& section : sections_) {
    check_section(section);
    if (!paths.insert(section.path).second) fail(section.path, "section defined twice");
    const std::string parent = section.parent();
    if (!parent.empty() && !this->section(parent)) {
      fail(section.path, "its parent section '" + parent + "' is not in the schema");
    }
  }
  for (const Section& section : sections_) {
    const std::string parent = section.parent();
    if (parent.empty()) continue;
    if (this->section(parent)->find(section.leaf())) {
      fail(section.path, "a key of '" + parent + "' has the same name as this subsection");
    }
  }
  index_keys();
  check_activations();
}

void Schema::check_section(const Section& section) const {
  if (!valid_path(section.path)) {
    fail("'" + section.path + "'", "a section path is lower-case names joined by dots");
  }
  std::set<std::string> names;
  for (const Key& key : section.keys) {
    const std::string path = section.path + "." + key.name;
    if (!valid_name(key.name)) fail(path, "a key name is a lower-case identifier");
    if (!names.insert(key.name).second) fail(path, "key defined twice");
    if (key.kind == Kind::choice && key.choices.empty()) fail(path, "a choice key needs choices");
    if (key.count == Count::three && key.kind != Kind::integer && key.kind != Kind::real &&
        key.kind != Kind::quantity) {
      fail(path, "only integer, real and quantity keys may hold three values");
    }
    if (key.kind == Kind::quantity && key.unit.empty()) fail(path, "a quantity needs a unit");
  }
}

void Schema::index_keys() {
  for (std::size_t s = 0; s < sections_.size(); ++s) {
    for (std::size_t k = 0; k < sections_[s].keys.size(); ++k) {
      const Key& key = sections_[s].keys[k];
      KeyEntry entry;
      entry.section = s;
      entry.key = k;
      entry.path = sections_[s].path + "." + key.name;
      try {
        entry.unit_factor = unit_factor(key);
      } catch (const std::logic_error& e) {
        fail(entry.path, e.what());
      }
      if (key.fallback) entry.default_value = read_default(key, entry.path);
      keys_.push_back(std::move(entry));
    }
  }
}

void Schema::check_activations() const {
  for (const Section& section : sections_) {
    if (!section.only_when) continue;
    const KeyEntry* trigger = entry(section.only_when->key_path);
    if (!trigger || spec(*trigger).kind != Kind::choice) {
      fail(section.path,
           "activation key '" + section.only_when->key_path + "' is not a choice key");
    }
    const auto& choices = spec(*trigger).choices;
    const bool known = std::any_of(choices.begin(), choices.end(), [&](const Choice& choice) {
      return choice.name == section.only_when->value;
    });
    if (!known) {
      fail(section.path, "activation value '" + section.only_when->value + "' is not a choice of " +
                             section.only_when->key_path);
    }
  }
}

Schema Schema::combine(const std::vector<std::vector<Section>>& contributions) {
  std::vector<Section> all;
  for (const auto& sections : contributions)
    all.insert(all.end(), sections.begin(), sections.end());
  return Schema(std::move(all));
}

const Section* Schema::section(std::string_view path) const {
  for (const Section& section : sections_) {
    if (section.path == path) return &section;
  }
  return nullptr;
}

const KeyEntry* Schema::entry(std::string_view key_path) const {
  for (const KeyEntry& entry : keys_) {
    if (entry.path == key_path) return &entry;
  }
  return nullptr;
}

const Key& Schema::spec(const KeyEntry& entry) const {
  return sections_[entry.section].keys[entry.key];
}

const Section& Schema::owner(const KeyEntry& entry) const {
  return sections_[entry.section];
}

std::vector<const Section*> Schema::children(std::string_view path) const {
  std::vector<const Section*> result;
  for (const Section& section : sections_) {
    if (section.parent() == path) result.push_back(&section);
  }
  return result;
}

}  // namespace brume::config
