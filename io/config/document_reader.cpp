#include "io/config/document_reader.hpp"

#include "io/config/error.hpp"
#include "io/config/unknown_name.hpp"
#include "io/config/value_reader.hpp"

namespace brume::config {

namespace {

struct DocumentReader {
  const Schema& schema;
  const std::string& file;
  FoundSettings found;

  [[noreturn]] void fail(const YAML::Mark& mark, const std::string& path,
                         const std::string& detail) const {
    throw Error(file, mark.line + 1, mark.column + 1, path, detail);
  }

  static std::string shape(const YAML::Node& node) {
    if (node.IsSequence()) return "a list";
    if (node.IsScalar()) return "the value '" + node.Scalar() + "'";
    return "nothing";
  }

  // The name of a mapping entry; names are plain words.
  std::string name_of(const YAML::Node& key, const std::string& section_path) const {
    if (!key.IsScalar()) {
      fail(key.Mark(), section_path,
           "found a " + std::string(key.IsMap() ? "mapping" : "list") +
               " as a name, expected a section or key name");
    }
    return key.Scalar();
  }

  void read_section(const Section& section, const YAML::Node& node, const YAML::Mark& at) {
    found.section_marks[section.path] = at;
    if (node.IsNull()) return;  // "section:" with nothing under it
    if (!node.IsMap()) {
      fail(node.Mark(), section.path,
           "found " + shape(node) + ", expected a mapping of keys such as '" +
               (section.keys.empty() ? std::string("name") : section.keys.front().name) +
               ": ...' indented under '" + section.leaf() + ":'");
    }
    for (auto it = node.begin(); it != node.end(); ++it) {
      const std::string name = name_of(it->first, section.path);
      const YAML::Mark mark = it->first.Mark();
      const std::string path = section.path + "." + name;
      if (const Key* key = section.find(name)) {
        const ReadResult result = read_value(*key, it->second, mark);
        if (!result.value) {
          fail(result.failure.mark, path + result.failure.path_suffix, result.failure.detail);
        }
        Source source{Source::Origin::file, file, mark.line + 1, mark.column + 1};
        found.settings[path] = Setting{*result.value, source};
      } else if (const Section* child = schema.section(path);
                 child && name.find('.') == std::string::npos) {
        read_section(*child, it->second, mark);
      } else {
        fail(mark, path, unknown_entry_message(schema, section.path, name));
      }
    }
  }

  void read_root(const YAML::Node& root) {
    for (auto it = root.begin(); it != root.end(); ++it) {
      const std::string name = name_of(it->first, "");
      const YAML::Mark mark = it->first.Mark();
      const Section* section = schema.section(name);
      if (section && !section->parent().empty()) section = nullptr;  // nested ones go inside
      if (!section) fail(mark, name, unknown_entry_message(schema, "", name));
      read_section(*section, it->second, mark);
    }
  }
};

}  // namespace

FoundSettings read_document(const Schema& schema, const YAML::Node& root, const std::string& file) {
  DocumentReader reader{schema, file, {}};
  reader.read_root(root);
  return std::move(reader.found);
}

}  // namespace brume::config
