#include "app/mpi_session.hpp"

#include <mpi.h>

namespace brume::app {

MpiSession::MpiSession(int& argc, char**& argv) {
  MPI_Init(&argc, &argv);
  MPI_Comm_rank(MPI_COMM_WORLD, &rank_);
  MPI_Comm_size(MPI_COMM_WORLD, &size_);
}

MpiSession::~MpiSession() {
  MPI_Finalize();
}

}  // namespace brume::app
