// Command-line overrides "section.key=value": the value is a YAML scalar or flow sequence
// (box.cells=[32,32,32], box.size=20pc, clock.stop_time="5 Myr") checked like a file value.
#pragma once

#include <string>

#include "io/config/found_settings.hpp"
#include "io/config/schema.hpp"

namespace brume::config {

// Reads one --set argument into found (replacing any earlier value of the key). Errors name the
// argument as "--set ARGUMENT" with the column inside it.
void read_override(const Schema& schema, const std::string& argument, FoundSettings& found);

}  // namespace brume::config
