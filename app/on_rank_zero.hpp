// Work that rank 0 does alone (run folder, summary, moving files), with its user errors shared.
#pragma once

#include <mpi.h>

#include <functional>

namespace brume::app {

// Runs `action` on rank 0 only; a UserError there becomes the same UserError on every rank, so
// that no rank waits for one that has given up. Collective.
void on_rank_zero(MPI_Comm comm, const std::function<void()>& action);

}  // namespace brume::app
