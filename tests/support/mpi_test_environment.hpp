// MPI for a test executable whose tests call collective code on one rank (MPI-IO, reductions over
// MPI_COMM_SELF): initialized before the first test unless something else did, finalized after the
// last one by whoever initialized it.
#pragma once

#include <gtest/gtest.h>
#include <mpi.h>

namespace brume::testing {

class MpiTestEnvironment : public ::testing::Environment {
 public:
  void SetUp() override {
    int ready = 0;
    MPI_Initialized(&ready);
    if (!ready) {
      MPI_Init(nullptr, nullptr);
      owner_ = true;
    }
  }
  void TearDown() override {
    int finished = 0;
    MPI_Finalized(&finished);
    if (owner_ && !finished) MPI_Finalize();
  }

 private:
  bool owner_ = false;
};

}  // namespace brume::testing
