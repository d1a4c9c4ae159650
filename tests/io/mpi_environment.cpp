// MPI for this test executable: snapshots are written and read through MPI-IO even on one rank.
#include "tests/support/mpi_test_environment.hpp"

namespace {

const auto* const mpi = ::testing::AddGlobalTestEnvironment(new brume::testing::MpiTestEnvironment);

}  // namespace
