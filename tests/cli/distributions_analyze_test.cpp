// `brume analyze` with the distributions and Jeans diagnostics, end to end: a small driven box
// run, analysed on 1 and 2 ranks (bitwise the same), every histogram, the Jeans fractions, the
// critical density and the multi-free-fall integral against numpy/scipy computed from the
// snapshot's fields with h5py, to 1e-10 relative (tests/cli/distributions_reference.py says
// why that tolerance holds).
#include <gtest/gtest.h>

#include <cstdio>
#include <filesystem>
#include <string>

#include "tests/cli/run_brume.hpp"
#include "tests/support/run_python.hpp"

namespace brume::testing {
namespace {

TEST(DistributionsAnalyze, MatchesNumpyOnOneAndTwoRanks) {
  const std::string folder = fresh_folder("distributions-analyze");
  // φ_x and the length chosen so that part of the gas, not all or none, lies above the critical
  // density and below the resolution length (the script refuses a test that exercises neither).
  const PythonResult r = run_python(
      source_script("tests/cli/distributions_reference.py"),
      {BRUME_BINARY, source_script("tests/cli/distributions_box.yaml").string(), folder + "/work",
       "--set", "jeans.critical_density_factor=0.35", "--set", "jeans.length=66pc", "--set",
       "cooling.enabled=true", "--set", "jeans.efficiency=0.3", "--set", "jeans.time_factor=1.5"});
  std::printf("%s", r.output.c_str());
  EXPECT_EQ(r.exit_code, 0) << r.output;
  if (r.exit_code == 0) std::filesystem::remove_all(folder);
}

// `brume check` on the box with one override (appended piecewise: g++ 12 warns falsely on
// "literal" + std::string under -Werror=restrict).
std::string check_with(const std::string& override_text) {
  std::string command = "check '";
  command += source_script("tests/cli/distributions_box.yaml").string();
  command += "' --set ";
  command += override_text;
  return command;
}

// Bad settings stop with exit code 2 and one message naming the key and what is expected
// (DEVELOPERS.md, "Errors and exit codes").
TEST(DistributionsAnalyze, BadSettingsAreRefused) {
  const CommandResult reversed = run_brume(check_with("distributions.density_lowest=1e7cm^-3"));
  EXPECT_EQ(reversed.exit_code, 2);
  EXPECT_NE(reversed.err.find("distributions.density_highest: must exceed density_lowest"),
            std::string::npos)
      << reversed.err;
  const CommandResult negative = run_brume(check_with("jeans.cells=-1"));
  EXPECT_EQ(negative.exit_code, 2);
  EXPECT_NE(negative.err.find("jeans.cells: found -1, expected a value > 0"), std::string::npos)
      << negative.err;
  const CommandResult pdf = run_brume(check_with("jeans.pdf_highest=-30"));
  EXPECT_EQ(pdf.exit_code, 2);
  EXPECT_NE(pdf.err.find("jeans.pdf_highest: must exceed pdf_lowest"), std::string::npos)
      << pdf.err;
}

}  // namespace
}  // namespace brume::testing
