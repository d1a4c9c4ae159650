#include "io/config/reference.hpp"

#include <vector>

#include "io/config/error.hpp"
#include "solver/units/nearest_spelling.hpp"

namespace brume::config {

namespace {

// Sections depth first: each followed by its subsections, in schema order.
void in_reading_order(const Schema& schema, const std::string& path,
                      std::vector<const Section*>& out) {
  for (const Section* child : schema.children(path)) {
    out.push_back(child);
    in_reading_order(schema, child->path, out);
  }
}

std::vector<const Section*> reading_order(const Schema& schema) {
  std::vector<const Section*> out;
  in_reading_order(schema, "", out);
  return out;
}

std::string cell(std::string text) {
  std::string out;
  for (char c : text)
    out += c == '|' ? std::string("\\|") : std::string(1, c);
  return out;
}

std::string code(const std::string& text) {
  return std::string("`").append(text).append("`");
}

bool same_choices(const Key& a, const Key& b) {
  if (a.choices.size() != b.choices.size()) return false;
  for (std::size_t i = 0; i < a.choices.size(); ++i) {
    if (a.choices[i].name != b.choices[i].name ||
        a.choices[i].description != b.choices[i].description) {
      return false;
    }
  }
  return true;
}

std::string choice_list(const Key& key) {
  std::string list;
  for (const Choice& choice : key.choices)
    list += (list.empty() ? "" : ", ") + choice.name;
  return list;
}

std::string allowed(const Key& key) {
  if (key.kind == Kind::choice) return choice_list(key);
  if (key.kind == Kind::boolean) return "true, false";
  return range_text(key);
}

std::string default_text(const Key& key) {
  return key.fallback ? *key.fallback : "";
}

std::string activation_note(const Section& section) {
  if (!section.only_when) return "";
  return "Applies when `" + section.only_when->key_path + "` is `" + section.only_when->value +
         "`.";
}

void markdown_section(const Section& section, std::string& out) {
  out += "\n## `" + section.path + "`\n\n" + section.description + "\n";
  const std::string note = activation_note(section);
  if (!note.empty()) out += "\n" + note + "\n";
  if (section.keys.empty()) return;
  out += "\n| key | type | unit | default | allowed | description |\n";
  out += "|---|---|---|---|---|---|\n";
  for (const Key& key : section.keys) {
    const std::string fallback = default_text(key);
    const std::string unit = key.kind == Kind::quantity ? code(cell(key.unit)) : "";
    const std::string shown_default = key.fallback ? code(cell(fallback)) : "**required**";
    out.append("| `").append(key.name).append("` | ").append(type_name(key)).append(" | ");
    out.append(unit).append(" | ").append(shown_default).append(" | ");
    out.append(cell(allowed(key))).append(" | ").append(cell(key.description)).append(" |\n");
  }
  // Choice lists, once for each run of keys that share the same choices.
  const auto& keys = section.keys;
  for (std::size_t first = 0; first < keys.size();) {
    std::size_t end = first + 1;
    if (keys[first].kind != Kind::choice) {
      first = end;
      continue;
    }
    while (end < keys.size() && keys[end].kind == Kind::choice &&
           same_choices(keys[end], keys[first])) {
      ++end;
    }
    std::string names;
    for (std::size_t k = first; k < end; ++k) {
      names.append(k == first ? "" : ", ").append(code(keys[k].name));
    }
    out += "\nChoices of " + names + ":\n\n";
    for (const Choice& choice : keys[first].choices) {
      out.append("- ").append(code(choice.name));
      if (!choice.description.empty()) out.append(": ").append(choice.description);
      out.append("\n");
    }
    first = end;
  }
}

void text_section(const Section& section, std::string& out) {
  out += "[" + section.path + "] " + section.description + "\n";
  const std::string note = activation_note(section);
  if (!note.empty())
    out += "  (applies when " + section.only_when->key_path + " is " + section.only_when->value +
           ")\n";
  for (const Key& key : section.keys) {
    std::string line =
        "  " + key.name + " = " + (key.fallback ? default_text(key) : std::string("<required>"));
    line += "    (" + type_name(key);
    if (key.kind == Kind::quantity) line += ", in " + key.unit;
    const std::string permitted = allowed(key);
    if (!permitted.empty()) line += "; " + permitted;
    line += ")";
    out += line + "\n      " + key.description + "\n";
  }
  out += "\n";
}

}  // namespace

std::string markdown_reference(const Schema& schema) {
  std::string out =
      "# Configuration reference\n\n"
      "Every section and key that brume reads from its YAML input, generated from the schema. "
      "A quantity given as a bare number is read in the unit shown; any unit of the same "
      "dimension may be written instead (`20 pc`, `6.2e19 cm`). A key of type ×3 takes "
      "`[x, y, z]` or one value for all three. Keys marked **required** have no default.\n";
  for (const Section* section : reading_order(schema))
    markdown_section(*section, out);
  return out;
}

std::string text_reference(const Schema& schema, const std::string& section_filter) {
  std::string out;
  for (const Section* section : reading_order(schema)) {
    const bool wanted = section_filter.empty() || section->path == section_filter ||
                        section->path.starts_with(section_filter + ".");
    if (wanted) text_section(*section, out);
  }
  if (out.empty()) {
    std::vector<std::string> paths;
    for (const Section& section : schema.sections())
      paths.push_back(section.path);
    std::string detail = "no such section";
    if (const auto guess = units::nearest_name(section_filter, paths)) {
      detail += " (did you mean '" + *guess + "'?)";
    }
    throw Error("section filter", 0, 0, section_filter, detail);
  }
  return out;
}

}  // namespace brume::config
