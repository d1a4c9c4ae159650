// `brume plot` end to end: a tiny cooled, stirred MHD run (tests/cli/plot_box.yaml, 16³, eight
// steps) is plotted, and tests/cli/check_plot_figures.py checks every expected PNG (signature and
// IHDR of the PNG specification, decoded by matplotlib: dimensions, size, not blank) and the
// script's temperature against brume's overview. Bad input: a missing folder and a figures folder
// that is not empty give exit code 2 with a message naming them, and nothing is replaced.
#include <gtest/gtest.h>

#include <cstdio>
#include <filesystem>
#include <fstream>
#include <string>

#include "tests/cli/run_brume.hpp"
#include "tests/support/run_python.hpp"

namespace brume::testing {
namespace {

namespace fs = std::filesystem;

TEST(Plot, DrawsEveryFigureOfACooledMagnetizedRun) {
  const std::string folder = fresh_folder("brume-plot");
  const std::string run = folder + "/run";
  const CommandResult ran = run_brume("run '" + std::string(BRUME_SOURCE_DIR) +
                                      "/tests/cli/plot_box.yaml' --quiet --out '" + run + "'");
  ASSERT_EQ(ran.exit_code, 0) << ran.err;
  const CommandResult plotted = run_brume("plot '" + run + "'");
  ASSERT_EQ(plotted.exit_code, 0) << plotted.out << plotted.err;
  // Every figure has its data in this run: nothing may be skipped (docs/plots.md).
  EXPECT_EQ(plotted.err.find("skipped"), std::string::npos) << plotted.err;
  const PythonResult checked =
      run_python(source_script("tests/cli/check_plot_figures.py"), {run, run + "/figures"});
  std::printf("%s", checked.output.c_str());
  EXPECT_EQ(checked.exit_code, 0) << checked.output;
  // A second plot into the same, now full, folder is refused: exit code 2, naming it.
  const auto written = fs::last_write_time(run + "/figures/spectra.png");
  const CommandResult again = run_brume("plot '" + run + "'");
  EXPECT_EQ(again.exit_code, 2) << again.err;
  EXPECT_NE(again.err.find(run + "/figures"), std::string::npos) << again.err;
  EXPECT_EQ(fs::last_write_time(run + "/figures/spectra.png"), written);
  fs::remove_all(folder);
}

// Slow (about as long as the test above): a hydrodynamic, isothermal run has no field, no
// temperature and no cooling; those figures are skipped with a line each, the others drawn.
TEST(PlotSlow, SkipsTheFiguresWhoseDataIsAbsent) {
  const std::string folder = fresh_folder("brume-plot-hydro");
  const std::string run = folder + "/run";
  const CommandResult ran = run_brume(
      "run '" + std::string(BRUME_SOURCE_DIR) +
      "/problems/driven_turbulence.yaml' --quiet --set box.cells=16 --set clock.max_steps=3 "
      "--set gas.magnetized=false --set scheme.riemann_solver=hllc --out '" +
      run + "'");
  ASSERT_EQ(ran.exit_code, 0) << ran.err;
  const CommandResult plotted = run_brume("plot '" + run + "' --out '" + folder + "/figures'");
  ASSERT_EQ(plotted.exit_code, 0) << plotted.err;
  for (const char* skipped : {"beta-pdf.png", "field-density.png", "polarization.png",
                              "eb-spectra.png", "the equilibrium curve", "the temperature slice"}) {
    EXPECT_NE(plotted.err.find(std::string("skipped ") + skipped), std::string::npos) << skipped;
  }
  for (const char* drawn : {"timeline-energies.png", "density-pdf.png", "phase-diagram.png",
                            "spectra.png", "column-density.png", "slices.png"}) {
    EXPECT_TRUE(fs::exists(folder + "/figures/" + drawn)) << drawn;
  }
  EXPECT_FALSE(fs::exists(folder + "/figures/beta-pdf.png"));
  fs::remove_all(folder);
}

TEST(Plot, MissingRunFolderIsAUserError) {
  const CommandResult r = run_brume("plot /nonexistent/brume-run-folder");
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_NE(r.err.find("/nonexistent/brume-run-folder"), std::string::npos) << r.err;
  EXPECT_NE(r.err.find("no such run folder"), std::string::npos) << r.err;
}

TEST(Plot, NeverWritesIntoAFolderThatIsNotEmpty) {
  const std::string folder = fresh_folder("brume-plot-full");
  std::ofstream(folder + "/timeline.h5") << "";  // enough to look like a run folder
  const std::string out = folder + "/mine";
  fs::create_directory(out);
  std::ofstream(out + "/notes.txt") << "keep me\n";
  const CommandResult r = run_brume("plot '" + folder + "' --out '" + out + "'");
  EXPECT_EQ(r.exit_code, 2) << r.err;
  EXPECT_NE(r.err.find(out + ": exists and is not empty"), std::string::npos) << r.err;
  std::ifstream kept(out + "/notes.txt");
  std::string text;
  std::getline(kept, text);
  EXPECT_EQ(text, "keep me");
  EXPECT_EQ(std::distance(fs::directory_iterator(out), fs::directory_iterator{}), 1);
  fs::remove_all(folder);
}

TEST(Plot, TakesExactlyOneRunFolder) {
  const CommandResult r = run_brume("plot");
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_NE(r.err.find("brume plot takes one run folder, found 0"), std::string::npos) << r.err;
}

}  // namespace
}  // namespace brume::testing
