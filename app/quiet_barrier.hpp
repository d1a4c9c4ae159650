// A barrier whose waiting ranks sleep instead of polling: while some ranks of a job measure, the
// idle ones must not take the cores away from them (Open MPI's blocking calls spin).
#pragma once

#include <mpi.h>

namespace brume::app {

// Collective over `comm`; returns on every rank once all have entered it.
void quiet_barrier(MPI_Comm comm);

}  // namespace brume::app
