#include "io/first_failure.hpp"

namespace brume::io {

std::string first_failure(MPI_Comm comm, const std::string& local_failure) {
  int rank = 0;
  int size = 1;
  MPI_Comm_rank(comm, &rank);
  MPI_Comm_size(comm, &size);
  const int mine = local_failure.empty() ? size : rank;
  int lowest = size;
  MPI_Allreduce(&mine, &lowest, 1, MPI_INT, MPI_MIN, comm);
  if (lowest == size) return "";
  std::string message = local_failure;
  int length = static_cast<int>(message.size());
  MPI_Bcast(&length, 1, MPI_INT, lowest, comm);
  message.resize(static_cast<std::size_t>(length));
  MPI_Bcast(message.data(), length, MPI_CHAR, lowest, comm);
  return message;
}

}  // namespace brume::io
