// A realistic schema for the configuration tests: the core sections with two fake problems,
// one of which has a required parameter.
#pragma once

#include <string>

#include "io/config/schema.hpp"

namespace brume::config::testing {

[[nodiscard]] const Schema& test_schema();

// The smallest valid input of test_schema().
inline const std::string minimal_input =
    "problem:\n"
    "  name: quiet_box\n"
    "clock:\n"
    "  stop_time: 1 Myr\n";

}  // namespace brume::config::testing
