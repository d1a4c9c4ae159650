// The whole configuration schema of brume: the core sections, then every module's and problem's.
#pragma once

#include "io/config/schema.hpp"

namespace brume::app {

[[nodiscard]] const config::Schema& brume_schema();

}  // namespace brume::app
