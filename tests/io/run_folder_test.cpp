#include "io/run_folder.hpp"

#include <gtest/gtest.h>

#include <fstream>

namespace fs = std::filesystem;
using brume::io::create_run_folder;
using brume::io::RunFolderError;

TEST(RunFolder, CreatesNewAndAcceptsEmptyFolders) {
  const fs::path root = fs::temp_directory_path() / "brume-run-folder-new";
  fs::remove_all(root);
  create_run_folder(root / "a" / "b");
  EXPECT_TRUE(fs::is_directory(root / "a" / "b"));
  EXPECT_NO_THROW(create_run_folder(root / "a" / "b"));  // exists, empty
  fs::remove_all(root);
}

TEST(RunFolder, RefusesFoldersThatHoldFilesAndPlainFiles) {
  const fs::path root = fs::temp_directory_path() / "brume-run-folder-full";
  fs::remove_all(root);
  fs::create_directories(root);
  std::ofstream(root / "results.h5") << "someone's data";
  EXPECT_THROW(create_run_folder(root), RunFolderError);
  EXPECT_THROW(create_run_folder(root / "results.h5"), RunFolderError);
  EXPECT_TRUE(fs::exists(root / "results.h5"));
  fs::remove_all(root);
}
