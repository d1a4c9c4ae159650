// Agreement on a failure that may strike some ranks only (a damaged chunk is read by one rank):
// every rank learns the message of the lowest failing rank, so that all stop together instead of
// some waiting in the next collective call.
#pragma once

#include <mpi.h>

#include <string>

namespace brume::io {

// Collective over `comm`. `local_failure` is empty on a rank that succeeded. Returns the message
// of the lowest rank that failed, or "" when none did.
[[nodiscard]] std::string first_failure(MPI_Comm comm, const std::string& local_failure);

}  // namespace brume::io
