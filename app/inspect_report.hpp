// What `brume inspect` prints about a snapshot file: its header, fields, provenance and integrity,
// as text for people or as JSON for scripts.
#pragma once

#include <string>
#include <vector>

#include "io/snapshot_integrity.hpp"
#include "io/snapshot_reader.hpp"

namespace brume::app {

[[nodiscard]] std::string inspect_text(const io::SnapshotReader& reader,
                                       const io::SnapshotIntegrity& integrity,
                                       bool with_configuration);

[[nodiscard]] std::string inspect_json(const io::SnapshotReader& reader,
                                       const io::SnapshotIntegrity& integrity);

// What makes the file unsound, one phrase each ("3 non-finite values in density"); empty when it
// is sound.
[[nodiscard]] std::vector<std::string> integrity_problems(const io::SnapshotIntegrity& integrity);

}  // namespace brume::app
