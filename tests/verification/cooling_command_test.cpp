// `brume check` with heating and cooling: the equilibrium figures it prints, and the user errors
// of the cooling configuration (bad tables, isothermal gas) with exit code 2 and a message that
// names the file, the line and what was expected.
#include <gtest/gtest.h>
#include <sys/wait.h>
#include <unistd.h>

#include <cstdio>
#include <filesystem>
#include <fstream>
#include <string>

namespace {

struct Command {
  int exit_code = -1;
  std::string output;  // standard output and error together
};

Command brume(const std::string& arguments) {
  const std::string line = std::string(BRUME_BINARY) + " " + arguments + " 2>&1";
  Command result;
  FILE* pipe = ::popen(line.c_str(), "r");
  if (!pipe) return result;
  char buffer[4096];
  while (std::fgets(buffer, sizeof buffer, pipe))
    result.output += buffer;
  const int status = ::pclose(pipe);
  result.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
  return result;
}

const std::string input =
    std::string("'") + BRUME_SOURCE_DIR + "/problems/thermal_instability.yaml'";

std::string table_file(const std::string& name, const std::string& text) {
  const auto path = std::filesystem::temp_directory_path() /
                    ("brume-cooling-cli-" + std::to_string(long(::getpid())) + "-" + name);
  std::ofstream(path) << text;
  return path.string();
}

TEST(CoolingCommand, CheckPrintsTheEquilibriumFigures) {
  const Command r = brume("check " + input);
  ASSERT_EQ(r.exit_code, 0) << r.output;
  // Values of the Koyama & Inutsuka fit as brume computes them (tests/physics checks them
  // against scipy); here only that check prints them.
  EXPECT_NE(r.output.find("cooling: T_eq at n = 1 cm^-3: 5006 K"), std::string::npos) << r.output;
  EXPECT_NE(r.output.find("cooling: isobarically unstable range: n "), std::string::npos);
  EXPECT_NE(r.output.find("cooling: two-phase pressure range P/k_B: "), std::string::npos);
}

TEST(CoolingCommand, ProblemChosenByPressureOnTheUnstableBranch) {
  const Command r = brume("check " + input +
                          " --set problem.thermal_instability.chosen_by=pressure"
                          " --set 'problem.thermal_instability.pressure=3000 K cm^-3'");
  ASSERT_EQ(r.exit_code, 0) << r.output;
  // P/k_B = 3000 K cm^-3 on the unstable branch of the fit: n = 1.912 cm^-3, T = 1569 K by
  // scipy.optimize.brentq on the fit, so the adiabatic sound speed √(γ k_B T/(μ m_H)) is
  // 4.121 km/s (computed with /usr/bin/python3 when the test was written); printed to 4 digits.
  EXPECT_NE(r.output.find("typical sound speed: 4.121 km/s"), std::string::npos) << r.output;
}

TEST(CoolingCommand, ProblemChosenByPressureOutsideTheRangeIsAUserError) {
  const Command r = brume("check " + input +
                          " --set problem.thermal_instability.chosen_by=pressure"
                          " --set 'problem.thermal_instability.pressure=1e5 K cm^-3'");
  EXPECT_EQ(r.exit_code, 2) << r.output;
  EXPECT_NE(r.output.find("problem.thermal_instability.pressure"), std::string::npos) << r.output;
  EXPECT_NE(r.output.find("no isobarically unstable equilibrium"), std::string::npos) << r.output;
}

TEST(CoolingCommand, BadTableIsAUserErrorNamingFileAndLine) {
  const std::string path = table_file("bad.txt", "# T Lambda\n10 1e-27\n20 oops\n");
  const Command r =
      brume("check " + input + " --set cooling.function=table --set cooling.table_file=" + path);
  EXPECT_EQ(r.exit_code, 2) << r.output;
  EXPECT_NE(r.output.find(path + ":3"), std::string::npos) << r.output;
  EXPECT_NE(r.output.find("expected two positive numbers"), std::string::npos) << r.output;
  std::filesystem::remove(path);
}

TEST(CoolingCommand, MissingTableFileIsAUserError) {
  const Command r = brume("check " + input + " --set cooling.function=table");
  EXPECT_EQ(r.exit_code, 2) << r.output;
  EXPECT_NE(r.output.find("cooling.table_file"), std::string::npos) << r.output;
}

TEST(CoolingCommand, IsothermalGasWithCoolingIsAUserError) {
  const Command r = brume("check " + input + " --set gas.equation_of_state=isothermal");
  EXPECT_EQ(r.exit_code, 2) << r.output;
  EXPECT_NE(r.output.find("cooling.enabled"), std::string::npos) << r.output;
  EXPECT_NE(r.output.find("isothermal"), std::string::npos) << r.output;
}

}  // namespace
