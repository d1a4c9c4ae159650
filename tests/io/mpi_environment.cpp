// MPI for this test executable: snapshots are written and read through MPI-IO even on one rank.
#include <gtest/gtest.h>
#include <mpi.h>

namespace {

class MpiEnvironment : public ::testing::Environment {
 public:
  void SetUp() override {
    int ready = 0;
    MPI_Initialized(&ready);
    if (!ready) MPI_Init(nullptr, nullptr);
  }
  void TearDown() override { MPI_Finalize(); }
};

const auto* const mpi = ::testing::AddGlobalTestEnvironment(new MpiEnvironment);

}  // namespace
