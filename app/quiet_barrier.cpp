#include "app/quiet_barrier.hpp"

#include <chrono>
#include <thread>

namespace brume::app {

void quiet_barrier(MPI_Comm comm) {
  MPI_Request request = MPI_REQUEST_NULL;
  MPI_Ibarrier(comm, &request);
  int done = 0;
  MPI_Test(&request, &done, MPI_STATUS_IGNORE);
  while (!done) {
    // A millisecond is far below the seconds a measurement takes, and costs no CPU.
    std::this_thread::sleep_for(std::chrono::milliseconds(1));
    MPI_Test(&request, &done, MPI_STATUS_IGNORE);
  }
}

}  // namespace brume::app
