// MPI for this test executable: SkyMaps::measure() is collective, here over one rank.
#include "tests/support/mpi_test_environment.hpp"

namespace {

const auto* const mpi = ::testing::AddGlobalTestEnvironment(new brume::testing::MpiTestEnvironment);

}  // namespace
