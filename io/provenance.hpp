// What built and what runs this binary: version, commit, compiler, flags, library versions. Printed
// by `brume --version` and stored in every file brume writes.
#pragma once

#include <string>
#include <utility>
#include <vector>

namespace brume::io {

// (name, value) pairs in a fixed order, e.g. ("version", "0.1.0"), ("hdf5", "1.10.8").
[[nodiscard]] std::vector<std::pair<std::string, std::string>> provenance();

}  // namespace brume::io
