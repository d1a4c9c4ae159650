// SIGTERM, SIGINT and SIGUSR1 ask a run to stop at the end of its current step and write a
// checkpoint (batch schedulers send them before a job's time is up). While a StopSignals object
// lives, the first such signal is recorded; a second SIGINT or SIGTERM ends the process at once,
// as without the handler.
#pragma once

namespace brume::app {

class StopSignals {
 public:
  StopSignals();
  ~StopSignals();
  StopSignals(const StopSignals&) = delete;
  StopSignals& operator=(const StopSignals&) = delete;

  // The first stop signal received (its number), 0 if none.
  [[nodiscard]] static int received();
};

[[nodiscard]] const char* signal_name(int signal_number);

}  // namespace brume::app
