// The checkpoints of a run folder: checkpoint-NNNN.h5, numbered in the order they were written.
#pragma once

#include <filesystem>
#include <optional>
#include <string>
#include <vector>

namespace brume::app {

// checkpoint-NNNN.h5 (four digits at least).
[[nodiscard]] std::filesystem::path checkpoint_name(int number);

// NNNN of a file named PREFIX-NNNN.h5 (e.g. "checkpoint", "snapshot"), if it is one; temporary
// files (PREFIX-NNNN.h5.partial-PID) are not.
[[nodiscard]] std::optional<int> output_number(const std::filesystem::path& file,
                                               const std::string& prefix);

// The number of a checkpoint file name, if it is one.
[[nodiscard]] inline std::optional<int> checkpoint_number(const std::filesystem::path& file) {
  return output_number(file, "checkpoint");
}

// The checkpoints in `folder`, oldest (lowest number) first; temporary files are not listed.
[[nodiscard]] std::vector<std::filesystem::path> list_checkpoints(
    const std::filesystem::path& folder);

// What `brume run --restart PATH` continues from: PATH itself when it is a file, the newest
// checkpoint of PATH when it is a folder, or of its parent when PATH ends in "latest".
// Throws UserError when there is none.
[[nodiscard]] std::filesystem::path restart_file(const std::filesystem::path& path);

// Removes the oldest checkpoints of `folder` until `keep` remain (keep ≥ 1).
void prune_checkpoints(const std::filesystem::path& folder, int keep);

}  // namespace brume::app
