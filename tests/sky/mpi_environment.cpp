// MPI for this test executable: SkyMaps::measure() is collective, here over one rank.
#include <gtest/gtest.h>
#include <mpi.h>

namespace {

class SkyMpiEnvironment : public ::testing::Environment {
 public:
  void SetUp() override {
    int ready = 0;
    MPI_Initialized(&ready);
    if (!ready) MPI_Init(nullptr, nullptr);
  }
  void TearDown() override {
    int done = 0;
    MPI_Finalized(&done);
    if (!done) MPI_Finalize();
  }
};

const auto* const environment = ::testing::AddGlobalTestEnvironment(new SkyMpiEnvironment);

}  // namespace
