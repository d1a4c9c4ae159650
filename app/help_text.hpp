// What `brume --help` and `brume --version` print.
#pragma once

#include <string>

namespace brume::app {

[[nodiscard]] std::string help_text();
[[nodiscard]] std::string version_text();

}  // namespace brume::app
