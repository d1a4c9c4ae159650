// The first `ranks` ranks of MPI_COMM_WORLD as a communicator of their own, so that one test
// executable on 4 ranks can run the same job on 1, 2 and 4 ranks.
#pragma once

#include <mpi.h>

namespace brume::mpi_testing {

class SubCommunicator {
 public:
  // Collective over MPI_COMM_WORLD; ranks beyond `ranks` get MPI_COMM_NULL.
  explicit SubCommunicator(int ranks) {
    int rank = 0;
    MPI_Comm_rank(MPI_COMM_WORLD, &rank);
    MPI_Comm_split(MPI_COMM_WORLD, rank < ranks ? 0 : MPI_UNDEFINED, rank, &comm_);
  }
  ~SubCommunicator() {
    if (comm_ != MPI_COMM_NULL) MPI_Comm_free(&comm_);
  }
  SubCommunicator(const SubCommunicator&) = delete;
  SubCommunicator& operator=(const SubCommunicator&) = delete;

  [[nodiscard]] MPI_Comm comm() const { return comm_; }
  [[nodiscard]] bool member() const { return comm_ != MPI_COMM_NULL; }

 private:
  MPI_Comm comm_ = MPI_COMM_NULL;
};

[[nodiscard]] inline int world_rank() {
  int rank = 0;
  MPI_Comm_rank(MPI_COMM_WORLD, &rank);
  return rank;
}

[[nodiscard]] inline int world_size() {
  int size = 1;
  MPI_Comm_size(MPI_COMM_WORLD, &size);
  return size;
}

}  // namespace brume::mpi_testing
