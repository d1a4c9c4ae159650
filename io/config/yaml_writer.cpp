// ResolvedConfig::to_yaml: the resolved configuration written back as YAML, section by section
// in schema order, subsections nested inside their parents.
#include <string>

#include "io/config/resolved.hpp"
#include "io/config/value_text.hpp"

namespace brume::config {

namespace {

struct YamlWriter {
  const ResolvedConfig& config;
  bool with_comments;

  std::string section(const Section& section, int depth) const {
    if (!config.active(section.path)) return "";
    const std::string indent(static_cast<std::size_t>(2 * depth), ' ');
    std::string body;
    for (const Key& key : section.keys) {
      const Setting& setting = config.setting(section.path + "." + key.name);
      std::string line = indent + "  " + key.name + ": " + value_text(key, setting.value);
      if (with_comments) {
        line += "  # " + key.description;
        if (setting.source.origin == Source::Origin::default_value) line += " (default)";
      }
      body += line + "\n";
    }
    for (const Section* child : config.schema().children(section.path)) {
      body += this->section(*child, depth + 1);
    }
    if (body.empty()) return "";
    std::string head;
    if (with_comments) head += indent + "# " + section.description + "\n";
    return head + indent + section.leaf() + ":\n" + body;
  }
};

}  // namespace

std::string ResolvedConfig::to_yaml(bool with_comments) const {
  const YamlWriter writer{*this, with_comments};
  std::string out;
  if (with_comments) out += "# brume configuration resolved from " + file_name_ + "\n";
  for (const Section* top : schema_->children("")) {
    const std::string text = writer.section(*top, 0);
    if (text.empty()) continue;
    if (!out.empty()) out += "\n";
    out += text;
  }
  return out;
}

}  // namespace brume::config
