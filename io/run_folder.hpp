// The folder a run writes into. brume only writes into a folder it created: a folder that exists
// and holds anything is refused, so that no run overwrites outputs it did not make.
#pragma once

#include <filesystem>
#include <stdexcept>

namespace brume::io {

// Creates `folder` (and its parents). Throws RunFolderError when it exists and is not an empty
// directory, or cannot be created.
void create_run_folder(const std::filesystem::path& folder);

class RunFolderError : public std::runtime_error {
 public:
  using std::runtime_error::runtime_error;
};

}  // namespace brume::io
