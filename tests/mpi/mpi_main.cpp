// The main of the MPI tests: every rank runs every test; only rank 0 prints (its result printer and
// the test listing), other ranks report their own failures on stderr, and the exit code is the
// worst over all ranks, so that a failure on any rank fails the test.
#include <gtest/gtest.h>
#include <mpi.h>

#include <cstdio>

namespace {

// Failures of a rank other than 0, which has no printer.
class FailurePrinter : public testing::EmptyTestEventListener {
 public:
  explicit FailurePrinter(int rank) : rank_(rank) {}
  void OnTestPartResult(const testing::TestPartResult& result) override {
    if (!result.failed()) return;
    std::fprintf(stderr, "rank %d: %s:%d: failure\n%s\n", rank_,
                 result.file_name() ? result.file_name() : "?", result.line_number(),
                 result.summary());
  }

 private:
  int rank_;
};

}  // namespace

int main(int argc, char** argv) {
  MPI_Init(&argc, &argv);
  testing::InitGoogleTest(&argc, argv);
  int rank = 0;
  MPI_Comm_rank(MPI_COMM_WORLD, &rank);
  if (rank != 0) {
    testing::TestEventListeners& listeners = testing::UnitTest::GetInstance()->listeners();
    delete listeners.Release(listeners.default_result_printer());
    listeners.Append(new FailurePrinter(rank));
    // The listing for test discovery is printed outside the listeners: one copy is enough.
    if (testing::GTEST_FLAG(list_tests)) std::freopen("/dev/null", "w", stdout);
  }
  const int local = RUN_ALL_TESTS();
  int worst = 0;
  MPI_Allreduce(&local, &worst, 1, MPI_INT, MPI_MAX, MPI_COMM_WORLD);
  MPI_Finalize();
  return worst;
}
