#include "app/on_rank_zero.hpp"

#include <string>

#include "app/user_error.hpp"

namespace brume::app {

void on_rank_zero(MPI_Comm comm, const std::function<void()>& action) {
  int rank = 0;
  MPI_Comm_rank(comm, &rank);
  std::string message;
  if (rank == 0) {
    try {
      action();
    } catch (const UserError& error) {
      message = error.what();
      if (message.empty()) message = "brume run: error on rank 0";
    }
  }
  int length = static_cast<int>(message.size());
  MPI_Bcast(&length, 1, MPI_INT, 0, comm);
  if (length == 0) return;
  message.resize(static_cast<std::size_t>(length));
  MPI_Bcast(message.data(), length, MPI_CHAR, 0, comm);
  throw UserError(message);
}

}  // namespace brume::app
