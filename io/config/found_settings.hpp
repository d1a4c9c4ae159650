// What the loader has gathered before defaults and rules are applied: the settings given in the
// file and on the command line, and where each section appears in the file.
#pragma once

#include <map>
#include <string>

#include <yaml-cpp/yaml.h>

#include "io/config/resolved.hpp"

namespace brume::config {

struct FoundSettings {
  std::map<std::string, Setting> settings;          // by key path
  std::map<std::string, YAML::Mark> section_marks;  // sections present in the file: their name
};

}  // namespace brume::config
