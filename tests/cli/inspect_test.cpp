// `brume inspect` end to end: a snapshot of a tiny run is described and found sound; damaged,
// truncated, foreign and missing files exit with code 2 and one message naming the file; the
// inspected file is never changed. Damaged copies are made with h5py (Debian's python3-h5py).
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <random>
#include <sstream>

#include "tests/cli/run_brume.hpp"
#include "tests/support/run_python.hpp"

namespace fs = std::filesystem;
using brume::testing::file_bytes;
using brume::testing::fresh_folder;
using brume::testing::run_brume;
using brume::testing::run_python;
using brume::testing::source_script;

namespace {

// The final snapshot of an 8³ decaying-turbulence run (t = 0.05 Myr) into `folder`/run.
fs::path tiny_snapshot(const fs::path& folder, const std::string& options) {
  const auto r = run_brume("run '" + std::string(BRUME_SOURCE_DIR) +
                           "/problems/demo.yaml' --set box.cells=8 --set clock.stop_time=0.05Myr "
                           "-q --out '" +
                           (folder / "run").string() + "' " + options);
  EXPECT_EQ(r.exit_code, 0) << r.err;
  return folder / "run" / "snapshot-0001.h5";
}

fs::path damaged_copy(const fs::path& good, const std::string& damage) {
  const fs::path bad = good.parent_path() / (damage + ".h5");
  const auto r = run_python(source_script("tests/io/damage_snapshot.py"),
                            {good.string(), bad.string(), damage});
  EXPECT_EQ(r.exit_code, 0) << r.output;
  return bad;
}

void expect_contains(const std::string& text, const std::vector<std::string>& words) {
  for (const std::string& word : words)
    EXPECT_NE(text.find(word), std::string::npos) << "'" << word << "' in\n" << text;
}

}  // namespace

TEST(Inspect, ASoundSnapshotIsDescribedAndLeftUntouched) {
  const fs::path folder = fresh_folder("brume-inspect");
  const fs::path file = tiny_snapshot(folder, "--set output.compression=deflate");
  const std::string before = file_bytes(file);
  const auto r = run_brume("inspect '" + file.string() + "'");
  EXPECT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(r.err, "");
  expect_contains(r.out, {file.string(),
                          "kind           snapshot",
                          "format         brume snapshot 1",
                          "reason         final",
                          "cells          8 × 8 × 8",
                          "gas            magnetized, adiabatic",
                          "density        [8, 8, 8]",
                          "face_field_x   [8, 8, 9]",
                          "face_field_z   [9, 8, 8]",
                          "float64",
                          "g cm^-3",
                          "erg cm^-3",
                          "shuffle + deflate 4",
                          "version",
                          "commit",
                          "compiler",
                          "non-finite values  0",
                          "max |div B| dx/|B|",
                          "verdict        sound",
                          "(print them with --configuration)"});
  EXPECT_EQ(r.out.find("problem:"), std::string::npos) << "configuration only on request";
  EXPECT_EQ(file_bytes(file), before) << "inspect must not change the file";
  fs::remove_all(folder);
}

TEST(Inspect, JsonAgreesWithH5pyAndNumpy) {
  const fs::path folder = fresh_folder("brume-inspect-json");
  const fs::path file = tiny_snapshot(folder, "--set output.precision=float32");
  const auto r = run_brume("inspect --json '" + file.string() + "'");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  std::ofstream(folder / "report.json") << r.out;
  const auto check = run_python(source_script("tests/cli/check_inspect_json.py"),
                                {(folder / "report.json").string(), file.string()});
  EXPECT_EQ(check.exit_code, 0) << check.output << "\n" << r.out;
  fs::remove_all(folder);
}

TEST(Inspect, TheResolvedConfigurationOnRequest) {
  const fs::path folder = fresh_folder("brume-inspect-config");
  const fs::path file = tiny_snapshot(folder, "");
  const auto r = run_brume("inspect '" + file.string() + "' --configuration");
  ASSERT_EQ(r.exit_code, 0) << r.err;
  expect_contains(r.out, {"# resolved configuration stored in snapshot-0001.h5",
                          "problem:", "name: driven_turbulence", "cells: [8, 8, 8]"});
  fs::remove_all(folder);
}

TEST(Inspect, IsListedInHelpAndTakesOneFile) {
  EXPECT_NE(run_brume("--help").out.find("inspect"), std::string::npos);
  const auto r = run_brume("inspect");
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_NE(r.err.find("brume inspect takes one snapshot file, found 0"), std::string::npos)
      << r.err;
}

namespace {

struct BadFile {
  std::string name;
  std::vector<std::string> expected;  // in the one-line message, after the file's path
  bool report = false;                // unsound but readable: the report is printed first
};

void PrintTo(const BadFile& c, std::ostream* out) {
  *out << c.name;
}

// The file of case `name`, made from the good snapshot `good`.
fs::path make_bad_file(const std::string& name, const fs::path& good) {
  const fs::path folder = good.parent_path();
  if (name == "missing") return folder / "absent.h5";
  if (name == "folder") return folder;
  if (name == "truncated") {
    const fs::path bad = folder / "truncated.h5";
    fs::copy_file(good, bad);
    fs::resize_file(bad, fs::file_size(good) * 2 / 3);
    return bad;
  }
  if (name == "random_bytes") {
    const fs::path bad = folder / "random.h5";
    std::mt19937 random(11);
    std::ofstream out(bad, std::ios::binary);
    for (int n = 0; n < 8192; ++n)
      out.put(static_cast<char>(random() & 0xff));
    return bad;
  }
  return damaged_copy(good, name);
}

class InspectBadFile : public ::testing::TestWithParam<BadFile> {};

TEST_P(InspectBadFile, ExitsTwoWithOneMessageNamingTheFileAndChangesNothing) {
  const BadFile& c = GetParam();
  const fs::path folder = fresh_folder("brume-inspect-bad");
  const fs::path good = tiny_snapshot(folder, "--set output.compression=deflate");
  const fs::path bad = make_bad_file(c.name, good);
  const bool exists = fs::is_regular_file(bad);
  const std::string before = exists ? file_bytes(bad) : "";
  const auto r = run_brume("inspect '" + bad.string() + "'");
  EXPECT_EQ(r.exit_code, 2) << r.err;
  const std::string prefix = "brume: error: " + bad.string() + ": ";
  EXPECT_EQ(r.err.substr(0, prefix.size()), prefix) << r.err;
  EXPECT_EQ(r.err.find('\n'), r.err.size() - 1) << "one line: " << r.err;
  expect_contains(r.err, c.expected);
  if (c.report) {
    EXPECT_NE(r.out.find("verdict        NOT SOUND"), std::string::npos) << r.out;
  } else {
    EXPECT_EQ(r.out, "");
  }
  if (exists) {
    EXPECT_EQ(file_bytes(bad), before) << "inspect must not change the file";
  }
  fs::remove_all(folder);
}

const BadFile bad_files[] = {
    {"missing", {"no such file"}},
    {"folder", {"is a folder, expected a brume snapshot file"}},
    {"truncated", {"truncated HDF5 file"}},
    {"random_bytes", {"not an HDF5 file, expected a brume snapshot"}},
    {"foreign", {"not a brume snapshot", "no root attribute 'format'"}},
    {"drop_momentum_y", {"dataset /fields/momentum_y is missing"}},
    {"reshape_density", {"dataset /fields/density has shape [8, 8, 9], expected [8, 8, 8]"}},
    {"nan_density", {"not sound: 1 non-finite value in density"}, true},
    {"kick_face_x", {"not sound: the face field is not divergence-free"}, true},
};

INSTANTIATE_TEST_SUITE_P(Files, InspectBadFile, ::testing::ValuesIn(bad_files),
                         [](const auto& test) { return test.param.name; });

}  // namespace
