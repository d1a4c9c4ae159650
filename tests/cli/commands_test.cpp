// The brume binary as a user meets it: help, version, check, keys, and the reference page.
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <sstream>

#include "tests/cli/run_brume.hpp"

using brume::testing::run_brume;

namespace {

const std::string source = BRUME_SOURCE_DIR;

std::string read(const std::filesystem::path& path) {
  std::ifstream in(path);
  std::stringstream text;
  text << in.rdbuf();
  return text.str();
}

}  // namespace

TEST(Commands, HelpListsEveryCommandAndExitsZero) {
  const auto r = run_brume("--help");
  EXPECT_EQ(r.exit_code, 0);
  for (const char* word : {"usage:", "run", "check", "keys", "problems", "--set", "exit codes"}) {
    EXPECT_NE(r.out.find(word), std::string::npos) << word;
  }
}

TEST(Commands, NoCommandPrintsUsageAndExitsTwo) {
  const auto r = run_brume("");
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_NE(r.err.find("usage:"), std::string::npos);
}

TEST(Commands, VersionNamesBuildAndLibraries) {
  const auto r = run_brume("--version");
  EXPECT_EQ(r.exit_code, 0);
  for (const char* word : {"brume ", "commit:", "compiler:", "flags:", "mpi:", "hdf5:", "fftw:",
                           "yaml-cpp:", "eigen:"}) {
    EXPECT_NE(r.out.find(word), std::string::npos) << word << " in\n" << r.out;
  }
}

TEST(Commands, CheckPrintsResolvedConfigurationAndDerivedQuantities) {
  const auto r = run_brume("check '" + source + "/problems/demo.yaml'");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  for (const char* word :
       {"valid", "cells: [64, 64, 64]", "limiter: mc", "Derived quantities",
        "code time: 0.9778 Myr", "cell size: 0.3125 pc", "sound speed", "memory estimate"}) {
    EXPECT_NE(r.out.find(word), std::string::npos) << word << " in\n" << r.out;
  }
}

TEST(Commands, CheckOutputIsItselfAValidConfiguration) {
  const auto first = run_brume("check -q '" + source + "/problems/demo.yaml'");
  ASSERT_EQ(first.exit_code, 0) << first.err;
  const auto file = std::filesystem::temp_directory_path() / "brume-resolved-demo.yaml";
  std::ofstream(file) << first.out;
  const auto second = run_brume("check -q '" + file.string() + "'");
  ASSERT_EQ(second.exit_code, 0) << second.err;
  // Same resolved values, apart from the first line that names the file.
  EXPECT_EQ(first.out.substr(first.out.find('\n')), second.out.substr(second.out.find('\n')));
  std::filesystem::remove(file);
}

TEST(Commands, OverridesAreAppliedAndShown) {
  const auto r =
      run_brume("check '" + source + "/problems/demo.yaml' --set box.cells=32 --set box.size=10pc");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_NE(r.out.find("cells: [32, 32, 32]"), std::string::npos) << r.out;
  EXPECT_NE(r.out.find("cell size: 0.3125 pc"), std::string::npos) << r.out;
}

TEST(Commands, KeysOfOneSection) {
  const auto r = run_brume("keys scheme");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_NE(r.out.find("riemann_solver"), std::string::npos);
  EXPECT_EQ(r.out.find("adiabatic_index"), std::string::npos);
}

TEST(Commands, ProblemsAreListed) {
  const auto r = run_brume("problems");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_NE(r.out.find("decaying_turbulence"), std::string::npos);
}

// docs/configuration.md is generated from the schema; regenerate it with
//   build/release/bin/brume keys --markdown > docs/configuration.md
TEST(Commands, ConfigurationReferenceIsUpToDate) {
  const auto r = run_brume("keys --markdown");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(r.out, read(source + "/docs/configuration.md"))
      << "docs/configuration.md is stale: regenerate it with brume keys --markdown";
}
