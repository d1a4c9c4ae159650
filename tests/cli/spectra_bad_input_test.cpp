// Bad `spectra` input through the brume binary: exit code 2 and one line naming the file, line,
// key and what was expected (DEVELOPERS.md, "Errors and exit codes").
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <string>

#include "tests/cli/run_brume.hpp"

namespace brume::testing {
namespace {

const std::string valid = "clock:\n  stop_time: 1 Myr\nproblem:\n  name: decaying_turbulence\n";

CommandResult check(const std::string& yaml, const std::string& folder) {
  const std::filesystem::path file = std::filesystem::path(folder) / "spectra.yaml";
  std::ofstream(file) << yaml;
  return run_brume("check '" + file.string() + "'");
}

TEST(SpectraBadInput, EveryBelowOneNamesTheKeyAndTheRange) {
  const std::string folder = fresh_folder("brume-spectra-bad");
  const CommandResult r = check(valid + "spectra:\n  every: 0\n", folder);
  EXPECT_EQ(r.exit_code, 2) << r.err;
  EXPECT_NE(r.err.find("spectra.yaml:6:10: spectra.every"), std::string::npos) << r.err;
  EXPECT_NE(r.err.find(">= 1"), std::string::npos) << r.err;
  EXPECT_EQ(r.err.find('\n'), r.err.size() - 1) << "one line: " << r.err;
  std::filesystem::remove_all(folder);
}

TEST(SpectraBadInput, NoFieldLeftIsRefused) {
  const std::string folder = fresh_folder("brume-spectra-bad");
  const CommandResult r =
      check(valid +
                "spectra:\n  velocity: false\n  kinetic_energy: false\n"
                "  cube_root_weighted_velocity: false\n  magnetic_field: false\n"
                "  density: false\n  log_density: false\n",
            folder);
  EXPECT_EQ(r.exit_code, 2) << r.err;
  EXPECT_NE(r.err.find("spectra.enabled"), std::string::npos) << r.err;
  EXPECT_NE(r.err.find("every field is switched off"), std::string::npos) << r.err;
  // Switching the diagnostic off instead is accepted.
  EXPECT_EQ(check(valid + "spectra:\n  enabled: false\n  velocity: false\n", folder).exit_code, 0);
  std::filesystem::remove_all(folder);
}

}  // namespace
}  // namespace brume::testing
