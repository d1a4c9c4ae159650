#include "io/run_folder.hpp"

#include <system_error>

namespace brume::io {

void create_run_folder(const std::filesystem::path& folder) {
  namespace fs = std::filesystem;
  std::error_code error;
  const fs::file_status status = fs::status(folder, error);
  if (fs::exists(status)) {
    if (!fs::is_directory(status)) {
      throw RunFolderError("run folder " + folder.string() +
                           " exists and is not a directory; choose another with --out");
    }
    if (!fs::is_empty(folder, error) || error) {
      throw RunFolderError("run folder " + folder.string() +
                           " already holds files; brume writes only into a new or empty folder "
                           "(choose another with --out, or remove it)");
    }
    return;
  }
  fs::create_directories(folder, error);
  if (error) {
    throw RunFolderError("cannot create run folder " + folder.string() + ": " + error.message());
  }
}

}  // namespace brume::io
