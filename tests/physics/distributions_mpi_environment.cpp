// MPI for the diagnostics tests of this executable (they reduce over MPI_COMM_SELF). Initializes
// and finalizes MPI only if nothing else in the executable did.
#include <gtest/gtest.h>
#include <mpi.h>

namespace {

class DiagnosticsMpiEnvironment : public ::testing::Environment {
 public:
  void SetUp() override {
    int ready = 0;
    MPI_Initialized(&ready);
    if (!ready) {
      MPI_Init(nullptr, nullptr);
      owner_ = true;
    }
  }
  void TearDown() override {
    int finished = 0;
    MPI_Finalized(&finished);
    if (owner_ && !finished) MPI_Finalize();
  }

 private:
  bool owner_ = false;
};

const auto* const environment = ::testing::AddGlobalTestEnvironment(new DiagnosticsMpiEnvironment);

}  // namespace
