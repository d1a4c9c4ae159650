// MPI for the lifetime of the command: initialized on construction, finalized on destruction.
#pragma once

namespace brume::app {

class MpiSession {
 public:
  MpiSession(int& argc, char**& argv);
  ~MpiSession();
  MpiSession(const MpiSession&) = delete;
  MpiSession& operator=(const MpiSession&) = delete;

  [[nodiscard]] int rank() const { return rank_; }
  [[nodiscard]] int size() const { return size_; }

 private:
  int rank_ = 0;
  int size_ = 1;
};

}  // namespace brume::app
