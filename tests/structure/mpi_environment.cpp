// MPI for this test executable: measure() is collective, here over one rank.
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
