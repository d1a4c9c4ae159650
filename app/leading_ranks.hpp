// The first `count` ranks of a communicator as a communicator of their own, so that one job of
// N ranks can measure the same work on 1, 2, 4, … of them while the others wait.
#pragma once

#include <mpi.h>

namespace brume::app {

class LeadingRanks {
 public:
  // Collective over `comm`; ranks from `count` on are not members (their comm() is null).
  LeadingRanks(MPI_Comm comm, int count) : count_(count) {
    int rank = 0;
    MPI_Comm_rank(comm, &rank);
    MPI_Comm_split(comm, rank < count ? 0 : MPI_UNDEFINED, rank, &comm_);
  }
  ~LeadingRanks() {
    if (comm_ != MPI_COMM_NULL) MPI_Comm_free(&comm_);
  }
  LeadingRanks(const LeadingRanks&) = delete;
  LeadingRanks& operator=(const LeadingRanks&) = delete;

  [[nodiscard]] MPI_Comm comm() const { return comm_; }
  [[nodiscard]] bool member() const { return comm_ != MPI_COMM_NULL; }
  [[nodiscard]] int count() const { return count_; }

 private:
  int count_;
  MPI_Comm comm_ = MPI_COMM_NULL;
};

}  // namespace brume::app
