// Writing a file so that a crash never leaves it half written: the text goes to a temporary name in
// the same folder, is flushed to disk, and is then renamed over the final name.
#pragma once

#include <filesystem>
#include <string>
#include <string_view>

namespace brume::io {

// Throws std::runtime_error (with the path and the system's reason) when any step fails; the
// temporary file is removed then, and an existing file of the final name is left untouched.
void write_file_atomically(const std::filesystem::path& path, std::string_view text);

// fsyncs a closed file, so that a rename never publishes data still in the page cache; false when
// the file cannot be opened or the flush fails.
[[nodiscard]] bool flush_to_disk(const std::string& path);

}  // namespace brume::io
