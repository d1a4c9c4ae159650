// Bad input to `brume bench` and `brume bench scaling`: exit code 2 and one message that names what
// was wrong and what was expected, before anything is measured.
#include <gtest/gtest.h>

#include <string>

#include "tests/cli/run_brume.hpp"

namespace {

using brume::testing::run_brume;

void expect_user_error(const std::string& arguments, const std::string& words) {
  const auto r = run_brume(arguments);
  EXPECT_EQ(r.exit_code, 2) << arguments << ": " << r.err;
  EXPECT_EQ(r.out, "") << arguments;
  EXPECT_EQ(r.err.find('\n'), r.err.size() - 1) << "one line: " << r.err;
  EXPECT_NE(r.err.find(words), std::string::npos) << "'" << words << "' in: " << r.err;
}

TEST(BenchInput, UnknownModeIsNamedWithWhatBenchAccepts) {
  expect_user_error("bench scalling", "found 'scalling' (brume bench [scaling] [--json]");
}

TEST(BenchInput, ScalingRefusesTooFewCellsAndNonPositiveSteps) {
  expect_user_error("bench scaling --cells 3", "--cells expects at least 4 (a 4³ box)");
  expect_user_error("bench scaling --steps 0", "--steps expects a positive integer, found '0'");
  expect_user_error("bench scaling --cells 8x", "--cells expects a positive integer, found '8x'");
}

}  // namespace
