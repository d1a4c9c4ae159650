#include "io/config/resolved.hpp"

#include <stdexcept>

namespace brume::config {

std::string Source::to_string() const {
  switch (origin) {
    case Origin::file:
      return where + ":" + std::to_string(line) + ":" + std::to_string(column);
    case Origin::command_line:
      return "--set " + where;
    case Origin::default_value:
      return "default";
  }
  return "";
}

ResolvedConfig::ResolvedConfig(const Schema& schema, std::string file_name,
                               std::string original_text)
    : schema_(std::make_shared<const Schema>(schema)),
      file_name_(std::move(file_name)),
      original_text_(std::move(original_text)) {}

void ResolvedConfig::assign(const std::string& path, Setting setting) {
  settings_.insert_or_assign(path, std::move(setting));
}

void ResolvedConfig::set_inactive(const std::string& section_path) {
  inactive_.insert(section_path);
}

bool ResolvedConfig::active(std::string_view section_path) const {
  return !inactive_.contains(section_path);
}

const Setting& ResolvedConfig::setting(std::string_view path) const {
  const KeyEntry* entry = schema_->entry(path);
  if (!entry) throw std::logic_error("configuration: no key '" + std::string(path) + "'");
  const Section& section = schema_->owner(*entry);
  if (!active(section.path)) {
    throw std::logic_error("configuration: key '" + std::string(path) + "' read but section '" +
                           section.path + "' is not in use");
  }
  const auto found = settings_.find(path);
  if (found == settings_.end()) {
    throw std::logic_error("configuration: key '" + std::string(path) + "' was never resolved");
  }
  return found->second;
}

const KeyEntry& ResolvedConfig::checked(std::string_view path, const char* getter) const {
  const KeyEntry* entry = schema_->entry(path);
  if (!entry) throw std::logic_error("configuration: no key '" + std::string(path) + "'");
  const Key& key = schema_->spec(*entry);
  const bool three = key.count == Count::three;
  const std::string_view name(getter);
  bool fits = false;
  if (name == "integer") fits = key.kind == Kind::integer && !three;
  if (name == "real") fits = (key.kind == Kind::real || key.kind == Kind::quantity) && !three;
  if (name == "flag") fits = key.kind == Kind::boolean;
  if (name == "text") fits = key.kind == Kind::text || key.kind == Kind::choice;
  if (name == "integers3") fits = key.kind == Kind::integer && three;
  if (name == "reals3") fits = (key.kind == Kind::real || key.kind == Kind::quantity) && three;
  if (!fits) {
    throw std::logic_error("configuration: key '" + std::string(path) + "' is " + type_name(key) +
                           ", not readable with " + std::string(getter) + "()");
  }
  return *entry;
}

long long ResolvedConfig::integer(std::string_view path) const {
  checked(path, "integer");
  return std::get<long long>(setting(path).value);
}

double ResolvedConfig::real(std::string_view path) const {
  const KeyEntry& entry = checked(path, "real");
  return std::get<double>(setting(path).value) * entry.unit_factor;
}

bool ResolvedConfig::flag(std::string_view path) const {
  checked(path, "flag");
  return std::get<bool>(setting(path).value);
}

const std::string& ResolvedConfig::text(std::string_view path) const {
  checked(path, "text");
  return std::get<std::string>(setting(path).value);
}

std::array<long long, 3> ResolvedConfig::integers3(std::string_view path) const {
  checked(path, "integers3");
  return std::get<std::array<long long, 3>>(setting(path).value);
}

std::array<double, 3> ResolvedConfig::reals3(std::string_view path) const {
  const KeyEntry& entry = checked(path, "reals3");
  std::array<double, 3> values = std::get<std::array<double, 3>>(setting(path).value);
  for (double& value : values)
    value *= entry.unit_factor;
  return values;
}

}  // namespace brume::config
