#include "io/atomic_file.hpp"

#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <sstream>

#include "tests/support/scratch_files.hpp"

namespace fs = std::filesystem;

namespace {

std::string read(const fs::path& path) {
  return brume::testing::text_of(path);
}

fs::path scratch(const char* name) {
  return brume::testing::scratch_folder("atomic", name);
}

}  // namespace

TEST(AtomicFile, WritesAndReplacesWithoutLeavingTemporaries) {
  const fs::path folder = scratch("replace");
  const fs::path file = folder / "config.yaml";
  brume::io::write_file_atomically(file, "first\n");
  EXPECT_EQ(read(file), "first\n");
  brume::io::write_file_atomically(file, "second\n");
  EXPECT_EQ(read(file), "second\n");
  EXPECT_EQ(std::distance(fs::directory_iterator(folder), fs::directory_iterator{}), 1);
  fs::remove_all(folder);
}

TEST(AtomicFile, FailureLeavesTheExistingFileIntact) {
  const fs::path folder = scratch("fail");
  const fs::path file = folder / "kept.txt";
  brume::io::write_file_atomically(file, "precious\n");
  // A path whose parent folder does not exist cannot be written: the call throws and names it.
  try {
    brume::io::write_file_atomically(folder / "missing" / "kept.txt", "lost\n");
    FAIL() << "expected an exception";
  } catch (const std::runtime_error& error) {
    EXPECT_NE(std::string(error.what()).find("missing/kept.txt"), std::string::npos);
  }
  EXPECT_EQ(read(file), "precious\n");
  fs::remove_all(folder);
}
