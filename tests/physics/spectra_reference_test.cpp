// brume's spectra of a synthetic box against an independent numpy computation (numpy.fft.fftn
// on the full complex grid, np.bincount over shells; tests/physics/spectra_reference.py, Debian's
// numpy) from the same fields, written to HDF5 by this test: within 1e-10 of each array's
// largest value. Odd and even axes, Nyquist content, a non-cubic box.
#include <gtest/gtest.h>

#include <unistd.h>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <numbers>
#include <string>

#include "physics/spectra_diagnostic.hpp"
#include "tests/support/run_python.hpp"
#include "tests/support/spectra_reference_file.hpp"
#include "tests/support/spectra_synthetic_cells.hpp"

namespace brume::physics {
namespace {

// White noise plus large-scale modes, so that both the low shells and the Nyquist planes carry
// power.
testing::SpectraCell lumpy_noise(long i, long j, long k) {
  testing::SpectraCell c = testing::noisy_cell(i, j, k);
  const double x = double(i) / 12.0, y = double(j) / 10.0, z = double(k) / 9.0;
  const double two_pi = 2.0 * std::numbers::pi;
  c.velocity[0] += 2.0 * std::sin(two_pi * (y + z));
  c.velocity[1] += 1.5 * std::cos(two_pi * (x - 2.0 * z));
  c.density *= 1.0 + 0.3 * std::sin(two_pi * x);
  return c;
}

void check_against_numpy(const std::array<double, 3>& size, const std::string& tag) {
  const std::array<long, 3> box = {12, 10, 9};
  const CellQuantities q = testing::spectra_box(box, lumpy_noise);
  const SpectraDiagnostic spectra(SpectraFields{});
  const io::Measurement m = spectra.measure(q, testing::spectra_context(box, MPI_COMM_SELF, size));
  const std::filesystem::path file =
      std::filesystem::temp_directory_path() /
      ("brume-spectra-" + tag + "-" + std::to_string(long(::getpid())) + ".h5");
  testing::write_spectra_reference_file(file, q, size, m);
  const testing::PythonResult r = testing::run_python(
      testing::source_script("tests/physics/spectra_reference.py"), {"fields", file.string()});
  std::filesystem::remove(file);
  std::printf("%s", r.output.c_str());
  EXPECT_EQ(r.exit_code, 0) << r.output;
  EXPECT_NE(r.output.find("worst relative error"), std::string::npos) << r.output;
}

TEST(SpectraReference, MatchesNumpyInACube) {
  check_against_numpy({1.0, 1.0, 1.0}, "cube");
}

TEST(SpectraReference, MatchesNumpyInAnElongatedBox) {
  check_against_numpy({1.0, 2.5, 0.75}, "elongated");
}

}  // namespace
}  // namespace brume::physics
