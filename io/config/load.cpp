#include "io/config/load.hpp"

#include <cerrno>
#include <cstring>
#include <fstream>
#include <sstream>
#include <stdexcept>

#include <yaml-cpp/yaml.h>

#include "io/config/document_reader.hpp"
#include "io/config/duplicate_keys.hpp"
#include "io/config/override_reader.hpp"

namespace brume::config {

namespace {

std::string read_file(const std::filesystem::path& file) {
  const std::string name = file.string();
  std::error_code code;
  const auto status = std::filesystem::status(file, code);
  if (!std::filesystem::exists(status)) {
    throw Error(name, 0, 0, "", "no such file, expected the path of a YAML configuration file");
  }
  if (std::filesystem::is_directory(status)) {
    throw Error(name, 0, 0, "", "is a folder, expected a YAML configuration file");
  }
  std::ifstream in(file, std::ios::binary);
  if (!in) {
    throw Error(name, 0, 0, "", std::string("cannot be read: ") + std::strerror(errno));
  }
  std::ostringstream text;
  text << in.rdbuf();
  if (in.bad()) throw Error(name, 0, 0, "", "reading failed part way");
  return text.str();
}

YAML::Node parse(const std::string& yaml, const std::string& file) {
  YAML::Node root;
  try {
    root = YAML::Load(yaml);
  } catch (const YAML::ParserException& e) {
    throw Error(file, e.mark.line + 1, e.mark.column + 1, "", "malformed YAML: " + e.msg);
  }
  if (root.IsNull()) {
    throw Error(file, 0, 0, "",
                "the file is empty or holds only comments, expected a mapping of sections such "
                "as 'box:'");
  }
  if (!root.IsMap()) {
    const std::string found = root.IsSequence() ? "a list" : "the value '" + root.Scalar() + "'";
    throw Error(file, root.Mark().line + 1, root.Mark().column + 1, "",
                "the top level is " + found + ", expected a mapping of sections such as 'box:'");
  }
  return root;
}

struct Resolver {
  const Schema& schema;
  const std::string& file;
  FoundSettings& found;

  // Is the section in use: its activation (and its parents') hold, judging by the value found
  // for the choice key or its default.
  bool active(const Section& section) const {
    const std::string parent = section.parent();
    if (!parent.empty() && !active(*schema.section(parent))) return false;
    if (!section.only_when) return true;
    const auto given = found.settings.find(section.only_when->key_path);
    if (given != found.settings.end()) {
      return std::get<std::string>(given->second.value) == section.only_when->value;
    }
    const KeyEntry* trigger = schema.entry(section.only_when->key_path);
    return trigger->default_value &&
           std::get<std::string>(*trigger->default_value) == section.only_when->value;
  }

  // The position that stands for a section: its name in the file, else that of the nearest
  // enclosing section present, else the file itself.
  Error error_at_section(const Section& section, const std::string& path,
                         const std::string& detail) const {
    for (std::string at = section.path; !at.empty();) {
      const auto mark = found.section_marks.find(at);
      if (mark != found.section_marks.end()) {
        return Error(file, mark->second.line + 1, mark->second.column + 1, path, detail);
      }
      const auto dot = at.rfind('.');
      at = dot == std::string::npos ? "" : at.substr(0, dot);
    }
    return Error(file, 0, 0, path, detail);
  }

  Error missing(const Section& section, const Key& key, const std::string& path) const {
    std::string detail = "required key is missing, expected " + expectation(key);
    const std::string range = range_text(key);
    if (!range.empty()) detail += " (" + range + ")";
    const bool present = found.section_marks.contains(section.path);
    detail += present ? "; add '" + key.name + ": ...' under '" + section.leaf() + ":'"
                      : "; add section '" + section.path + "' with '" + key.name + ": ...'";
    return error_at_section(section, path, detail + " or pass --set " + path + "=...");
  }

  ResolvedConfig resolve(const std::string& text) const {
    ResolvedConfig config(schema, file, text);
    for (const Section& section : schema.sections()) {
      if (!active(section)) config.set_inactive(section.path);
    }
    for (const KeyEntry& entry : schema.keys()) {
      const Section& section = schema.owner(entry);
      if (!config.active(section.path)) continue;
      const auto given = found.settings.find(entry.path);
      if (given != found.settings.end()) {
        config.assign(entry.path, given->second);
      } else if (entry.default_value) {
        config.assign(entry.path, Setting{*entry.default_value, Source{}});
      } else {
        throw missing(section, schema.spec(entry), entry.path);
      }
    }
    return config;
  }

  void check_rules(const ResolvedConfig& config) const {
    for (const Section& section : schema.sections()) {
      if (!config.active(section.path)) continue;
      for (const Validator& rule : section.validators) {
        const std::optional<Issue> issue = rule(SectionValues(config, section.path));
        if (!issue) continue;
        const std::string path = section.path + "." + issue->key;
        if (!section.find(issue->key)) {
          throw std::logic_error("configuration rule of '" + section.path +
                                 "' reports an unknown key '" + issue->key + "'");
        }
        const Source& source = config.source(path);
        switch (source.origin) {
          case Source::Origin::file:
            throw Error(file, source.line, source.column, path, issue->message);
          case Source::Origin::command_line:
            throw Error("--set " + source.where, 0, source.column, path, issue->message);
          case Source::Origin::default_value:
            throw error_at_section(section, path, issue->message + " (the default)");
        }
      }
    }
  }
};

}  // namespace

ResolvedConfig load_text(const Schema& schema, const std::string& yaml,
                         const std::string& display_name,
                         const std::vector<std::string>& overrides) {
  const YAML::Node root = parse(yaml, display_name);
  reject_duplicate_keys(root, display_name);
  FoundSettings found = read_document(schema, root, display_name);
  for (const std::string& argument : overrides)
    read_override(schema, argument, found);
  const Resolver resolver{schema, display_name, found};
  ResolvedConfig config = resolver.resolve(yaml);
  resolver.check_rules(config);
  return config;
}

ResolvedConfig load(const Schema& schema, const std::filesystem::path& file,
                    const std::vector<std::string>& overrides) {
  return load_text(schema, read_file(file), file.string(), overrides);
}

}  // namespace brume::config
