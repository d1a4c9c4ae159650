// A warning of the run's statistics is printed once, the first time, however many statistics
// files repeat it (each file keeps its own; docs/statistics.md). Common practice, no source.
#include <gtest/gtest.h>

#include <filesystem>
#include <string>

#include "tests/cli/run_brume.hpp"

namespace brume::testing {
namespace {

namespace fs = std::filesystem;

std::size_t occurrences(const std::string& text, const std::string& part) {
  std::size_t count = 0;
  for (std::size_t at = text.find(part); at != std::string::npos; at = text.find(part, at + 1))
    ++count;
  return count;
}

TEST(StatisticsWarnings, ARepeatedWarningIsPrintedOnce) {
  const std::string folder = fresh_folder("brume-warnings");
  const std::string run = folder + "/run";
  const CommandResult r = run_brume("run '" + std::string(BRUME_SOURCE_DIR) +
                                    "/tests/cli/plot_box.yaml' --out '" + run + "'");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  int files = 0;
  for (const auto& entry : fs::directory_iterator(run))
    files += entry.path().filename().string().rfind("statistics-", 0) == 0 ? 1 : 0;
  ASSERT_GE(files, 2);  // the Jeans diagnostic warns in each of them
  const std::string log = r.out + r.err;
  EXPECT_EQ(occurrences(log, "jeans: brume has no self-gravity"), 1u) << log;
  EXPECT_EQ(occurrences(log, "statistics warnings that repeat are not printed again"), 1u) << log;
  fs::remove_all(folder);
}

}  // namespace
}  // namespace brume::testing
