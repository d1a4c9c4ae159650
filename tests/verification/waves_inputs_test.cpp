// The wave problems' YAML inputs as a user meets them: `brume check` accepts them, `brume run`
// runs them to their stop time, and impossible wave choices are refused with exit code 2.
#include <gtest/gtest.h>
#include <sys/wait.h>

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <stdexcept>
#include <string>

namespace brume::verification {
namespace {

namespace fs = std::filesystem;

struct Outcome {
  int exit_code = -1;
  std::string out, err;
};

std::string slurp(const fs::path& path) {
  std::ifstream in(path);
  std::stringstream text;
  text << in.rdbuf();
  return text.str();
}

fs::path scratch_folder() {
  std::string pattern = (fs::temp_directory_path() / "brume-waves-XXXXXX").string();
  if (mkdtemp(pattern.data()) == nullptr) throw std::runtime_error("mkdtemp failed");
  return pattern;
}

// Runs `brume ARGUMENTS` from a scratch folder; returns what it printed and its exit code.
Outcome brume(const std::string& arguments, const fs::path& folder) {
  const std::string command = "cd '" + folder.string() + "' && '" + BRUME_BINARY + "' " +
                              arguments + " >out.txt 2>err.txt </dev/null";
  const int status = std::system(command.c_str());
  return {WIFEXITED(status) ? WEXITSTATUS(status) : -1, slurp(folder / "out.txt"),
          slurp(folder / "err.txt")};
}

// The quoted path of problems/NAME (appended piece by piece: GCC 12 warns falsely, -Wrestrict,
// on a chain of operator+ that starts with a one-character literal).
std::string input(const std::string& name) {
  std::string quoted = "'";
  quoted += BRUME_SOURCE_DIR;
  quoted += "/problems/";
  quoted += name;
  quoted += "'";
  return quoted;
}

class WaveInputs : public ::testing::TestWithParam<const char*> {};

TEST_P(WaveInputs, CheckAndRunToTheStopTime) {
  const fs::path folder = scratch_folder();
  const std::string file = std::string(GetParam()) + ".yaml";
  const Outcome check = brume("check " + input(file), folder);
  EXPECT_EQ(check.exit_code, 0) << check.err;
  EXPECT_NE(check.out.find("name: " + std::string(GetParam())), std::string::npos) << check.out;
  const Outcome run = brume("run " + input(file) + " --out run", folder);
  EXPECT_EQ(run.exit_code, 0) << run.err;
  EXPECT_NE(run.out.find("reached the stop time"), std::string::npos) << run.out << run.err;
  EXPECT_TRUE(fs::exists(folder / "run" / "summary.txt"));
  fs::remove_all(folder);
}

INSTANTIATE_TEST_SUITE_P(Yaml, WaveInputs,
                         ::testing::Values("linear_wave", "polarized_alfven_wave"));

// The wave must exist: exit 2 and a message naming the key and the reason.
TEST(WaveInputs, ImpossibleWavesAreUserErrors) {
  const fs::path folder = scratch_folder();
  const Outcome entropy = brume("check " + input("linear_wave.yaml") +
                                    " --set gas.equation_of_state=isothermal"
                                    " --set problem.linear_wave.family=entropy",
                                folder);
  EXPECT_EQ(entropy.exit_code, 2);
  EXPECT_NE(entropy.err.find("problem.linear_wave.family"), std::string::npos) << entropy.err;
  EXPECT_NE(entropy.err.find("no entropy wave"), std::string::npos) << entropy.err;
  // B ∥ k with c_s = c_a = 1: the Alfvén speed is shared with the slow and fast waves.
  const Outcome degenerate = brume("check " + input("linear_wave.yaml") +
                                       " --set problem.linear_wave.family=alfven"
                                       " --set 'problem.linear_wave.field=[1,0,0]'",
                                   folder);
  EXPECT_EQ(degenerate.exit_code, 2);
  EXPECT_NE(degenerate.err.find("not unique"), std::string::npos) << degenerate.err;
  fs::remove_all(folder);
}

}  // namespace
}  // namespace brume::verification
