// The cooling-table reader: the analytic fit sampled into a table reads back as the fit, and
// malformed tables are refused with the file, the line and what was expected.
#include <gtest/gtest.h>

#include <unistd.h>

#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <string>

#include "io/config/error.hpp"
#include "physics/cooling_equilibrium.hpp"
#include "physics/cooling_table_reader.hpp"

namespace brume::physics {
namespace {

std::filesystem::path scratch(const std::string& name) {
  return std::filesystem::temp_directory_path() /
         ("brume-cooling-" + std::to_string(long(::getpid())) + "-" + name);
}

std::string write(const std::string& name, const std::string& text) {
  const std::filesystem::path path = scratch(name);
  std::ofstream(path) << text;
  return path.string();
}

TEST(CoolingTable, SampledFitReadsBackAsTheFit) {
  // 4000 rows, log-spaced over 10 K .. 1e9 K, written with 17 digits.
  constexpr int rows = 4000;
  std::string text =
      "# Koyama & Inutsuka 2002 fit sampled by brume's test\n"
      "# temperature [K]   Lambda [erg cm^3 s^-1]\n\n";
  const KoyamaInutsukaFit fit;
  for (int r = 0; r < rows; ++r) {
    const double t = 10.0 * std::pow(1e8, double(r) / (rows - 1));
    char line[80];
    std::snprintf(line, sizeof line, "%.17g %.17g  # row %d\n", t, fit(t).lambda, r);
    text += line;
  }
  const std::string path = write("sampled.txt", text);
  const CoolingTable table = read_cooling_table(path, "cooling.table_file");
  EXPECT_EQ(table.rows(), std::size_t(rows));
  // Midway between rows, in ln T, the power-law interpolation errs by about (Δ ln T)²/8 times
  // |d² ln Λ / d (ln T)²| (second-order Taylor, common practice, no source): Δ ln T = 4.6e-3 and
  // the curvature of the fit stays below ~60 in 30 K .. 1e9 K, hence ≲ 1.6e-4; 3e-4 allowed.
  double worst = 0.0;
  for (int r = 0; r < rows - 1; r += 7) {
    const double t = 10.0 * std::pow(1e8, (double(r) + 0.5) / (rows - 1));
    if (t < 30.0) continue;
    const double error = std::fabs(table(t).lambda / fit(t).lambda - 1.0);
    worst = std::fmax(worst, error);
    EXPECT_LT(error, 3e-4) << "T " << t;
  }
  std::printf("[table vs fit] largest relative error of Lambda midway between rows %.2e\n", worst);
  // And the equilibrium curve through the table matches the fit's.
  const NetCooling from_table{table, 2e-26};
  const NetCooling from_fit{fit, 2e-26};
  for (const double n : {0.1, 1.0, 3.0, 100.0}) {
    EXPECT_NEAR(equilibrium_temperature(from_table, n) / equilibrium_temperature(from_fit, n), 1.0,
                1e-4)
        << "n " << n;
  }
  std::filesystem::remove(path);
}

// Each malformed table names the file and the line, and says what was expected.
void expect_refused(const std::string& name, const std::string& text, int line,
                    const std::string& detail) {
  const std::string path = write(name, text);
  try {
    (void)read_cooling_table(path, "cooling.table_file");
    ADD_FAILURE() << name << " was accepted";
  } catch (const config::Error& error) {
    const std::string message = error.what();
    EXPECT_EQ(error.line(), line) << message;
    EXPECT_NE(message.find(path), std::string::npos) << message;
    EXPECT_NE(message.find("cooling.table_file"), std::string::npos) << message;
    EXPECT_NE(message.find(detail), std::string::npos) << message;
  }
  std::filesystem::remove(path);
}

TEST(CoolingTable, MalformedTablesAreRefusedWithFileAndLine) {
  expect_refused("three_columns.txt", "# T Lambda\n10 1e-27\n20 1e-26 5\n", 3, "found 3 columns");
  expect_refused("word.txt", "10 1e-27\n20 lots\n", 2, "expected two positive numbers");
  expect_refused("negative.txt", "10 1e-27\n20 -1e-26\n", 2, "expected two positive numbers");
  expect_refused("decreasing.txt", "10 1e-27\n20 1e-26\n15 1e-26\n", 3, "strictly increasing");
  expect_refused("one_row.txt", "# only one\n10 1e-27\n", 2, "at least two");
  try {
    (void)read_cooling_table(scratch("missing.txt").string(), "cooling.table_file");
    ADD_FAILURE() << "a missing table was accepted";
  } catch (const config::Error& error) {
    EXPECT_NE(std::string(error.what()).find("cannot open"), std::string::npos);
  }
}

}  // namespace
}  // namespace brume::physics
