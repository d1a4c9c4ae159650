// Checkpoints and restarts end to end: a restart continues a run bit for bit; a stop signal or
// the wall budget ends a run with a checkpoint and exit code 4; a run killed while it writes a
// checkpoint leaves the previous one intact and restartable; a path that is not a checkpoint is
// refused with exit code 2 and nothing changes. Exit codes: docs/command-line.md. Common practice,
// no source, except where a check names its reference.
#include <fcntl.h>
#include <gtest/gtest.h>
#include <signal.h>
#include <sys/wait.h>
#include <unistd.h>

#include <chrono>
#include <filesystem>
#include <fstream>
#include <map>
#include <random>
#include <sstream>
#include <thread>

#include "tests/cli/run_brume.hpp"
#include "tests/support/run_python.hpp"

namespace fs = std::filesystem;
using brume::testing::file_bytes;
using brume::testing::fresh_folder;
using brume::testing::run_brume;
using brume::testing::run_python;
using brume::testing::source_script;

namespace {

const std::string demo = "'" + std::string(BRUME_SOURCE_DIR) + "/problems/demo.yaml'";

// Every file below `folder` with its bytes: what "nothing changed" compares.
std::map<std::string, std::string> contents(const fs::path& folder) {
  std::map<std::string, std::string> files;
  for (const auto& entry : fs::recursive_directory_iterator(folder)) {
    if (entry.is_regular_file()) files[entry.path().string()] = file_bytes(entry.path());
  }
  return files;
}

// brume started in the background (no shell, so that signals reach brume itself).
pid_t spawn_brume(const std::vector<std::string>& arguments, const fs::path& output) {
  const pid_t pid = ::fork();
  if (pid == 0) {
    const int fd = ::open(output.c_str(), O_WRONLY | O_CREAT | O_TRUNC, 0644);
    ::dup2(fd, 1);
    ::dup2(fd, 2);
    std::vector<char*> argv{const_cast<char*>(BRUME_BINARY)};
    for (const std::string& a : arguments)
      argv.push_back(const_cast<char*>(a.c_str()));
    argv.push_back(nullptr);
    ::execv(BRUME_BINARY, argv.data());
    ::_exit(127);
  }
  return pid;
}

int exit_code_of(pid_t pid) {
  int status = 0;
  ::waitpid(pid, &status, 0);
  return WIFEXITED(status) ? WEXITSTATUS(status) : -WTERMSIG(status);
}

// Waits (up to `seconds`) until `ready` holds; false on time-out.
template <class Ready>
bool wait_for(Ready ready, double seconds) {
  const auto end = std::chrono::steady_clock::now() + std::chrono::duration<double>(seconds);
  while (std::chrono::steady_clock::now() < end) {
    if (ready()) return true;
    std::this_thread::sleep_for(std::chrono::microseconds(200));
  }
  return false;
}

bool has_partial_checkpoint(const fs::path& folder) {
  for (const auto& entry : fs::directory_iterator(folder)) {
    const std::string name = entry.path().filename().string();
    if (name.rfind("checkpoint-", 0) == 0 && name.find(".partial-") != std::string::npos)
      return true;
  }
  return false;
}

// A long demo run that a test stops: 16³, no stop time in reach.
std::vector<std::string> long_run(const fs::path& out, std::vector<std::string> more = {}) {
  std::vector<std::string> a{"run",   std::string(BRUME_SOURCE_DIR) + "/problems/demo.yaml",
                             "--set", "box.cells=16",
                             "--set", "clock.stop_time=1e6Myr",
                             "--out", out.string()};
  a.insert(a.end(), more.begin(), more.end());
  return a;
}

}  // namespace

// 2N steps in one run equal N steps, the checkpoint written at the step limit, and N more after
// the restart: every field bit for bit (h5py, Debian python3-h5py, reads both files).
TEST(Restart, ContinuesBitForBitAndKeepsNumberingTheSnapshots) {
  const fs::path folder = fresh_folder("brume-restart");
  const std::string common = demo + " --set box.cells=12 --set clock.stop_time=1e6Myr -q";
  ASSERT_EQ(run_brume("run " + common + " --set clock.max_steps=6 --out '" +
                      (folder / "full").string() + "'")
                .exit_code,
            0);
  const auto first = run_brume("run " + common + " --set clock.max_steps=3 --out '" +
                               (folder / "split").string() + "'");
  ASSERT_EQ(first.exit_code, 0) << first.err;
  EXPECT_TRUE(fs::exists(folder / "split" / "checkpoint-0000.h5"));
  const auto second =
      run_brume("run --restart '" + (folder / "split").string() + "' --set clock.max_steps=6 -q");
  ASSERT_EQ(second.exit_code, 0) << second.err;
  EXPECT_TRUE(fs::exists(folder / "split" / "checkpoint-0001.h5"));
  // The first part's final snapshot (step 3) is kept: the restart writes snapshot-0002.
  EXPECT_TRUE(fs::exists(folder / "split" / "snapshot-0002.h5"));
  const fs::path script = folder / "same.py";
  std::ofstream(script) << "import h5py,sys,numpy as np\n"
                           "a=h5py.File(sys.argv[1],'r'); b=h5py.File(sys.argv[2],'r')\n"
                           "assert a.attrs['step']==6 and b.attrs['step']==6\n"
                           "assert a.attrs['time']==b.attrs['time']\n"
                           "for n in a['fields']:\n"
                           "  x=a['fields'][n][...]; y=b['fields'][n][...]\n"
                           "  assert np.array_equal(x.view(np.uint64), y.view(np.uint64)), n\n"
                           "print('identical')\n";
  const auto same = run_python(script, {(folder / "full" / "snapshot-0001.h5").string(),
                                        (folder / "split" / "snapshot-0002.h5").string()});
  EXPECT_EQ(same.exit_code, 0) << same.output;
  EXPECT_NE(file_bytes(folder / "split" / "run.log").find("restart from"), std::string::npos);
  // `brume inspect` knows a checkpoint and shows its run state.
  const auto inspect =
      run_brume("inspect '" + (folder / "split" / "checkpoint-0001.h5").string() + "'");
  EXPECT_EQ(inspect.exit_code, 0) << inspect.err;
  EXPECT_NE(inspect.out.find("kind           checkpoint"), std::string::npos) << inspect.out;
  EXPECT_NE(inspect.out.find("snapshot_count        3"), std::string::npos) << inspect.out;
  // Restarting the older checkpoint again: what the first restart wrote after it is moved aside,
  // not overwritten, and written anew.
  const auto again =
      run_brume("run --restart '" + (folder / "split" / "checkpoint-0000.h5").string() +
                "' --set clock.max_steps=6 -q");
  ASSERT_EQ(again.exit_code, 0) << again.err;
  const fs::path aside = folder / "split" / "superseded-at-step3";
  for (const char* name : {"snapshot-0002.h5", "snapshot-0002.xmf", "checkpoint-0001.h5"}) {
    EXPECT_TRUE(fs::exists(aside / name)) << name;
    EXPECT_TRUE(fs::exists(folder / "split" / name)) << name;
  }
  EXPECT_FALSE(fs::exists(aside / "snapshot-0001.h5")) << "the checkpoint's own outputs stay";
  fs::remove_all(folder);
}

TEST(Restart, AStopSignalEndsTheRunWithACheckpointAndExitCodeFour) {
  for (const int signal : {SIGTERM, SIGINT, SIGUSR1}) {
    const fs::path folder = fresh_folder("brume-signal");
    const fs::path out = folder / "run";
    const pid_t pid = spawn_brume(long_run(out), folder / "output.txt");
    // The run has started stepping once its initial snapshot is complete.
    ASSERT_TRUE(wait_for([&] { return fs::exists(out / "snapshot-0000.h5"); }, 60.0));
    std::this_thread::sleep_for(std::chrono::milliseconds(300));
    ::kill(pid, signal);
    EXPECT_EQ(exit_code_of(pid), 4) << file_bytes(folder / "output.txt");
    EXPECT_TRUE(fs::exists(out / "checkpoint-0000.h5")) << signal;
    const std::string summary = file_bytes(out / "summary.txt");
    EXPECT_NE(summary.find("stopped on a stop signal"), std::string::npos) << summary;
    EXPECT_NE(summary.find(signal == SIGTERM  ? "SIGTERM"
                           : signal == SIGINT ? "SIGINT"
                                              : "SIGUSR1"),
              std::string::npos)
        << summary;
    // No final snapshot: the run is not finished. The restart goes on from the checkpoint.
    EXPECT_FALSE(fs::exists(out / "snapshot-0001.h5"));
    const auto again = run_brume("run --restart '" + out.string() +
                                 "/latest' -q --set "
                                 "clock.stop_time=0.05Myr");
    EXPECT_EQ(again.exit_code, 0) << again.err;
    fs::remove_all(folder);
  }
}

TEST(Restart, TheWallBudgetEndsTheRunWithACheckpointAndExitCodeFour) {
  const fs::path folder = fresh_folder("brume-budget");
  const auto r = run_brume("run " + demo +
                           " --set box.cells=16 --set clock.stop_time=1e6Myr "
                           "--set clock.wall_budget=0.5s -q --out '" +
                           (folder / "run").string() + "'");
  EXPECT_EQ(r.exit_code, 4) << r.err;
  EXPECT_TRUE(fs::exists(folder / "run" / "checkpoint-0000.h5"));
  EXPECT_NE(file_bytes(folder / "run" / "summary.txt").find("used up clock.wall_budget"),
            std::string::npos);
  fs::remove_all(folder);
}

// SIGKILL while a checkpoint is being written (its temporary file exists): the newest complete
// checkpoint is intact (`brume inspect` finds it sound) and a restart from the folder continues
// from it, ignoring the temporary file. A kill that landed between two writes proves nothing:
// the test retries until the temporary file outlives the process.
TEST(Restart, AKillDuringACheckpointLeavesThePreviousOneRestartable) {
  const fs::path folder = fresh_folder("brume-kill");
  const fs::path out = folder / "run";
  bool killed_mid_write = false;
  for (int attempt = 0; attempt < 5 && !killed_mid_write; ++attempt) {
    fs::remove_all(out);
    const pid_t pid = spawn_brume(
        long_run(out, {"--set", "box.cells=48", "--set", "output.checkpoint_interval=1e-9h", "-q"}),
        folder / "output.txt");
    const bool writing = wait_for(
        [&] {
          return fs::exists(out / "checkpoint-0000.h5") && fs::exists(out) &&
                 has_partial_checkpoint(out);
        },
        120.0);
    ::kill(pid, SIGKILL);
    EXPECT_EQ(exit_code_of(pid), -SIGKILL);
    ASSERT_TRUE(writing) << file_bytes(folder / "output.txt");
    killed_mid_write = has_partial_checkpoint(out);
  }
  ASSERT_TRUE(killed_mid_write);
  const auto inspect = run_brume("inspect '" + out.string() + "/checkpoint-0000.h5'");
  EXPECT_EQ(inspect.exit_code, 0) << inspect.err;
  const auto again =
      run_brume("run --restart '" + out.string() + "' -q --set clock.stop_time=0.01Myr");
  EXPECT_EQ(again.exit_code, 0) << again.err;
  fs::remove_all(folder);
}

namespace {

struct BadRestart {
  std::string name;
  std::string expected;  // in the one-line message
};

void PrintTo(const BadRestart& c, std::ostream* out) {
  *out << c.name;
}

// The --restart argument (and extra words) of case `name`, made beside the good run `run`.
std::string bad_arguments(const std::string& name, const fs::path& run) {
  const fs::path folder = run.parent_path();
  const fs::path bad = folder / "bad";
  fs::create_directories(bad);
  const fs::path checkpoint = run / "checkpoint-0000.h5";
  const fs::path copy = bad / "checkpoint-0000.h5";
  if (name == "missing_file") return "'" + (bad / "checkpoint-0009.h5").string() + "'";
  if (name == "folder_without_checkpoint") return "'" + bad.string() + "'";
  if (name == "snapshot") return "'" + (run / "snapshot-0001.h5").string() + "'";
  if (name == "truncated") {
    fs::copy_file(checkpoint, copy);
    fs::resize_file(copy, fs::file_size(checkpoint) / 2);
  } else if (name == "random_bytes") {
    std::mt19937 random(5);
    std::ofstream stream(copy, std::ios::binary);
    for (int n = 0; n < 4096; ++n)
      stream.put(static_cast<char>(random() & 0xff));
  } else if (name == "foreign") {
    const auto r = run_python(source_script("tests/io/damage_snapshot.py"),
                              {checkpoint.string(), copy.string(), "foreign"});
    EXPECT_EQ(r.exit_code, 0) << r.output;
  } else if (name == "physics_changed") {
    return "'" + run.string() + "' --set scheme.courant=0.2";
  } else if (name == "with_a_configuration") {
    return "'" + run.string() + "' " + demo;
  }
  return "'" + bad.string() + "'";
}

}  // namespace

class RestartRefuses : public ::testing::TestWithParam<BadRestart> {};

TEST_P(RestartRefuses, WithExitCodeTwoOneMessageAndNothingChanged) {
  const BadRestart& c = GetParam();
  const fs::path folder = fresh_folder("brume-restart-bad");
  const fs::path run = folder / "run";
  ASSERT_EQ(
      run_brume("run " + demo + " --set box.cells=8 --set clock.stop_time=0.05Myr -q --out '" +
                run.string() + "'")
          .exit_code,
      0);
  const std::string arguments = bad_arguments(c.name, run);
  const auto before = contents(folder);
  const auto r = run_brume("run --restart " + arguments);
  EXPECT_EQ(r.exit_code, 2) << r.err;
  EXPECT_EQ(r.err.find('\n'), r.err.size() - 1) << "one line: " << r.err;
  EXPECT_NE(r.err.find(c.expected), std::string::npos) << r.err;
  EXPECT_EQ(contents(folder), before) << "a refused restart must not change any file";
  fs::remove_all(folder);
}

INSTANTIATE_TEST_SUITE_P(
    Paths, RestartRefuses,
    ::testing::Values(BadRestart{"missing_file", "no such file"},
                      BadRestart{"folder_without_checkpoint", "holds no checkpoint"},
                      BadRestart{"snapshot", "a snapshot, not a checkpoint"},
                      BadRestart{"truncated", "truncated"},
                      BadRestart{"random_bytes", "not an HDF5 file"},
                      BadRestart{"foreign", "not a brume snapshot"},
                      BadRestart{"physics_changed", "only clock.* and output.* keys may change"},
                      BadRestart{"with_a_configuration", "takes no configuration file"}),
    [](const auto& test) { return test.param.name; });
