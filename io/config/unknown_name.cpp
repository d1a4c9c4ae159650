#include "io/config/unknown_name.hpp"

#include <vector>

#include "solver/units/nearest_spelling.hpp"

namespace brume::config {

namespace {

// Names allowed directly inside a section: its keys, then its subsections.
std::vector<std::string> names_in(const Schema& schema, const std::string& section_path) {
  std::vector<std::string> names;
  if (const Section* section = schema.section(section_path)) {
    for (const Key& key : section->keys)
      names.push_back(key.name);
  }
  for (const Section* child : schema.children(section_path))
    names.push_back(child->leaf());
  return names;
}

// Full path of a key or section whose last component is name, outside section_path.
std::string elsewhere(const Schema& schema, const std::string& section_path,
                      const std::string& name) {
  for (const KeyEntry& entry : schema.keys()) {
    if (schema.spec(entry).name == name && schema.owner(entry).path != section_path) {
      return entry.path;
    }
  }
  for (const Section& section : schema.sections()) {
    if (section.leaf() == name && section.parent() != section_path) return section.path;
  }
  return "";
}

std::string joined(const std::vector<std::string>& names) {
  std::string list;
  for (const std::string& name : names)
    list += (list.empty() ? "" : ", ") + name;
  return list;
}

}  // namespace

std::string unknown_entry_message(const Schema& schema, const std::string& section_path,
                                  const std::string& name) {
  const std::vector<std::string> names = names_in(schema, section_path);
  std::string message = section_path.empty()
                            ? "unknown section '" + name + "'"
                            : "unknown key '" + name + "' in section '" + section_path + "'";
  if (const auto guess = units::nearest_name(name, names))
    return message + " (did you mean '" + *guess + "'?)";
  const std::string other = elsewhere(schema, section_path, name);
  if (!other.empty()) return message + " (did you mean '" + other + "'?)";
  return message + ", expected one of " + joined(names);
}

std::string unknown_path_message(const Schema& schema, const std::string& path) {
  std::vector<std::string> paths;
  for (const KeyEntry& entry : schema.keys())
    paths.push_back(entry.path);
  std::string message = "unknown key '" + path + "'";
  if (schema.section(path)) {
    return message + ": '" + path + "' is a section; give one of its keys as " + path +
           ".KEY=VALUE";
  }
  if (const auto guess = units::nearest_name(path, paths))
    return message + " (did you mean '" + *guess + "'?)";
  const auto dot = path.rfind('.');
  const std::string leaf = dot == std::string::npos ? path : path.substr(dot + 1);
  const std::string other =
      elsewhere(schema, dot == std::string::npos ? "" : path.substr(0, dot), leaf);
  if (!other.empty()) return message + " (did you mean '" + other + "'?)";
  return message + "; expected section.key=value with a key of the schema";
}

}  // namespace brume::config
