// MPI for this test executable: the diagnostics and source terms reduce over MPI_COMM_SELF.
#include "tests/support/mpi_test_environment.hpp"

namespace {

const auto* const mpi = ::testing::AddGlobalTestEnvironment(new brume::testing::MpiTestEnvironment);

}  // namespace
